// A yes/no box for facts that are either so or not (joint roughened, waterstop fitted), with the
// same thumb-sized frame as a Choice.
import { Pressable, StyleSheet, View } from 'react-native';
import { spaceAlsoPresses } from './keyboard';
import { Text } from './Text';
import { colors, radius, space } from './theme';

export function Tick({ label, checked, onChange, testID }: { label: string; checked: boolean; onChange: (next: boolean) => void; testID?: string }) {
  return (
    <Pressable
      accessibilityRole="checkbox"
      aria-checked={checked}
      accessibilityLabel={label}
      onPress={() => onChange(!checked)}
      {...spaceAlsoPresses(() => onChange(!checked))}
      testID={testID}
      style={[styles.box, checked && styles.on]}
    >
      <View style={[styles.square, checked && styles.squareOn]}>{checked ? <Text style={styles.mark}>✓</Text> : null}</View>
      <Text variant="label" style={styles.label}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: radius, padding: space.md, minHeight: 44, backgroundColor: colors.surface },
  on: { borderColor: colors.slate, backgroundColor: colors.slateLight },
  square: { width: 20, height: 20, borderRadius: 3, borderWidth: 2, borderColor: colors.inkMuted, alignItems: 'center', justifyContent: 'center' },
  squareOn: { borderColor: colors.slate, backgroundColor: colors.slate },
  mark: { color: colors.surface, fontSize: 13, lineHeight: 16 },
  label: { flex: 1 },
});
