// An expansion-joint seal substitution: the seal the plans specify beside the one offered, and
// the length and climate that set how far the joint moves.
import type { Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { sealKindLabels, type SealKind } from '../../../shared/engineering';
import { Notice } from '../../ui/Notice';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import { FormChoices, FormText, Pair, PairItem } from './fields';
import { climateLabels, climates, deckMaterials, materialLabels, sealKinds, type FilingControl } from './formValues';

const kindLabels = Object.fromEntries(sealKinds.map((k) => [k, sealKindLabels[k][0]!.toUpperCase() + sealKindLabels[k].slice(1)])) as Record<SealKind, string>;

function SealSide({ control, side }: { control: FilingControl; side: 'specified' | 'substitute' }) {
  const word = side === 'specified' ? 'Specified' : 'Substitute';
  return (
    <View style={styles.group}>
      <Text variant="label" style={styles.sideTitle}>{side === 'specified' ? 'The seal on the plans' : 'The seal offered instead'}</Text>
      <FormChoices control={control} name={`${side}.kind`} label={`${word} seal`} options={sealKinds} labels={kindLabels} testIDPrefix={`filing-${side}-kind`} />
      <FormText control={control} name={`${side}.product`} label={`${word} product (optional)`} testID={`filing-${side}-product`} />
      <FormText
        control={control}
        name={`${side}.movementCapacityIn`}
        label="Movement capacity, in"
        keyboardType="decimal-pad"
        testID={`filing-${side}-capacity`}
      />
      <Pair>
        <PairItem>
          <FormText control={control} name={`${side}.minOpeningIn`} label="Minimum opening, in" keyboardType="decimal-pad" testID={`filing-${side}-min`} />
        </PairItem>
        <PairItem>
          <FormText control={control} name={`${side}.maxOpeningIn`} label="Maximum opening, in" keyboardType="decimal-pad" testID={`filing-${side}-max`} />
        </PairItem>
      </Pair>
    </View>
  );
}

export function SealSubstitutionFields({ control }: { control: FilingControl }) {
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">The expansion joint and its seal</Text>
      <FormText control={control} name="jointLocation" label="Which expansion joint" placeholder="e.g. abutment 2" testID="filing-joint-location" />
      <SealSide control={control} side="specified" />
      <SealSide control={control} side="substitute" />
      <FormText
        control={control}
        name="contributingLengthFt"
        label="Contributing length, ft"
        hint="The length of superstructure that moves at this joint (from the fixed point)."
        keyboardType="decimal-pad"
        testID="filing-contributing-length"
      />
      <FormChoices control={control} name="material" label="Superstructure" options={deckMaterials} labels={materialLabels} testIDPrefix="filing-material" />
      <FormChoices control={control} name="climate" label="Climate" options={climates} labels={climateLabels} testIDPrefix="filing-climate" />
      <FormText
        control={control}
        name="installTempF"
        label="Deck temperature at installation, °F"
        placeholder="e.g. 64"
        keyboardType="numbers-and-punctuation"
        testID="filing-install-temp"
      />
      <Pair>
        <PairItem>
          <FormText
            control={control}
            name="gapAtReferenceIn"
            label="Opening on the plans, in (optional)"
            hint="Needed for the opening-temperature plot."
            keyboardType="decimal-pad"
            testID="filing-gap-reference"
          />
        </PairItem>
        <PairItem>
          <FormText
            control={control}
            name="referenceTempF"
            label="At temperature, °F (optional)"
            hint="The temperature that opening is given for."
            keyboardType="numbers-and-punctuation"
            testID="filing-reference-temp"
          />
        </PairItem>
      </Pair>
      <Notice tone="info">Attach the substitute seal’s data sheet below: the request cannot be filed without it.</Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  group: { gap: space.md },
  sideTitle: { fontSize: 16 },
});
