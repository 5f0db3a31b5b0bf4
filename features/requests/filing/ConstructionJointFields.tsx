// A construction joint relocation: where the plans put it, where the contractor wants it, and how
// the joint is made. For a deck joint the spans let the check place it on the moment diagram.
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import { FormChoices, FormText, FormTick, Pair, PairItem } from './fields';
import { jointElementLabels, jointElements, jointPlanes, planeLabels, type FilingControl } from './formValues';

export function ConstructionJointFields({ control }: { control: FilingControl }) {
  const element = useWatch({ control, name: 'element' });
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">The joint</Text>
      <FormChoices control={control} name="element" label="Element the joint is in" options={jointElements} labels={jointElementLabels} testIDPrefix="filing-element" />
      <FormText
        control={control}
        name="spansFt"
        label={element === 'deck' ? 'Span lengths, in feet' : 'Span lengths, in feet (optional)'}
        hint="Support to support, from the first abutment, separated by commas. Stations below count from the first abutment."
        placeholder="e.g. 95, 120, 95"
        keyboardType="numbers-and-punctuation"
        testID="filing-spans"
      />
      <View style={styles.group}>
        <FormText
          control={control}
          name="plannedLocation.description"
          label="Joint location on the plans"
          placeholder="e.g. 30 ft past pier 1 (sheet S-7)"
          testID="filing-planned-location"
        />
        <FormText control={control} name="plannedLocation.atFt" label="Planned joint, ft from the first abutment (optional)" keyboardType="decimal-pad" testID="filing-planned-at" />
      </View>
      <View style={styles.group}>
        <FormText control={control} name="proposedLocation.description" label="Proposed joint location" placeholder="e.g. 12 ft past pier 1" testID="filing-proposed-location" />
        <FormText
          control={control}
          name="proposedLocation.atFt"
          label="Proposed joint, ft from the first abutment"
          hint="Needed, with the spans, for the moment check."
          keyboardType="decimal-pad"
          testID="filing-proposed-at"
        />
      </View>
      <View style={styles.group}>
        <Text variant="label">How the joint is made</Text>
        <Pair>
          <PairItem>
            <FormTick control={control} name="preparation.roughened" label="Surface roughened" testID="filing-roughened" />
          </PairItem>
          <PairItem>
            <FormTick control={control} name="preparation.keyed" label="Keyed" testID="filing-keyed" />
          </PairItem>
          <PairItem>
            <FormTick control={control} name="preparation.waterstop" label="Waterstop" testID="filing-waterstop" />
          </PairItem>
        </Pair>
      </View>
      <FormChoices
        control={control}
        name="plane"
        label="Plane of the joint (optional)"
        options={jointPlanes}
        labels={planeLabels}
        testIDPrefix="filing-plane"
        columns={false}
        clearable
      />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  group: { gap: space.md },
});
