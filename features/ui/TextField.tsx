import type { Ref } from 'react';
import { TextInput, View, StyleSheet, type TextInputProps } from 'react-native';
import { Text } from './Text';
import { colors, fonts, radius, space } from './theme';

// `ref` reaches the input so a form can move focus to the first field that needs attention.
type Props = TextInputProps & { label: string; error?: string; hint?: string; ref?: Ref<TextInput> };

export function TextField({ label, error, hint, style, multiline, ...input }: Props) {
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      <TextInput
        {...input}
        accessibilityLabel={label}
        multiline={multiline}
        placeholderTextColor={colors.inkMuted}
        style={[styles.input, multiline && styles.multiline, error ? styles.inputError : null, style]}
      />
      {error ? (
        <Text variant="muted" style={styles.error} accessibilityRole="alert">
          {error}
        </Text>
      ) : hint ? (
        <Text variant="muted">{hint}</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  input: {
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    backgroundColor: colors.surface,
    fontFamily: fonts.regular,
    fontSize: 16,
    color: colors.ink,
  },
  multiline: { minHeight: 120, textAlignVertical: 'top' },
  inputError: { borderColor: colors.danger },
  error: { color: colors.danger },
});
