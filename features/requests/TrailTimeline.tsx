// The request's trail, oldest first, as the record reads: who did what, from which desk, and what
// they said. The chain check asks the server to recompute every link.
import { StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { TrailEntry } from '../../shared/requests/types';
import { roleLabels } from '../../shared/roles';
import { workflowEventPastTense } from '../../shared/workflow/events';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { pendingTrailHash, useTrailCheck } from './api';
import { formatWhen } from './format';

function whatHappened(e: TrailEntry): string {
  const said = (workflowEventPastTense as Record<string, string>)[e.eventType] ?? e.eventType;
  const eorName = typeof e.payload.eorName === 'string' ? e.payload.eorName : null;
  if ((e.eventType === 'route' || e.eventType === 'reassign') && eorName) return `${said}: ${eorName}`;
  if (e.eventType === 'approve_with_conditions' && Array.isArray(e.payload.conditions)) {
    const n = e.payload.conditions.length;
    return `${said} (${n} ${n === 1 ? 'condition' : 'conditions'})`;
  }
  if (e.eventType === 'submit' || e.eventType === 'resubmit') {
    return typeof e.payload.revision === 'number' && e.payload.revision > 1 ? `${said} (revision ${e.payload.revision})` : said;
  }
  return said;
}

// `showCheck` off where the screen around it shows the chain check itself (the auditor's trail view).
export function TrailTimeline({ requestId, trail, showCheck = true }: { requestId: string; trail: TrailEntry[]; showCheck?: boolean }) {
  const check = useTrailCheck(requestId);
  const result = showCheck ? check.data : undefined;
  return (
    <Panel
      title="Trail"
      testID="request-trail"
      aside={showCheck ? <Button kind="quiet" label="Check the chain" busy={check.isFetching} onPress={() => void check.refetch()} testID="trail-verify" /> : undefined}
    >
      {showCheck && check.error ? <Notice tone="error">{check.error.message}</Notice> : null}
      {result && !check.isFetching ? (
        result.ok ? (
          <Notice tone="ok" testID="trail-verify-result">{`All ${result.events} entries link up; none has been changed or removed.`}</Notice>
        ) : (
          <Notice tone="error" testID="trail-verify-result">{`The chain is broken at entry ${result.brokenAt}: the record from there on cannot be trusted. Tell your administrator.`}</Notice>
        )
      ) : null}
      <View style={styles.list}>
        {trail.map((e, i) => {
          const moved = e.stateBefore !== e.stateAfter;
          const last = i === trail.length - 1;
          return (
            <View key={e.seq} style={styles.entry} testID="trail-entry">
              <View style={styles.rail}>
                <View style={[styles.dot, moved ? styles.dotMoved : null]} />
                {last ? null : <View style={styles.line} />}
              </View>
              <View style={[styles.body, last ? null : styles.bodyGap]}>
                <Text variant="muted">{formatWhen(e.at)}</Text>
                <Text variant="label">
                  {e.actor.name} · {roleLabels[e.actorRole] ?? e.actorRole}
                </Text>
                <Text>{whatHappened(e)}</Text>
                {moved ? <Text variant="muted">Now: {stateLabel(e.stateAfter)}</Text> : null}
                {e.hash === pendingTrailHash ? <Text variant="muted" testID="trail-entry-sending">Sending…</Text> : null}
                {e.comment ? (
                  <View style={styles.comment}>
                    <Text>{e.comment}</Text>
                  </View>
                ) : null}
              </View>
            </View>
          );
        })}
      </View>
    </Panel>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  entry: { flexDirection: 'row', gap: space.md },
  rail: { width: 14, alignItems: 'center' },
  dot: { width: 12, height: 12, borderRadius: 6, borderWidth: 2, borderColor: colors.slate, backgroundColor: colors.surface, marginTop: 4 },
  dotMoved: { backgroundColor: colors.slate },
  line: { flex: 1, width: 2, backgroundColor: colors.line, marginTop: 2 },
  body: { flex: 1, gap: 2 },
  bodyGap: { paddingBottom: space.lg },
  comment: { marginTop: space.xs, backgroundColor: colors.concrete, borderRadius: 4, padding: space.sm, borderLeftWidth: 3, borderLeftColor: colors.line },
});
