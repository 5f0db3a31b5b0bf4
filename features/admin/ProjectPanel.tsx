// One project as the administrator sees it: who is on it, adding and removing people, and its
// desk due days. Membership decides who sees the project's requests.
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { AdminProject, PersonRow } from '../../shared/people/types';
import { roleLabels } from '../../shared/roles';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, space } from '../ui/theme';
import { useAddMember, useRemoveMember } from './api';
import { DueDaysForm } from './DueDaysForm';

const shownMatches = 6;

function AddMember({ project, people }: { project: AdminProject; people: PersonRow[] }) {
  const add = useAddMember();
  const [find, setFind] = useState('');
  const matches = useMemo(() => {
    const words = find.trim().toLowerCase();
    if (!words) return [];
    const members = new Set(project.members.map((m) => m.id));
    return people.filter((p) => !members.has(p.id) && [p.name, p.email, p.organization ?? ''].some((v) => v.toLowerCase().includes(words))).slice(0, shownMatches);
  }, [find, people, project.members]);
  return (
    <View style={styles.gap}>
      <TextField label="Add a person" hint="Type part of a name, e-mail or organization." value={find} onChangeText={setFind} autoCapitalize="none" testID={`project-${project.code}-find`} />
      {find.trim() && matches.length === 0 ? <Text variant="muted">Nobody else matches. Someone without an account can be invited under People.</Text> : null}
      {matches.map((p) => (
        <View key={p.id} style={styles.member}>
          <View style={styles.who}>
            <Text variant="label">{p.name}</Text>
            <Text variant="muted">{[roleLabels[p.role], p.organization, p.email].filter(Boolean).join(' · ')}</Text>
          </View>
          <Button
            kind="secondary"
            label="Add"
            busy={add.isPending && add.variables?.userId === p.id}
            onPress={() => add.mutate({ projectId: project.id, userId: p.id }, { onSuccess: () => setFind('') })}
            testID={`project-${project.code}-add-${p.email}`}
          />
        </View>
      ))}
      {add.error ? <Notice tone="error">{`Not added: ${add.error.message}`}</Notice> : null}
    </View>
  );
}

export function ProjectPanel({ project, people }: { project: AdminProject; people: PersonRow[] }) {
  const remove = useRemoveMember();
  return (
    <Panel title={`${project.code} · ${project.name}`} testID={`project-${project.code}`}>
      <Text variant="muted">{`Structure ${project.structureNumber} · ${project.members.length} ${project.members.length === 1 ? 'member' : 'members'}`}</Text>
      <View testID={`project-${project.code}-members`}>
        {project.members.length === 0 ? <Text variant="muted">Nobody is on this project yet; add people below so they can file and act on its requests.</Text> : null}
        {project.members.map((m) => (
          <View key={m.id} style={styles.member} testID={`project-${project.code}-member-${m.email}`}>
            <View style={styles.who}>
              <Text variant="label">{m.name}</Text>
              <Text variant="muted">{[roleLabels[m.role], m.organization].filter(Boolean).join(' · ')}</Text>
            </View>
            <Button
              kind="quiet"
              label="Remove"
              busy={remove.isPending && remove.variables?.userId === m.id}
              onPress={() => remove.mutate({ projectId: project.id, userId: m.id })}
              testID={`project-${project.code}-remove-${m.email}`}
            />
          </View>
        ))}
      </View>
      {remove.error ? <Notice tone="error">{`Not removed: ${remove.error.message}`}</Notice> : null}
      <AddMember project={project} people={people} />
      <DueDaysForm projectId={project.id} code={project.code} deskDueDays={project.deskDueDays} />
    </Panel>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.sm },
  member: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.line },
  who: { flexShrink: 1, gap: 2 },
});
