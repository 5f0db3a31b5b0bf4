// Invite someone: who they are, the desk they sit at and the projects they join. The server mails
// them a link that works once, for a week; nothing is granted until they choose a password.
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import { inviteSchema, type InviteInput } from '../../shared/people/schemas';
import { roleLabels, roles } from '../../shared/roles';
import type { ProjectRef } from '../../shared/people/types';
import { Button } from '../ui/Button';
import { Choice, FieldError } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { Tick } from '../ui/Tick';
import { space } from '../ui/theme';
import { useInvite } from './api';
import { placeServerErrors } from './formErrors';

const fields = ['email', 'name', 'role', 'organization', 'projectIds'] as const;
const empty = { email: '', name: '', organization: '', projectIds: [] as string[] };

export function InviteForm({ projects }: { projects: ProjectRef[] }) {
  const invite = useInvite();
  const [open, setOpen] = useState(false);
  const [outcome, setOutcome] = useState<{ tone: 'ok' | 'error'; text: string } | null>(null);
  const { control, handleSubmit, formState, setError, reset } = useForm<InviteInput>({ resolver: zodResolver(inviteSchema), defaultValues: empty });

  const submit = handleSubmit((values) => {
    setOutcome(null);
    invite.mutate(values, {
      onSuccess: (sent) => {
        reset(empty);
        setOpen(false);
        setOutcome({ tone: 'ok', text: `Invitation sent to ${sent.email}. The link works once, for 7 days; the invitation waits below until it is used.` });
      },
      onError: (err) => {
        const message = placeServerErrors(err, fields, setError);
        if (message) setOutcome({ tone: 'error', text: message });
      },
    });
  });

  if (!open) {
    return (
      <Panel title="Invite someone" testID="invite-form">
        <Text variant="muted">They get an e-mail with a link to choose their password; the account is made with the role and projects you choose here.</Text>
        {outcome ? <Notice tone={outcome.tone} testID={outcome.tone === 'ok' ? 'invite-sent' : 'invite-error'}>{outcome.text}</Notice> : null}
        <View style={styles.row}>
          <Button label={outcome?.tone === 'ok' ? 'Invite someone else' : 'Invite someone'} onPress={() => { setOutcome(null); setOpen(true); }} testID="invite-open" />
        </View>
      </Panel>
    );
  }

  return (
    <Panel title="Invite someone" testID="invite-form">
      <Controller
        control={control}
        name="email"
        render={({ field }) => (
          <TextField label="E-mail" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} autoCapitalize="none" autoComplete="off" keyboardType="email-address" inputMode="email" error={formState.errors.email?.message} testID="invite-email" />
        )}
      />
      <Controller
        control={control}
        name="name"
        render={({ field }) => (
          <TextField label="Name" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} autoComplete="off" error={formState.errors.name?.message} testID="invite-name" />
        )}
      />
      <Controller
        control={control}
        name="organization"
        render={({ field }) => (
          <TextField label="Organization (optional)" hint="The firm, office or section they work for." value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={formState.errors.organization?.message} testID="invite-organization" />
        )}
      />
      <Controller
        control={control}
        name="role"
        render={({ field }) => (
          <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="Role">
            <Text variant="label">Role</Text>
            <View style={styles.wrap}>
              {roles.map((role) => (
                <Choice key={role} compact label={roleLabels[role]} chosen={field.value === role} onPress={() => field.onChange(role)} testID={`invite-role-${role}`} />
              ))}
            </View>
            <FieldError message={formState.errors.role?.message} testID="invite-role-error" />
          </View>
        )}
      />
      <Controller
        control={control}
        name="projectIds"
        render={({ field }) => (
          <View style={styles.group} accessibilityLabel="Projects">
            <Text variant="label">Projects</Text>
            {projects.length === 0 ? <Text variant="muted">There are no projects yet; the person can be added to one later.</Text> : null}
            {projects.map((p) => (
              <Tick
                key={p.id}
                label={`${p.code} · ${p.name}`}
                checked={field.value.includes(p.id)}
                onChange={(on) => field.onChange(on ? [...field.value, p.id] : field.value.filter((id) => id !== p.id))}
                testID={`invite-project-${p.code}`}
              />
            ))}
            <FieldError message={formState.errors.projectIds?.message ?? formState.errors.projectIds?.[0]?.message} />
          </View>
        )}
      />
      {outcome ? <Notice tone={outcome.tone} testID={outcome.tone === 'ok' ? 'invite-sent' : 'invite-error'}>{outcome.text}</Notice> : null}
      <View style={styles.actions}>
        <Button label="Send invitation" onPress={submit} busy={invite.isPending} testID="invite-submit" />
        <Button kind="quiet" label="Cancel" onPress={() => { reset(empty); setOutcome(null); setOpen(false); }} testID="invite-cancel" />
      </View>
    </Panel>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  wrap: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  row: { flexDirection: 'row' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
