// A deck placement change: the deck as built, the sequence on the plans, what is proposed instead,
// and the placing rate and retarder the check needs to judge it.
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import { FormChoices, FormText, FormTick, Pair, PairItem } from './fields';
import { sequenceKindLabels, sequenceKinds, type FilingControl } from './formValues';

const retarderTypes = ['B', 'D'] as const;
const retarderLabels = { B: 'Type B (retarding)', D: 'Type D (water-reducing and retarding)' };

export function DeckPlacementFields({ control }: { control: FilingControl }) {
  const [useRetarder, kind] = useWatch({ control, name: ['useRetarder', 'proposedSequence.kind'] });
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">The deck and its placement</Text>
      <FormText
        control={control}
        name="deck.spansFt"
        label="Span lengths, in feet"
        hint="Support to support, from the first abutment, separated by commas."
        placeholder="e.g. 95, 120, 95"
        keyboardType="numbers-and-punctuation"
        testID="filing-spans"
      />
      <Pair>
        <PairItem>
          <FormText control={control} name="deck.deckWidthFt" label="Deck width, ft" placeholder="e.g. 46" keyboardType="decimal-pad" testID="filing-deck-width" />
        </PairItem>
        <PairItem>
          <FormText
            control={control}
            name="deck.slabThicknessIn"
            label="Slab thickness, in"
            placeholder="e.g. 8.5"
            keyboardType="decimal-pad"
            testID="filing-slab-thickness"
          />
        </PairItem>
      </Pair>
      <FormText
        control={control}
        name="deck.haunchCyPerFt"
        label="Haunch concrete, cy per ft of deck (optional)"
        hint="All girder haunches together, per foot along the bridge."
        placeholder="e.g. 0.12"
        keyboardType="decimal-pad"
        testID="filing-haunch"
      />
      <FormText
        control={control}
        name="plannedSequence"
        label="Placement sequence on the plans"
        hint="As the plans show it, with the sheet, e.g. “Five stages, sheet S-6”."
        multiline
        testID="filing-planned-sequence"
      />
      <FormChoices
        control={control}
        name="proposedSequence.kind"
        label="Proposed sequence"
        options={sequenceKinds}
        labels={sequenceKindLabels}
        testIDPrefix="filing-sequence"
      />
      <FormText
        control={control}
        name="proposedSequence.description"
        label="Proposed sequence, described"
        hint={kind === 'single_placement' ? 'Where the placement starts and which way it runs.' : 'The stages in order, with their limits.'}
        multiline
        testID="filing-proposed-sequence"
      />
      <Pair>
        <PairItem>
          <FormText
            control={control}
            name="placement.rateCyPerHr"
            label="Placement rate, cy per hour"
            hint="What the crew and pumps sustain, not the peak."
            placeholder="e.g. 55"
            keyboardType="decimal-pad"
            testID="filing-placement-rate"
          />
        </PairItem>
        <PairItem>
          <FormText
            control={control}
            name="placement.equipment"
            label="Placing equipment"
            placeholder="e.g. two boom pumps, one finishing machine"
            testID="filing-equipment"
          />
        </PairItem>
      </Pair>
      <FormTick control={control} name="useRetarder" label="The concrete has a set retarder" testID="filing-retarder" />
      {kind === 'single_placement' && !useRetarder ? (
        <Text variant="muted">A single placement is judged on the retarder’s tested initial set; without one the check cannot accept it.</Text>
      ) : null}
      {useRetarder ? (
        <View style={styles.section}>
          <FormChoices
            control={control}
            name="retarder.astmC494Type"
            label="Retarder, ASTM C494 type"
            options={retarderTypes}
            labels={retarderLabels}
            testIDPrefix="filing-retarder-type"
          />
          <FormText control={control} name="retarder.product" label="Retarder product" placeholder="Product and trial batch" testID="filing-retarder-product" />
          <FormText
            control={control}
            name="retarder.initialSetHr"
            label="Tested initial set, hours (ASTM C403)"
            hint="From the trial batch of this mix."
            placeholder="e.g. 11.5"
            keyboardType="decimal-pad"
            testID="filing-initial-set"
          />
        </View>
      ) : null}
      <FormText
        control={control}
        name="emergencyJointAtFt"
        label="Emergency joint, ft from the first abutment (optional)"
        hint="Where the pour would stop if the concrete supply fails."
        keyboardType="decimal-pad"
        testID="filing-emergency-joint"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
});
