// How long a request may wait at each desk of one project before reminders go out.
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { deskDueDaysSchema } from '../../shared/people/schemas';
import { roleLabels } from '../../shared/roles';
import { deskRoles, type DeskDueDays, type DeskRole } from '../../shared/workflow/desks';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';
import { useSaveProjectSettings } from './api';
import { placeServerErrors } from './formErrors';

// Typed as text, checked as the whole number of days the server takes.
const dueDaysForm = z.strictObject(
  Object.fromEntries(
    deskRoles.map((desk) => [desk, z.string().trim().regex(/^\d+$/, 'Enter a whole number of days.').transform(Number).pipe(deskDueDaysSchema.shape[desk])]),
  ) as Record<DeskRole, z.ZodPipe<z.ZodPipe<z.ZodString, z.ZodTransform<number, string>>, typeof deskDueDaysSchema.shape.contractor>>,
);
type FormInput = z.input<typeof dueDaysForm>;

const asText = (days: DeskDueDays) => Object.fromEntries(deskRoles.map((d) => [d, String(days[d])])) as FormInput;

export function DueDaysForm({ projectId, code, deskDueDays }: { projectId: string; code: string; deskDueDays: DeskDueDays }) {
  const save = useSaveProjectSettings();
  const [outcome, setOutcome] = useState<{ tone: 'ok' | 'error'; text: string } | null>(null);
  const { control, handleSubmit, formState, setError, reset } = useForm<FormInput, unknown, DeskDueDays>({ resolver: zodResolver(dueDaysForm), defaultValues: asText(deskDueDays) });
  const submit = handleSubmit((days) => {
    setOutcome(null);
    save.mutate(
      { projectId, settings: { deskDueDays: days } },
      {
        onSuccess: (project) => {
          reset(asText(project.deskDueDays));
          setOutcome({ tone: 'ok', text: 'Saved. Reminders use the new days from the next hourly check.' });
        },
        onError: (err) => {
          const message = placeServerErrors<FormInput>(err, deskRoles, setError, 'deskDueDays');
          if (message) setOutcome({ tone: 'error', text: message });
        },
      },
    );
  });
  return (
    <View style={styles.form} testID={`project-${code}-due-days`}>
      <Text variant="label">Days a request may wait at each desk before reminders go out</Text>
      <View style={styles.grid}>
        {deskRoles.map((desk) => (
          <View key={desk} style={styles.cell}>
            <Controller
              control={control}
              name={desk}
              render={({ field }) => (
                <TextField
                  label={roleLabels[desk]}
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  keyboardType="number-pad"
                  inputMode="numeric"
                  error={formState.errors[desk]?.message}
                  testID={`project-${code}-due-${desk}`}
                />
              )}
            />
          </View>
        ))}
      </View>
      {outcome ? <Notice tone={outcome.tone}>{outcome.text}</Notice> : null}
      <View style={styles.row}>
        <Button kind="secondary" label="Save due days" onPress={submit} busy={save.isPending} disabled={!formState.isDirty} testID={`project-${code}-due-save`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  row: { flexDirection: 'row' },
});
