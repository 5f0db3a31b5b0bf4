// The figures a typed request adds to the common fields (spans, sequence, seals…), as labelled
// lines in the order of the shared field list, so a reviewer can check what the plots were drawn from.
import { StyleSheet, View } from 'react-native';
import { labelledBodyFields } from '../../shared/requests/bodyFields';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';

// Shown above in their own words.
const common = /^(title|structureNumber|location\.|planSheets|reason|proposedChange|neededBy|costImpact\.|contractTimeImpactDays)/;

export function TypedFields({ body }: { body: unknown }) {
  const rows = labelledBodyFields(body).filter((r) => !common.test(r.path));
  if (rows.length === 0) return null;
  return (
    <View style={styles.list} testID="request-typed-fields">
      {rows.map((r) => (
        <View key={r.path} style={styles.row}>
          <Text variant="label" style={styles.label}>{r.label}</Text>
          <Text style={styles.value}>{r.value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm, borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', rowGap: 0, columnGap: space.md },
  label: { color: colors.inkMuted, flexBasis: 200, flexGrow: 1 },
  value: { flexBasis: 200, flexGrow: 2 },
});
