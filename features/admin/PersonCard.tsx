// One person in the administrator's list, with their role and organization changed in place.
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import { personUpdateSchema, type PersonUpdate } from '../../shared/people/schemas';
import type { PersonRow } from '../../shared/people/types';
import { roleLabels, roles } from '../../shared/roles';
import { Button } from '../ui/Button';
import { Choice, FieldError } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, space } from '../ui/theme';
import { useChangePerson } from './api';
import { placeServerErrors } from './formErrors';

function PersonEditor({ person, isSelf, onDone }: { person: PersonRow; isSelf: boolean; onDone: (saved: boolean) => void }) {
  const change = useChangePerson();
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, formState, setError } = useForm<PersonUpdate>({
    resolver: zodResolver(personUpdateSchema),
    defaultValues: { role: person.role, organization: person.organization ?? '' },
  });
  const save = handleSubmit((update) => {
    setFailure(null);
    change.mutate(
      { personId: person.id, update: isSelf ? { organization: update.organization } : update },
      { onSuccess: () => onDone(true), onError: (err) => setFailure(placeServerErrors(err, ['role', 'organization'], setError)) },
    );
  });
  return (
    <View style={styles.editor} testID="person-editor">
      <Controller
        control={control}
        name="role"
        render={({ field }) => (
          <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel={`Role of ${person.name}`}>
            <Text variant="label">Role</Text>
            {isSelf ? <Text variant="muted">Another administrator must change your own role.</Text> : null}
            <View style={styles.wrap}>
              {roles.map((role) => (
                <Choice key={role} compact label={roleLabels[role]} chosen={field.value === role} onPress={() => !isSelf && field.onChange(role)} testID={`person-role-${role}`} />
              ))}
            </View>
            <FieldError message={formState.errors.role?.message} />
          </View>
        )}
      />
      <Controller
        control={control}
        name="organization"
        render={({ field }) => (
          <TextField label="Organization" value={field.value ?? ''} onChangeText={field.onChange} onBlur={field.onBlur} error={formState.errors.organization?.message} testID="person-organization" />
        )}
      />
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      <View style={styles.actions}>
        <Button label="Save" onPress={save} busy={change.isPending} testID="person-save" />
        <Button kind="quiet" label="Cancel" onPress={() => onDone(false)} testID="person-cancel" />
      </View>
    </View>
  );
}

export function PersonCard({ person, isSelf }: { person: PersonRow; isSelf: boolean }) {
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  return (
    <View style={styles.card} testID={`person-${person.email}`}>
      <Text variant="label">{isSelf ? `${person.name} (you)` : person.name}</Text>
      <Text variant="muted">{person.email}</Text>
      <Text testID={`person-role-of-${person.email}`}>{[roleLabels[person.role], person.organization].filter(Boolean).join(' · ')}</Text>
      <Text variant="muted">{person.projects.length ? person.projects.map((p) => `${p.code} ${p.name}`).join('; ') : 'On no project yet: add them under Projects.'}</Text>
      {editing ? null : (
        <View style={styles.actions}>
          <Button kind="secondary" label={isSelf ? "Change organization" : "Change role"} onPress={() => { setSaved(false); setEditing(true); }} testID={`person-edit-${person.email}`} />
        </View>
      )}
      {saved ? <Notice tone="ok">Saved. The change applies from their next step in Spanrelay.</Notice> : null}
      {editing ? <PersonEditor person={person} isSelf={isSelf} onDone={(ok) => { setEditing(false); setSaved(ok); }} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.xs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  editor: { gap: space.md, paddingTop: space.sm },
  group: { gap: space.sm },
  wrap: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  actions: { flexDirection: 'row', gap: space.sm },
});
