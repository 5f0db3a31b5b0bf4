// A white box on the concrete background that groups one part of a screen under a heading.
import type { ReactNode } from 'react';
import { StyleSheet, View, type ViewStyle } from 'react-native';
import { Text } from './Text';
import { colors, radius, space } from './theme';

type Props = { title?: string; aside?: ReactNode; children: ReactNode; testID?: string; style?: ViewStyle; emphasis?: boolean };

export function Panel({ title, aside, children, testID, style, emphasis }: Props) {
  return (
    <View style={[styles.panel, emphasis && styles.emphasis, style]} testID={testID}>
      {title || aside ? (
        <View style={styles.head}>
          {title ? <Text variant="heading" accessibilityRole="header" style={styles.title}>{title}</Text> : null}
          {aside}
        </View>
      ) : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md },
  emphasis: { borderColor: colors.slate, borderTopWidth: 4 },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  title: { flexShrink: 1 },
});
