// What waits at the signed-in person's desk, overdue first, with how many requests stand in each
// state across their projects. On a wide screen the chosen request opens beside the list.
import { Link, Redirect, useRouter } from 'expo-router';
import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';
import { requestStates, stateLabel } from '../../shared/requests/states';
import { roleLabels } from '../../shared/roles';
import { useActor } from '../auth/useActor';
import { homeOf } from '../shell/destinations';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import { useRequestCounts, useRequestList } from './api';
import { ListWithDetail, useSelectedRequest } from './ListWithDetail';
import { RequestCard } from './RequestCard';

function StateCounts() {
  const counts = useRequestCounts({});
  if (counts.isPending) return <ActivityIndicator accessibilityLabel="Counting requests" />;
  if (counts.error) return <Notice tone="error">{`The counts could not be loaded: ${counts.error.message}`}</Notice>;
  const shown = requestStates.filter((s) => counts.data.byState[s]);
  if (shown.length === 0) return null;
  return (
    <View style={styles.counts} testID="desk-state-counts">
      <Text variant="label">Across your projects ({counts.data.total}{counts.data.overdue ? `, ${counts.data.overdue} overdue` : ''})</Text>
      <View style={styles.chips}>
        {shown.map((s) => (
          <Link key={s} href={{ pathname: '/register', params: { state: s } }} asChild>
            <Pressable style={styles.chip} accessibilityRole="link" accessibilityLabel={`${stateLabel(s)}: ${counts.data.byState[s]}. Open in the register`} testID={`desk-count-${s}`}>
              <Text style={styles.chipCount}>{counts.data.byState[s]}</Text>
              <Text variant="muted" style={styles.chipLabel}>{stateLabel(s)}</Text>
            </Pressable>
          </Link>
        ))}
      </View>
    </View>
  );
}

export function DeskScreen() {
  const router = useRouter();
  const { data: actor } = useActor();
  const { selectedId, onSelect } = useSelectedRequest();
  const desk = useRequestList({ desk: 'mine', sort: 'due' });
  const deskCounts = useRequestCounts({ desk: 'mine' });
  const recent = useRequestList({ desk: 'all', sort: 'updated', limit: 10 });

  // The auditor and the administrator hold no desk; their home is elsewhere.
  if (actor && homeOf(actor.role) !== '/') return <Redirect href={homeOf(actor.role)} />;

  const deskIds = new Set(desk.items.map((r) => r.id));
  const elsewhere = recent.items.filter((r) => !deskIds.has(r.id));
  const waiting = deskCounts.data?.total ?? desk.items.length;
  const overdue = deskCounts.data?.overdue ?? 0;

  const list = (
    <>
      <View style={styles.head}>
        <View style={styles.headText}>
          <Text variant="title" accessibilityRole="header">My desk</Text>
          {actor ? <Text variant="muted">{roleLabels[actor.role]} · {actor.organization ?? actor.email}</Text> : null}
        </View>
        {actor?.role === 'contractor' ? <Button label="New request" onPress={() => router.push('/requests/new')} testID="desk-new-request" /> : null}
      </View>

      <Text variant="heading" accessibilityRole="header" testID="desk-waiting-heading">
        Waiting for me ({waiting}){overdue ? ` · ${overdue} overdue` : ''}
      </Text>
      {desk.isPending ? <ActivityIndicator accessibilityLabel="Loading your desk" /> : null}
      {desk.error ? (
        <View style={styles.retry}>
          <Notice tone="error">{desk.error.message}</Notice>
          <Button kind="secondary" label="Try again" onPress={() => void desk.refetch()} />
        </View>
      ) : null}
      {desk.isSuccess && desk.items.length === 0 ? (
        <Notice tone="info" testID="desk-empty">
          {actor?.role === 'contractor'
            ? 'Nothing is waiting for you. To ask for a departure from the plans, choose New request.'
            : 'Nothing is waiting at your desk. You are told by e-mail when a request reaches you; the register lists every request on your projects.'}
        </Notice>
      ) : null}
      <View style={styles.list} testID="desk-waiting">
        {desk.items.map((r) => <RequestCard key={r.id} request={r} selected={r.id === selectedId} onSelect={onSelect} />)}
      </View>
      {desk.hasNextPage ? (
        <Button kind="secondary" label="Show more waiting for me" busy={desk.isFetchingNextPage} onPress={() => void desk.fetchNextPage()} testID="desk-waiting-more" />
      ) : null}

      <StateCounts />

      {recent.error ? <Notice tone="error">{recent.error.message}</Notice> : null}
      {elsewhere.length > 0 ? (
        <>
          <Text variant="heading" accessibilityRole="header">Lately on other desks</Text>
          <View style={styles.list} testID="desk-elsewhere">
            {elsewhere.map((r) => <RequestCard key={r.id} request={r} selected={r.id === selectedId} onSelect={onSelect} />)}
          </View>
          <Button kind="quiet" label="Every request in the register" onPress={() => router.push('/register')} testID="desk-open-register" />
        </>
      ) : null}
    </>
  );

  return <ListWithDetail list={list} selectedId={selectedId} emptyHint="Choose a request on the left to read it and act on it here." />;
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.lg, flexWrap: 'wrap' },
  headText: { gap: space.xs, flexShrink: 1 },
  list: { gap: space.md },
  retry: { gap: space.sm, alignItems: 'flex-start' },
  counts: { gap: space.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 44, paddingHorizontal: space.md, borderRadius: radius, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  chipCount: { fontSize: 18, fontWeight: '600', color: colors.slate },
  chipLabel: { flexShrink: 1 },
});
