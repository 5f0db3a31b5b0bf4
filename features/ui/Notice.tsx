// A boxed message: errors, confirmations, and the engineering cautions.
import { View, StyleSheet } from 'react-native';
import { Text } from './Text';
import { colors, radius, space } from './theme';

const tones = {
  error: { bg: colors.dangerBg, fg: colors.danger },
  ok: { bg: colors.okBg, fg: colors.ok },
  caution: { bg: colors.cautionBg, fg: colors.caution },
  info: { bg: colors.slateLight, fg: colors.slate },
};

export function Notice({ tone, children, testID }: { tone: keyof typeof tones; children: string; testID?: string }) {
  const t = tones[tone];
  return (
    <View style={[styles.box, { backgroundColor: t.bg, borderColor: t.fg }]} testID={testID} accessibilityRole={tone === 'error' ? 'alert' : undefined}>
      <Text style={{ color: t.fg }}>{children}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, borderRadius: radius, padding: space.md },
});
