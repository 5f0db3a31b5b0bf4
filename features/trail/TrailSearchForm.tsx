// The search form: request number, structure number, a person who acted, the dates of trail events
// and the decision. It checks with the same schema as the server, and shows the server's field
// errors in the same places.
import { useEffect } from 'react';
import { Controller, useForm, type FieldPath, type Resolver } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { trailDecisionLabels, trailDecisions, trailSearchQuerySchema } from '../../shared/trail/trailSearch';
import { Button } from '../ui/Button';
import { ChipGroup } from '../ui/ChipGroup';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';
import { emptySearch, filterNames, filtersOf, type TrailSearchValues } from './searchFilters';

const resolver: Resolver<TrailSearchValues> = async (values) => {
  const parsed = trailSearchQuerySchema.safeParse(filtersOf(values));
  if (parsed.success) return { values, errors: {} };
  const errors: Record<string, { type: string; message: string }> = {};
  for (const issue of parsed.error.issues) {
    const name = String(issue.path[0] ?? 'number');
    errors[name] ??= { type: 'validate', message: issue.message };
  }
  return { values: {}, errors };
};

type Props = {
  initial: TrailSearchValues;
  onSearch: (values: TrailSearchValues) => void;
  busy: boolean;
  // Field errors the server gave for the last search.
  serverFields?: Record<string, string>;
};

const textFields: { name: 'number' | 'structure' | 'person'; label: string; placeholder: string; hint: string }[] = [
  { name: 'number', label: 'Request number', placeholder: 'e.g. PC-0114-002', hint: 'The whole number or part of it.' },
  { name: 'structure', label: 'Structure number', placeholder: 'e.g. 27-0114', hint: 'The bridge the request is on.' },
  { name: 'person', label: 'Person', placeholder: 'e.g. Akers or akers@…', hint: 'Anyone who acted in the trail.' },
];

export function TrailSearchForm({ initial, onSearch, busy, serverFields }: Props) {
  const { control, handleSubmit, formState, reset, setError } = useForm<TrailSearchValues>({ resolver, defaultValues: initial });

  useEffect(() => {
    for (const [name, message] of Object.entries(serverFields ?? {})) {
      if ((filterNames as readonly string[]).includes(name)) setError(name as FieldPath<TrailSearchValues>, { type: 'server', message });
    }
  }, [serverFields, setError]);

  const submit = handleSubmit(onSearch);
  const clear = () => {
    reset(emptySearch);
    onSearch(emptySearch);
  };

  return (
    <View style={styles.form} testID="trail-search-form">
      {textFields.map((f) => (
        <Controller
          key={f.name}
          control={control}
          name={f.name}
          render={({ field }) => (
            <TextField
              label={f.label}
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              placeholder={f.placeholder}
              hint={f.hint}
              autoCapitalize="none"
              autoCorrect={false}
              returnKeyType="search"
              onSubmitEditing={submit}
              error={formState.errors[f.name]?.message}
              testID={`trail-search-${f.name}`}
            />
          )}
        />
      ))}
      <View style={styles.dates}>
        {(['from', 'to'] as const).map((name) => (
          <View key={name} style={styles.date}>
            <Controller
              control={control}
              name={name}
              render={({ field }) => (
                <TextField
                  label={name === 'from' ? 'Events from' : 'Events to'}
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  placeholder="YYYY-MM-DD"
                  hint={name === 'from' ? 'First day, your time.' : 'Last day, included.'}
                  inputMode="numeric"
                  autoCorrect={false}
                  onSubmitEditing={submit}
                  error={formState.errors[name]?.message}
                  testID={`trail-search-${name}`}
                />
              )}
            />
          </View>
        ))}
      </View>
      <Controller
        control={control}
        name="decision"
        render={({ field }) => (
          <ChipGroup
            label="Decision"
            options={trailDecisions.map((value) => ({ value, label: trailDecisionLabels[value] }))}
            value={field.value || undefined}
            onChange={(value) => field.onChange(value ?? '')}
            testID="trail-search-decision"
          />
        )}
      />
      <View style={styles.buttons}>
        <Button label="Search" onPress={submit} busy={busy} testID="trail-search-submit" />
        <Button kind="secondary" label="Clear" onPress={clear} testID="trail-search-clear" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  dates: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  date: { flexGrow: 1, flexBasis: 140 },
  buttons: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
});
