// Form boxes bound to the filing form by path: each shows its own complaint from the resolver,
// so a section only says which box holds what.
import type { ReactNode } from 'react';
import { Controller, type FieldPath, type FieldPathByValue } from 'react-hook-form';
import { StyleSheet, View, type TextInputProps } from 'react-native';
import { Choice, FieldError } from '../../ui/Choice';
import { Text } from '../../ui/Text';
import { TextField } from '../../ui/TextField';
import { Tick } from '../../ui/Tick';
import { space } from '../../ui/theme';
import type { FilingControl, FilingFormValues } from './formValues';

type FormControl = FilingControl;

type TextProps = {
  control: FormControl;
  name: FieldPathByValue<FilingFormValues, string>;
  label: string;
  hint?: string;
  placeholder?: string;
  testID: string;
} & Pick<TextInputProps, 'keyboardType' | 'multiline' | 'autoCapitalize'>;

export function FormText({ control, name, label, hint, placeholder, testID, ...input }: TextProps) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          ref={field.ref}
          label={label}
          hint={hint}
          placeholder={placeholder}
          value={field.value}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
          testID={testID}
          {...input}
        />
      )}
    />
  );
}

type ChoicesProps<T extends string> = {
  control: FormControl;
  name: FieldPath<FilingFormValues>;
  label: string;
  options: readonly T[];
  labels: Record<T, string>;
  details?: Partial<Record<T, string>>;
  testIDPrefix: string;
  // Narrow options (a type letter, a climate) sit side by side; long ones stack.
  columns?: boolean;
  // An optional choice can be taken back by pressing it again.
  clearable?: boolean;
};

export function FormChoices<T extends string>({ control, name, label, options, labels, details, testIDPrefix, columns = true, clearable }: ChoicesProps<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel={label}>
          <Text variant="label">{label}</Text>
          <View style={columns ? styles.choices : styles.stack}>
            {options.map((option) => (
              <View key={option} style={columns ? styles.choiceItem : undefined}>
                <Choice
                  compact
                  label={labels[option]}
                  detail={details?.[option]}
                  chosen={field.value === option}
                  onPress={() => {
                    field.onChange(clearable && field.value === option ? '' : option);
                    field.onBlur();
                  }}
                  testID={`${testIDPrefix}-${option}`}
                />
              </View>
            ))}
          </View>
          <FieldError message={fieldState.error?.message} />
        </View>
      )}
    />
  );
}

export function FormTick({ control, name, label, testID }: { control: FormControl; name: FieldPathByValue<FilingFormValues, boolean>; label: string; testID: string }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => <Tick label={label} checked={field.value} onChange={field.onChange} testID={testID} />}
    />
  );
}

/** Two short boxes side by side on a wide screen, stacked on a narrow phone. */
export function Pair({ children }: { children: ReactNode }) {
  return <View style={styles.pair}>{children}</View>;
}

export function PairItem({ children }: { children: ReactNode }) {
  return <View style={styles.pairItem}>{children}</View>;
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  stack: { gap: space.sm },
  choiceItem: { flexGrow: 1, flexBasis: 150 },
  pair: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  pairItem: { flexGrow: 1, flexBasis: 150 },
});
