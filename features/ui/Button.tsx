import { Pressable, StyleSheet, ActivityIndicator, View } from 'react-native';
import { Text } from './Text';
import { colors, fonts, radius, space } from './theme';

type Props = {
  label: string;
  onPress?: () => void;
  kind?: 'primary' | 'secondary' | 'quiet' | 'inverse';
  busy?: boolean;
  disabled?: boolean;
  testID?: string;
  // When the visible label needs its object to make sense to a screen reader ("Open" what?).
  accessibilityLabel?: string;
};

export function Button({ label, onPress, kind = 'primary', busy, disabled, testID, accessibilityLabel }: Props) {
  const inactive = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      // aria-* rather than accessibilityState: react-native-web writes only these to the page.
      aria-disabled={!!inactive}
      aria-busy={!!busy}
      onPress={inactive ? undefined : onPress}
      testID={testID}
      style={({ pressed }) => [styles.base, styles[kind], pressed && styles.pressed, inactive && styles.inactive]}
    >
      <View style={styles.row}>
        {busy ? <ActivityIndicator size="small" color={kind === 'primary' || kind === 'inverse' ? colors.surface : colors.slate} /> : null}
        <Text style={[styles.label, kind === 'primary' || kind === 'inverse' ? styles.labelOnDark : styles.labelOnLight]}>{label}</Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: { minHeight: 44, paddingHorizontal: space.lg, borderRadius: radius, justifyContent: 'center', alignItems: 'center' },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  primary: { backgroundColor: colors.slate },
  secondary: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.slate },
  quiet: { backgroundColor: 'transparent' },
  inverse: { backgroundColor: 'transparent', borderWidth: 1, borderColor: colors.slateLight },
  pressed: { opacity: 0.85 },
  inactive: { opacity: 0.55 },
  label: { fontFamily: fonts.semibold, fontSize: 16 },
  labelOnDark: { color: colors.surface },
  labelOnLight: { color: colors.slate },
});
