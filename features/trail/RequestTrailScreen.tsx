// One request's trail for the auditor: the chain check first and plainly, the files to take away,
// then every entry as a timeline. On a wide screen the timeline reads on the left and the check
// and the files stay on the right.
import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { useEffect } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { RequestDetail } from '../../shared/requests/types';
import { trailDecisionLabels, type TrailDecision } from '../../shared/trail/trailSearch';
import { useRequestDetail, useTrailCheck } from '../requests/api';
import { TrailTimeline } from '../requests/TrailTimeline';
import { useBreakpoint } from '../ui/breakpoints';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { decisionRecordUrl, trailCsvUrl } from './api';
import { useDownload } from './useDownload';

function ChainCheck({ r }: { r: RequestDetail }) {
  const check = useTrailCheck(r.id);
  const { refetch } = check;
  // The check is the point of this screen, so it runs on arrival rather than on request.
  useEffect(() => {
    void refetch();
  }, [r.id, refetch]);
  const result = check.data;
  const lastHash = r.trail.at(-1)?.hash;
  return (
    <Panel title="Chain check" emphasis testID="trail-chain">
      {check.isFetching ? (
        <View style={styles.row} accessibilityLiveRegion="polite">
          <ActivityIndicator />
          <Text variant="muted">Recomputing every link of the chain…</Text>
        </View>
      ) : check.error ? (
        <Notice tone="error">{`The chain could not be checked: ${check.error.message}`}</Notice>
      ) : result?.ok ? (
        <Notice tone="ok" testID="trail-verify-result">{`Verified: all ${result.events} entries link up; none has been changed or removed since it was written.`}</Notice>
      ) : result ? (
        <Notice tone="error" testID="trail-verify-result">{`Broken at entry ${result.brokenAt}: the record from there on cannot be trusted. Tell your administrator.`}</Notice>
      ) : null}
      {lastHash ? (
        <View style={styles.hash}>
          <Text variant="label">Last hash (entry {r.trail.length})</Text>
          <Text variant="mono" selectable testID="trail-last-hash">{lastHash}</Text>
        </View>
      ) : null}
      <Button kind="secondary" label={check.error ? 'Try the check again' : 'Check again'} busy={check.isFetching} onPress={() => void refetch()} testID="trail-verify-again" />
    </Panel>
  );
}

function Exports({ r }: { r: RequestDetail }) {
  const download = useDownload();
  const files = [
    { url: trailCsvUrl(r.id), name: `${r.number}-trail.csv`, label: 'Download the trail (CSV)', testID: 'trail-export-csv' },
    { url: decisionRecordUrl(r.id), name: `${r.number}-decision-record.pdf`, label: 'Download the decision record (PDF)', testID: 'trail-export-pdf' },
  ];
  return (
    <Panel title="Take it with you" testID="trail-exports">
      <Text variant="muted">
        The CSV holds every entry with its hash and the exact text hashed, so anyone can recompute the chain. The decision record is made now, from the request as it stands{r.decision ? '' : ': it says the request is not decided yet'}.
      </Text>
      {files.map((f) => (
        <View key={f.testID} style={styles.file}>
          <Button kind="secondary" label={f.label} busy={download.busy === f.url} onPress={() => void download.start(f.url, f.name)} testID={f.testID} />
          {download.error?.url === f.url ? <Notice tone="error">{`${download.error.message} Press the button to try again.`}</Notice> : null}
        </View>
      ))}
    </Panel>
  );
}

function Header({ r }: { r: RequestDetail }) {
  const decision: TrailDecision = (r.decision as TrailDecision | null) ?? 'undecided';
  return (
    <View style={styles.header} testID="trail-request">
      <Text variant="label">{r.number} · {stateLabel(r.state)} · {trailDecisionLabels[decision]}</Text>
      <Text variant="title" accessibilityRole="header">{r.title}</Text>
      <Text variant="muted">{r.project.name} · structure {r.project.structureNumber}</Text>
      <Link href={`/requests/${r.id}`} style={styles.link} accessibilityRole="link">Open the request</Link>
    </View>
  );
}

export function RequestTrailScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const request = useRequestDetail(String(id));
  const { isWide } = useBreakpoint();
  const beside = isWide;
  const back = () => (router.canGoBack() ? router.back() : router.replace('/trail'));

  let body;
  if (request.isPending) {
    body = (
      <View style={styles.row} testID="trail-loading">
        <ActivityIndicator />
        <Text variant="muted">Loading the trail…</Text>
      </View>
    );
  } else if (request.error) {
    body = (
      <View style={styles.stack}>
        <Notice tone="error">{request.error.message}</Notice>
        <Button kind="secondary" label="Try again" onPress={() => void request.refetch()} />
      </View>
    );
  } else {
    const r = request.data;
    const side = (
      <>
        <ChainCheck r={r} />
        <Exports r={r} />
      </>
    );
    const timeline = <TrailTimeline requestId={r.id} trail={r.trail} showCheck={false} />;
    body = (
      <>
        <Header r={r} />
        {beside ? (
          <View style={styles.columns}>
            <View style={styles.main}>{timeline}</View>
            <View style={styles.side}>{side}</View>
          </View>
        ) : (
          <>
            {side}
            {timeline}
          </>
        )}
      </>
    );
  }

  return (
    <Screen wide>
      <View style={styles.top}>
        <Button kind="quiet" label="‹ Back to the search" onPress={back} testID="trail-back" />
      </View>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  top: { alignItems: 'flex-start', marginLeft: -space.lg },
  header: { gap: space.xs },
  link: { color: colors.slate, textDecorationLine: 'underline', paddingVertical: space.sm, alignSelf: 'flex-start', minHeight: 44 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  stack: { gap: space.md, alignItems: 'flex-start' },
  hash: { gap: space.xs },
  file: { gap: space.sm },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  main: { flex: 3, minWidth: 0 },
  side: { flex: 2, gap: space.lg, minWidth: 0 },
});
