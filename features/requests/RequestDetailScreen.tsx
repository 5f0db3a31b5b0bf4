// One request: what it asks, its files and conditions, the trail, and what this person may do now.
// On a wide screen the reading goes on the left and the move and the record on the right.
import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator, Linking, Platform, StyleSheet, useWindowDimensions, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { AttachmentSummary, ConditionView, RequestDetail } from '../../shared/requests/types';
import { useActor } from '../auth/useActor';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { AttachmentThumbnail } from '../uploads/AttachmentThumbnail';
import { Panel } from '../ui/Panel';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { ActionPanel } from './ActionPanel';
import { attachmentUrl, useRequestDetail } from './api';
import { formatBytes, formatWhen, requestTypeLabel } from './format';
import { RequestBodyView } from './RequestBodyView';
import { TrailTimeline } from './TrailTimeline';

const twoColumnsFrom = 1024;

function openAttachment(id: string) {
  const url = attachmentUrl(id);
  if (Platform.OS === 'web') window.open(url, '_blank', 'noopener');
  else void Linking.openURL(url);
}

const purposeLabels: Record<string, string> = {
  revision: 'Filed with the request',
  information_response: 'Answer to a question',
  federal_concurrence: 'Federal concurrence letter',
  condition_evidence: 'Evidence for a condition',
  decision_record: 'Decision record',
};

function Header({ r }: { r: RequestDetail }) {
  return (
    <View style={styles.header} testID="request-detail">
      <View style={styles.headerTop}>
        <Text variant="label">{r.number} · {requestTypeLabel(r.type)}</Text>
        <View style={styles.state}>
          <Text variant="label" style={styles.stateText} testID="request-state">{stateLabel(r.state)}</Text>
        </View>
      </View>
      <Text variant="title" accessibilityRole="header">{r.title}</Text>
      <Text variant="muted">{r.project.name} · structure {r.project.structureNumber}</Text>
      <Text variant="muted">
        {r.state === 'drafting' ? 'Started' : 'Filed'} {formatWhen(r.createdAt)} by {r.filedBy.name}{r.filedBy.organization ? `, ${r.filedBy.organization}` : ''}
        {r.currentRevision > 1 ? ` · revision ${r.currentRevision}` : ''}
      </Text>
      {r.assignedEor ? <Text variant="muted">Engineer of record: {r.assignedEor.name}{r.assignedEor.organization ? `, ${r.assignedEor.organization}` : ''}</Text> : null}
      <Text variant="muted">In this state since {formatWhen(r.deskSince)}</Text>
    </View>
  );
}

function Attachments({ files }: { files: AttachmentSummary[] }) {
  return (
    <Panel title={`Attachments (${files.length})`} testID="request-attachments">
      {files.length === 0 ? <Text variant="muted">None.</Text> : null}
      {files.map((a) => (
        <View key={a.id} style={styles.row}>
          <AttachmentThumbnail id={a.id} contentType={a.contentType} fileName={a.fileName} />
          <View style={styles.grow}>
            <Text>{a.fileName}</Text>
            <Text variant="muted">
              {purposeLabels[a.purpose] ?? a.purpose}, revision {a.revision} · {formatBytes(a.sizeBytes)} · {a.uploadedBy}, {formatWhen(a.uploadedAt)}
            </Text>
            <Text variant="muted">SHA-256 {a.sha256.slice(0, 12)}…</Text>
          </View>
          <Button kind="secondary" label="Open" onPress={() => openAttachment(a.id)} />
        </View>
      ))}
    </Panel>
  );
}

function Conditions({ conditions }: { conditions: ConditionView[] }) {
  if (conditions.length === 0) return null;
  const open = conditions.filter((c) => !c.satisfied).length;
  return (
    <Panel title={`Conditions (${open} open of ${conditions.length})`} testID="request-conditions">
      {conditions.map((c) => (
        <View key={c.id} style={styles.condition}>
          <Text variant="label">{c.seq}. {c.text}</Text>
          <Text variant="muted">Due {c.dueBefore}</Text>
          {c.satisfied ? (
            <Text variant="muted" style={styles.ok}>
              Met{c.satisfiedBy ? ` (${c.satisfiedBy.name}` : ''}{c.satisfiedAt ? `, ${formatWhen(c.satisfiedAt)}` : ''}{c.satisfiedBy ? ')' : ''}{c.note ? `: ${c.note}` : ''}
            </Text>
          ) : (
            <Text variant="muted" style={styles.openText}>Open</Text>
          )}
        </View>
      ))}
    </Panel>
  );
}

export function RequestDetailScreen() {
  const { id, filed } = useLocalSearchParams<{ id: string; filed?: string }>();
  const request = useRequestDetail(String(id));
  const { data: actor } = useActor();
  const { width } = useWindowDimensions();

  if (request.isPending) return <Screen><ActivityIndicator /></Screen>;
  if (request.error) return <Screen><Notice tone="error">{request.error.message}</Notice></Screen>;
  const r = request.data;
  const revision = r.revisions.find((v) => v.revision === r.currentRevision) ?? r.revisions[r.revisions.length - 1];
  const wide = width >= twoColumnsFrom;

  const reading = (
    <>
      {revision ? <RequestBodyView revision={revision} /> : <Notice tone="info">This request has no revision to show.</Notice>}
      <Conditions conditions={r.conditions} />
      <Attachments files={r.attachments} />
    </>
  );
  const acting = (
    <>
      <ActionPanel request={r} actorRole={actor?.role} />
      <TrailTimeline requestId={r.id} trail={r.trail} />
    </>
  );

  return (
    <Screen wide={wide}>
      <Header r={r} />
      {filed === '1' && r.state === 'section_review' ? (
        <Notice tone="ok" testID="request-filed">The request is filed. It is with the section engineer, who has been told by e-mail; you are told by e-mail when it comes back to you or is decided.</Notice>
      ) : null}
      {request.isRefetching ? <Text variant="muted" accessibilityLiveRegion="polite">Checking for changes…</Text> : null}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.main}>{reading}</View>
          <View style={styles.side}>{acting}</View>
        </View>
      ) : (
        <>
          {reading}
          {acting}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  headerTop: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  state: { backgroundColor: colors.slateLight, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  stateText: { color: colors.slate },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  main: { flex: 3, gap: space.lg, minWidth: 0 },
  side: { flex: 2, gap: space.lg, minWidth: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  grow: { flex: 1 },
  condition: { gap: 2, borderLeftWidth: 3, borderLeftColor: colors.line, paddingLeft: space.md },
  ok: { color: colors.ok },
  openText: { color: colors.caution },
});
