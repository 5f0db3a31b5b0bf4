// The field inspector's list of conditions to confirm on site, grouped by request, oldest approval
// first. Other people on the project read the same list to see what is still open and what was met.
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { recentlyMetDays } from '../../shared/conditions/listQuery';
import type { ConditionListItem } from '../../shared/conditions/types';
import type { RequestDetail } from '../../shared/requests/types';
import { useActor } from '../auth/useActor';
import { requestKeys } from '../requests/api';
import { Button } from '../ui/Button';
import { Choice } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import { conditionKeys, fetchConditionList, useConditionList, type ConditionStatus } from './api';
import type { CardNotice } from './ConditionCard';
import { groupByRequest, itemFromDetail } from './grouping';
import { RequestConditions } from './RequestConditions';

const twoColumnsFrom = 1024;
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function Placeholder() {
  return (
    <View accessibilityLabel="Loading the conditions" testID="conditions-loading" style={styles.gap}>
      {[0, 1].map((i) => (
        <Panel key={i}>
          <View style={[styles.bar, { width: '30%' }]} />
          <View style={[styles.bar, styles.tall, { width: '70%' }]} />
          <View style={[styles.block]} />
        </Panel>
      ))}
    </View>
  );
}

export function ConditionsScreen() {
  const queryClient = useQueryClient();
  const { data: actor } = useActor();
  const { width } = useWindowDimensions();
  const [status, setStatus] = useState<ConditionStatus>('open');
  const [kept, setKept] = useState<Record<string, ConditionListItem>>({});
  const [notices, setNotices] = useState<Record<string, CardNotice>>({});
  const [lost, setLost] = useState<string | null>(null);
  const list = useConditionList(status);
  const inspector = actor?.role === 'field_inspector';

  function keep(item: ConditionListItem, notice: CardNotice) {
    setKept((k) => ({ ...k, [item.condition.id]: item }));
    setNotices((n) => ({ ...n, [item.condition.id]: notice }));
  }

  function onMet(item: ConditionListItem, detail: RequestDetail) {
    const closed = detail.state === 'closed';
    keep(itemFromDetail(detail, item), {
      tone: 'ok',
      text: closed
        ? `Marked satisfied. That was the last open condition: ${item.request.number} is closed, and the people on it are told by e-mail.`
        : 'Marked satisfied. It is on the request’s trail with your note and evidence.',
    });
  }

  // Someone else moved the request first: look at it as it is now and say what happened.
  async function onConflict(item: ConditionListItem, message: string) {
    setLost(null);
    let now: ConditionListItem | undefined;
    try {
      const all = await queryClient.fetchQuery({ queryKey: conditionKeys.list('all'), queryFn: () => fetchConditionList('all'), staleTime: 0 });
      now = all.items.find((i) => i.condition.id === item.condition.id);
    } catch {
      now = undefined;
    }
    // The open list and any request on screen are stale too (a refused upload refreshes nothing).
    void queryClient.invalidateQueries({ queryKey: conditionKeys.all });
    void queryClient.invalidateQueries({ queryKey: requestKeys.all });
    if (now?.condition.satisfied) {
      keep(now, { tone: 'caution', text: `${now.condition.satisfiedBy?.name ?? 'Someone else'} marked this condition satisfied while you were working, so yours was not recorded. A file you sent stays on the request.` });
    } else if (now) {
      setNotices((n) => ({ ...n, [item.condition.id]: { tone: 'caution', text: `${message} The list now shows the request as it is; check the condition and press the button again.` } }));
    } else {
      setLost(`${item.request.number} changed while you were working and condition ${item.condition.seq} is no longer open to you. The list has been refreshed.`);
    }
  }

  const groups = list.data ? groupByRequest(list.data.items, Object.values(kept)) : [];
  const openCount = groups.reduce((n, g) => n + g.items.filter((i) => !i.condition.satisfied).length, 0);
  const wide = width >= twoColumnsFrom;
  const columns = wide ? [groups.filter((_, i) => i % 2 === 0), groups.filter((_, i) => i % 2 === 1)] : [groups];

  return (
    <Screen wide>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">Conditions on site</Text>
        <Text variant="muted">
          {inspector
            ? 'When an engineer of record approves a request with conditions, each condition is confirmed here on site with a note and a photo or document. The request closes when its last condition is met.'
            : 'Conditions set on approvals in your projects, and who confirmed each one on site. The field inspector marks them met.'}
        </Text>
      </View>

      <View style={styles.filters} accessibilityRole="radiogroup" accessibilityLabel="Which conditions to show">
        <Choice compact label="Open" chosen={status === 'open'} onPress={() => setStatus('open')} testID="conditions-show-open" />
        <Choice compact label={`Open and met in the last ${recentlyMetDays} days`} chosen={status === 'all'} onPress={() => setStatus('all')} testID="conditions-show-all" />
      </View>

      {lost ? <Notice tone="caution" testID="conditions-lost">{lost}</Notice> : null}
      {list.isPending ? <Placeholder /> : null}
      {list.error ? (
        <View style={styles.gap}>
          <Notice tone="error" testID="conditions-error">{`The conditions could not be loaded: ${list.error.message}`}</Notice>
          <View style={styles.row}>
            <Button kind="secondary" label="Try again" busy={list.isFetching} onPress={() => void list.refetch()} testID="conditions-retry" />
          </View>
        </View>
      ) : null}

      {list.data ? (
        <View style={styles.gap} testID="conditions-list">
          {groups.length === 0 ? (
            <Notice tone="info" testID="conditions-empty">
              {status === 'open'
                ? 'No conditions are open on your projects. When an engineer of record approves a request with conditions, each condition comes here to be confirmed on site with a note and a photo or document.'
                : `No conditions are open, and none was met in the last ${recentlyMetDays} days. Conditions come here when an engineer of record approves a request with conditions.`}
            </Notice>
          ) : (
            <Text variant="muted" accessibilityLiveRegion="polite" testID="conditions-count">
              {plural(openCount, 'open condition', 'open conditions')} on {plural(groups.length, 'request', 'requests')}
              {list.isRefetching ? ' · checking for changes…' : ''}
            </Text>
          )}
          {list.data.truncated ? <Notice tone="info">Only the first conditions are shown; open a request to see all of its own.</Notice> : null}
          <View style={wide ? styles.columns : styles.gap}>
            {columns.map((column, i) => (
              <View key={i} style={wide ? styles.column : styles.gap}>
                {column.map((g) => (
                  <RequestConditions key={g.request.id} group={g} maySatisfy={inspector} notices={notices} onMet={onMet} onConflict={(item, m) => void onConflict(item, m)} />
                ))}
              </View>
            ))}
          </View>
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs, maxWidth: 760 },
  filters: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  gap: { gap: space.lg },
  row: { flexDirection: 'row' },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  column: { flex: 1, gap: space.lg, minWidth: 0 },
  bar: { height: 14, borderRadius: radius, backgroundColor: colors.slateLight },
  tall: { height: 22 },
  block: { height: 90, borderRadius: radius, backgroundColor: colors.concrete },
});
