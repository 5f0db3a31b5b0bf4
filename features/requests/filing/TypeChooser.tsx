// Which kind of departure this is; it decides the form's own section and the check that runs.
// Fixed once a draft is saved, since a draft keeps its type.
import { StyleSheet, View } from 'react-native';
import { requestTypeLabels, requestTypes, type RequestType } from '../../../shared/requests/requestBody';
import { Choice } from '../../ui/Choice';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';

const typeDetails: Record<RequestType, string> = {
  deck_placement_change: 'Pour the deck in a different sequence, or all at once with retarded concrete.',
  construction_joint_relocation: 'Put a construction joint somewhere other than the plans show.',
  joint_seal_substitution: 'Use a different expansion-joint seal than the one specified.',
  other_deviation: 'Anything else that departs from the sealed plans.',
};

export function TypeChooser({ value, onChange, locked }: { value: RequestType; onChange: (t: RequestType) => void; locked: boolean }) {
  return (
    <View style={styles.section} accessibilityRole="radiogroup" accessibilityLabel="Kind of request">
      <Text variant="heading" accessibilityRole="header">Kind of request</Text>
      <View style={styles.choices}>
        {requestTypes
          .filter((t) => !locked || t === value)
          .map((t) => (
            <View key={t} style={styles.item}>
              <Choice label={requestTypeLabels[t]} detail={typeDetails[t]} chosen={value === t} onPress={() => (locked ? undefined : onChange(t))} testID={`filing-type-${t}`} />
            </View>
          ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  item: { flexGrow: 1, flexBasis: 300 },
});
