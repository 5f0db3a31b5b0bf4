import { Text as RNText, type TextProps, StyleSheet } from 'react-native';
import { colors, fonts } from './theme';

type Variant = 'body' | 'muted' | 'title' | 'heading' | 'label' | 'mono';

export function Text({ variant = 'body', style, ...rest }: TextProps & { variant?: Variant }) {
  return <RNText {...rest} style={[styles.base, styles[variant], style]} />;
}

const styles = StyleSheet.create({
  base: { color: colors.ink, fontFamily: fonts.regular, fontSize: 16, lineHeight: 22 },
  body: {},
  muted: { color: colors.inkMuted, fontSize: 14, lineHeight: 20 },
  title: { fontFamily: fonts.semibold, fontSize: 24, lineHeight: 30 },
  heading: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24 },
  label: { fontFamily: fonts.medium, fontSize: 14, lineHeight: 18 },
  mono: { fontFamily: 'monospace', fontSize: 13 },
});
