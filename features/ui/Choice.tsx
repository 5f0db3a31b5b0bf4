// One option of a set the person picks from (a project, a cost impact, a move): a radio with a
// visible frame, large enough to hit with a gloved thumb on site.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { spaceAlsoPresses } from './keyboard';
import { Text } from './Text';
import { colors, radius, space } from './theme';

type Props = {
  label: string;
  detail?: string;
  chosen: boolean;
  onPress: () => void;
  testID?: string;
  compact?: boolean;
  children?: ReactNode;
};

export function Choice({ label, detail, chosen, onPress, testID, compact, children }: Props) {
  return (
    <Pressable
      accessibilityRole="radio"
      // aria-* rather than accessibilityState: react-native-web writes only these to the page.
      aria-checked={chosen}
      accessibilityLabel={detail ? `${label}. ${detail}` : label}
      onPress={onPress}
      {...spaceAlsoPresses(onPress)}
      testID={testID}
      style={[styles.choice, compact && styles.compact, chosen && styles.chosen]}
    >
      <View style={styles.row}>
        <View style={[styles.dot, chosen && styles.dotOn]}>{chosen ? <View style={styles.dotInner} /> : null}</View>
        <View style={styles.text}>
          <Text variant="label">{label}</Text>
          {detail ? <Text variant="muted">{detail}</Text> : null}
          {children}
        </View>
      </View>
    </Pressable>
  );
}

export function FieldError({ message, testID }: { message?: string; testID?: string }) {
  if (!message) return null;
  return (
    <Text variant="muted" style={styles.error} accessibilityRole="alert" testID={testID}>
      {message}
    </Text>
  );
}

const styles = StyleSheet.create({
  choice: { borderWidth: 1, borderColor: colors.line, borderRadius: radius, padding: space.md, backgroundColor: colors.surface, minHeight: 44, justifyContent: 'center' },
  compact: { paddingVertical: space.sm },
  chosen: { borderColor: colors.slate, borderWidth: 2, backgroundColor: colors.slateLight },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  dot: { width: 18, height: 18, borderRadius: 9, borderWidth: 2, borderColor: colors.inkMuted, marginTop: 1, alignItems: 'center', justifyContent: 'center' },
  dotOn: { borderColor: colors.slate },
  dotInner: { width: 8, height: 8, borderRadius: 4, backgroundColor: colors.slate },
  text: { flex: 1, gap: 2 },
  error: { color: colors.danger },
});
