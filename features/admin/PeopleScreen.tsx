// The administrator's home: everyone who can sign in, with their desk and projects; invitations
// for people who cannot yet.
import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useActor } from '../auth/useActor';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';
import { AdminFrame } from './AdminFrame';
import { useAdminProjects, usePeople } from './api';
import { InviteForm } from './InviteForm';
import { LoadState } from './LoadState';
import { PendingInvitations } from './PendingInvitations';
import { PersonCard } from './PersonCard';

const twoColumnsFrom = 1024;

function PeopleList() {
  const people = usePeople();
  const me = useActor().data;
  const [find, setFind] = useState('');
  const shown = useMemo(() => {
    const words = find.trim().toLowerCase();
    if (!people.data || !words) return people.data ?? [];
    return people.data.filter((p) => [p.name, p.email, p.organization ?? ''].some((v) => v.toLowerCase().includes(words)));
  }, [people.data, find]);
  return (
    <Panel title="People" testID="people-list">
      <TextField label="Find a person" hint="By name, e-mail or organization." value={find} onChangeText={setFind} autoCapitalize="none" testID="people-find" />
      <LoadState query={people} what="The people" testID="people" />
      {people.data && shown.length === 0 ? (
        <Text variant="muted" testID="people-empty">{find ? 'Nobody matches; check the spelling, or invite them.' : 'Nobody can sign in yet. Invite the first people with the form.'}</Text>
      ) : null}
      {shown.map((p) => <PersonCard key={p.id} person={p} isSelf={p.id === me?.id} />)}
    </Panel>
  );
}

export function PeopleScreen() {
  const { width } = useWindowDimensions();
  const projects = useAdminProjects();
  const wide = width >= twoColumnsFrom;
  return (
    <AdminFrame title="People and projects" intro="Who can sign in, at which desk, and on which projects. Invite people by e-mail; they choose their own password.">
      {/* On a phone the invitations come first: the list of people can be long. */}
      <View style={wide ? styles.columns : styles.gap}>
        {wide ? (
          <View style={styles.main}>
            <PeopleList />
          </View>
        ) : null}
        <View style={wide ? styles.side : styles.gap}>
          <LoadState query={projects} what="The projects" testID="invite-projects" />
          {projects.data ? <InviteForm projects={projects.data} /> : null}
          <PendingInvitations />
        </View>
        {wide ? null : <PeopleList />}
      </View>
    </AdminFrame>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.lg },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  main: { flex: 3, gap: space.lg },
  side: { flex: 2, gap: space.lg },
});
