// A few key figures under a plot as label/value rows, so the numbers a reviewer quotes can be
// read without tracing the drawing.
import { StyleSheet, View } from 'react-native';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';

export function Facts({ rows, testID }: { rows: [label: string, value: string][]; testID?: string }) {
  return (
    <View style={styles.list} testID={testID}>
      {rows.map(([label, value]) => (
        <View key={label} style={styles.row}>
          <Text variant="muted" style={styles.label}>{label}</Text>
          <Text style={styles.value}>{value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 2 },
  row: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, paddingVertical: 4 },
  label: { flexShrink: 1 },
  value: { fontVariant: ['tabular-nums'], textAlign: 'right', flexGrow: 1 },
});
