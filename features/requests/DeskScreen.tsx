// What waits at the signed-in person's desk, then everything else they may see.
import { useRouter } from 'expo-router';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { roleLabels } from '../../shared/roles';
import { useActor } from '../auth/useActor';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import { useRequestList } from './api';
import { RequestCard } from './RequestCard';

const count = (n: number, more: boolean) => `${n}${more ? '+' : ''}`;

export function DeskScreen() {
  const router = useRouter();
  const { data: actor } = useActor();
  const desk = useRequestList({ desk: 'mine' });
  const all = useRequestList({ desk: 'all' });
  const deskIds = new Set(desk.items.map((r) => r.id));
  const elsewhere = all.items.filter((r) => !deskIds.has(r.id));

  return (
    <Screen wide>
      <View style={styles.head}>
        <View style={styles.headText}>
          <Text variant="title" accessibilityRole="header">My desk</Text>
          {actor ? <Text variant="muted">{roleLabels[actor.role]} · {actor.organization ?? actor.email}</Text> : null}
        </View>
        {actor?.role === 'contractor' ? <Button label="New request" onPress={() => router.push('/requests/new')} testID="desk-new-request" /> : null}
      </View>

      <Text variant="heading" accessibilityRole="header">Waiting for me ({count(desk.items.length, desk.hasNextPage)})</Text>
      {desk.isPending ? <ActivityIndicator /> : null}
      {desk.error ? <Notice tone="error">{desk.error.message}</Notice> : null}
      {desk.isSuccess && desk.items.length === 0 ? <Notice tone="info">Nothing is waiting at your desk.</Notice> : null}
      <View style={styles.list} testID="desk-waiting">
        {desk.items.map((r) => <RequestCard key={r.id} request={r} />)}
      </View>
      {desk.hasNextPage ? (
        <Button kind="secondary" label="Show more waiting for me" busy={desk.isFetchingNextPage} onPress={() => void desk.fetchNextPage()} testID="desk-waiting-more" />
      ) : null}

      {all.error ? <Notice tone="error">{all.error.message}</Notice> : null}
      {elsewhere.length > 0 ? (
        <>
          <Text variant="heading" accessibilityRole="header">On other desks ({count(elsewhere.length, all.hasNextPage)})</Text>
          <View style={styles.list} testID="desk-elsewhere">
            {elsewhere.map((r) => <RequestCard key={r.id} request={r} />)}
          </View>
          {all.hasNextPage ? (
            <Button kind="secondary" label="Show more" busy={all.isFetchingNextPage} onPress={() => void all.fetchNextPage()} testID="desk-elsewhere-more" />
          ) : null}
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.lg, flexWrap: 'wrap' },
  headText: { gap: space.xs, flexShrink: 1 },
  list: { gap: space.md },
});
