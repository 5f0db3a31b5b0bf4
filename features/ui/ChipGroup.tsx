// A row of pills for picking one value of a filter, "Any" first. Pills wrap on a phone and each is
// at least 44 px tall.
import { Pressable, StyleSheet, View } from 'react-native';
import { spaceAlsoPresses } from './keyboard';
import { Text } from './Text';
import { colors, fonts, space } from './theme';

type Option<T extends string> = { value: T; label: string };

type Props<T extends string> = {
  label: string;
  options: readonly Option<T>[];
  value: T | undefined;
  onChange: (value: T | undefined) => void;
  // Whether the filter can be left unset; a sort, say, always has a value.
  allowAny?: boolean;
  anyLabel?: string;
  testID?: string;
};

export function ChipGroup<T extends string>({ label, options, value, onChange, allowAny = true, anyLabel = 'Any', testID }: Props<T>) {
  const all: { value: T | undefined; label: string }[] = allowAny ? [{ value: undefined, label: anyLabel }, ...options] : [...options];
  return (
    <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel={label} testID={testID}>
      <Text variant="label">{label}</Text>
      <View style={styles.row}>
        {all.map((o) => {
          const chosen = o.value === value;
          return (
            <Pressable
              key={o.value ?? '_any'}
              accessibilityRole="radio"
              aria-checked={chosen}
              accessibilityLabel={`${label}: ${o.label}`}
              onPress={() => onChange(o.value)}
              {...spaceAlsoPresses(() => onChange(o.value))}
              style={[styles.chip, chosen && styles.chosen]}
              testID={testID ? `${testID}-${o.value ?? 'any'}` : undefined}
            >
              <Text style={[styles.text, chosen && styles.chosenText]}>{o.label}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: 22, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  chosen: { backgroundColor: colors.slate, borderColor: colors.slate },
  text: { fontSize: 14, fontFamily: fonts.medium },
  chosenText: { color: colors.surface },
});
