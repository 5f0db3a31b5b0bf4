// One request: what it asks, its files and conditions, the trail, and what this person may do now.
// On a wide screen the reading goes on the left and the move and the record on the right.
import { Link, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, Linking, Platform, Pressable, StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { AttachmentSummary, ConditionView, RequestDetail } from '../../shared/requests/types';
import { ApiError } from '../api/http';
import { useActor } from '../auth/useActor';
import { useBreakpoint } from '../ui/breakpoints';
import { Button } from '../ui/Button';
import { Choice } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { AttachmentThumbnail } from '../uploads/AttachmentThumbnail';
import { Panel } from '../ui/Panel';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { ActionPanel } from './ActionPanel';
import { attachmentUrl, useRequestDetail } from './api';
import { ReviseEntry } from './filing/ReviseEntry';
import { formatBytes, formatWhen, requestTypeLabel } from './format';
import { RequestBodyView } from './RequestBodyView';
import { TrailTimeline } from './TrailTimeline';

function openAttachment(id: string, download = false) {
  const url = attachmentUrl(id, download);
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
      <View style={styles.headerLinks}>
        <Link href={`/trail/${r.id}`} asChild>
          <Pressable accessibilityRole="link" style={styles.textLink} testID="request-open-trail">
            <Text variant="label" style={styles.linkText}>Full trail, chain check and exports</Text>
          </Pressable>
        </Link>
      </View>
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
          <View style={styles.fileButtons}>
            <Button kind="secondary" label="Open" accessibilityLabel={`Open ${a.fileName}`} onPress={() => openAttachment(a.id)} testID="attachment-open" />
            <Button kind="quiet" label="Download" accessibilityLabel={`Download ${a.fileName}`} onPress={() => openAttachment(a.id, true)} testID="attachment-download" />
          </View>
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

// Which revision the reader is looking at: the current one unless they pick an earlier one.
function RevisionPicker({ r, shown, onPick }: { r: RequestDetail; shown: number; onPick: (revision: number) => void }) {
  if (r.revisions.length < 2) return null;
  return (
    <View style={styles.revisions} accessibilityRole="radiogroup" accessibilityLabel="Revision shown" testID="request-revisions">
      <Text variant="label">Revisions</Text>
      <View style={styles.revisionRow}>
        {r.revisions.map((v) => (
          <Choice
            key={v.revision}
            compact
            label={`Revision ${v.revision}${v.revision === r.currentRevision ? ' (current)' : ''}`}
            detail={v.submittedAt ? `Filed ${formatWhen(v.submittedAt)}` : 'Not filed yet'}
            chosen={shown === v.revision}
            onPress={() => onPick(v.revision)}
            testID={`request-revision-${v.revision}`}
          />
        ))}
      </View>
    </View>
  );
}

// The request itself, as a page of its own or in the pane beside a list on a wide screen. A page on
// a wide screen reads on the left and acts on the right; a pane is one column.
export function RequestDetailView({ id, inPane = false, filed = false }: { id: string; inPane?: boolean; filed?: boolean }) {
  const request = useRequestDetail(id);
  const { data: actor } = useActor();
  const { isWide } = useBreakpoint();
  const [picked, setPicked] = useState<number | null>(null);

  if (request.isPending) return <View style={styles.loading} testID="request-loading"><ActivityIndicator /><Text variant="muted">Loading the request…</Text></View>;
  if (request.error) {
    return (
      <View style={styles.loading}>
        <Notice tone="error">{request.error.message}</Notice>
        {/* A missing request stays missing; a dropped connection may come back. */}
        {request.error instanceof ApiError && request.error.status >= 400 && request.error.status < 500 ? null : (
          <Button kind="secondary" label="Try again" onPress={() => void request.refetch()} />
        )}
      </View>
    );
  }
  const r = request.data;
  const shown = picked ?? r.currentRevision;
  const revision = r.revisions.find((v) => v.revision === shown) ?? r.revisions[r.revisions.length - 1];
  const twoColumns = isWide && !inPane;

  const reading = (
    <>
      <RevisionPicker r={r} shown={shown} onPick={(v) => setPicked(v === r.currentRevision ? null : v)} />
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
    <View style={styles.view}>
      <Header r={r} />
      {filed && r.state === 'section_review' ? (
        <Notice tone="ok" testID="request-filed">The request is filed. It is with the section engineer, who has been told by e-mail; you are told by e-mail when it comes back to you or is decided.</Notice>
      ) : null}
      <ReviseEntry request={r} actorId={actor?.id} />
      {request.isRefetching ? <Text variant="muted" accessibilityLiveRegion="polite">Checking for changes…</Text> : null}
      {twoColumns ? (
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
    </View>
  );
}

export function RequestDetailScreen() {
  const { id, filed } = useLocalSearchParams<{ id: string; filed?: string }>();
  const { isWide } = useBreakpoint();
  return (
    <Screen wide={isWide}>
      <RequestDetailView id={String(id)} filed={filed === '1'} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.lg },
  loading: { gap: space.md, padding: space.lg, alignItems: 'flex-start' },
  revisions: { gap: space.sm },
  revisionRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  header: { gap: space.xs },
  headerTop: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  state: { backgroundColor: colors.slateLight, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  stateText: { color: colors.slate },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  main: { flex: 3, gap: space.lg, minWidth: 0 },
  side: { flex: 2, gap: space.lg, minWidth: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  grow: { flex: 1 },
  headerLinks: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  textLink: { minHeight: 44, justifyContent: 'center' },
  linkText: { color: colors.slate, textDecorationLine: 'underline' },
  fileButtons: { gap: space.xs },
  condition: { gap: 2, borderLeftWidth: 3, borderLeftColor: colors.line, paddingLeft: space.md },
  ok: { color: colors.ok },
  openText: { color: colors.caution },
});
