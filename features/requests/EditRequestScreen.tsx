// A request already on Spanrelay, opened again in the five-step form by the contractor who filed
// it: a draft carried on and filed, or a request returned for revision prepared as its next
// revision and resubmitted with a word on what changed.
import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { RequestType } from '../../shared/requests/requestBody';
import { stateLabel } from '../../shared/requests/states';
import type { ProjectSummary, RequestDetail } from '../../shared/requests/types';
import { ApiError } from '../api/http';
import { useActor } from '../auth/useActor';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { useMyProjects, useRequestDetail } from './api';
import { editModeFor, filesOfCurrentRevision, revisionBody, type EditMode } from './filing/editRequest';
import { DraftFilingForm } from './filing/DraftFilingForm';
import { ReturnComment } from './filing/ReturnComment';
import { filingValuesFrom } from './filing/valuesFromDraft';
import { useFilingDraft } from './filing/useFilingDraft';
import { useFilingRun } from './filing/useFilingRun';
import { requestTypeLabel } from './format';

function BackLink({ id, label = 'Back to the request' }: { id: string; label?: string }) {
  return (
    <Link href={`/requests/${id}`} style={styles.link} testID="edit-back">
      {label}
    </Link>
  );
}

function EditForm({ r, mode, projects }: { r: RequestDetail; mode: EditMode; projects: ProjectSummary[] }) {
  const router = useRouter();
  const [opened] = useState(() => ({ detail: r, values: filingValuesFrom(revisionBody(r, r.currentRevision) ?? { type: r.type as RequestType, projectId: r.project.id }) }));
  const draft = useFilingDraft(opened);
  const revising = mode === 'revise';
  const fileLabel = revising ? `Resubmit as revision ${r.currentRevision}` : 'File the request';
  const run = useFilingRun(draft, {
    move: (saved, comment) => (revising ? { type: 'resubmit', version: saved.version, comment: comment ?? '' } : { type: 'submit', version: saved.version }),
    onFiled: (filed) => router.replace(revising ? `/requests/${filed.id}` : { pathname: '/requests/[id]', params: { id: filed.id, filed: '1' } }),
  });

  return (
    <>
      {draft.online ? null : (
        <Notice tone="caution" testID="filing-offline">
          {`You are offline. What you type is kept on this device; saving to Spanrelay and ${revising ? 'resubmitting' : 'filing'} wait for the connection.`}
        </Notice>
      )}
      {draft.ready ? (
        <DraftFilingForm
          draft={draft}
          run={run}
          projects={projects}
          blank={opened.values}
          projectLocked
          fileLabel={fileLabel}
          files={run.files.filter((f) => !run.savedFiles.has(f))}
          storedFiles={filesOfCurrentRevision(r)}
          resubmit={revising ? { revision: r.currentRevision, before: revisionBody(r, r.currentRevision - 1) } : undefined}
        />
      ) : (
        <ActivityIndicator accessibilityLabel="Opening the request" />
      )}
    </>
  );
}

export function EditRequestScreen() {
  const { id: raw } = useLocalSearchParams<{ id: string }>();
  const id = String(raw);
  const request = useRequestDetail(id);
  const projects = useMyProjects();
  const { data: actor } = useActor();
  // Decided once, when it opens: the form stays while its own resubmit moves the request on.
  const openedAs = useRef<EditMode | null>(null);

  const r = request.data;
  const projectList = projects.data;
  if ((!r && !request.error) || (!projectList && !projects.error) || actor === undefined) {
    return (
      <Screen>
        <View style={styles.loading} testID="edit-loading"><ActivityIndicator /><Text variant="muted">Loading the request…</Text></View>
      </Screen>
    );
  }
  if (!r || !projectList) {
    const failed = request.error ?? projects.error;
    const lasting = failed instanceof ApiError && failed.status >= 400 && failed.status < 500;
    return (
      <Screen>
        <Notice tone="error">{failed?.message ?? 'The request could not be loaded.'}</Notice>
        {lasting ? null : <Button kind="secondary" label="Try again" onPress={() => void Promise.all([request.refetch(), projects.refetch()])} />}
        <BackLink id={id} />
      </Screen>
    );
  }
  openedAs.current ??= editModeFor(r, actor?.id);
  const mode = openedAs.current;
  const project = projectList.find((p) => p.id === r.project.id);

  return (
    <Screen>
      <View style={styles.head}>
        <Text variant="label">{r.number} · {requestTypeLabel(r.type)}</Text>
        <Text variant="title" accessibilityRole="header" testID="edit-title">
          {mode === 'revise' ? `Revise the request: revision ${r.currentRevision}` : mode === 'continue' ? 'Continue the draft' : r.title}
        </Text>
        {mode ? <BackLink id={id} label={mode === 'revise' ? 'Back to the request without resubmitting' : 'Back to the request without filing'} /> : null}
      </View>
      {!mode || !project ? (
        <View style={styles.refused} testID="edit-not-allowed">
          <Notice tone="info">
            {r.filedBy.id !== actor?.id
              ? `Only ${r.filedBy.name}, who filed it, can change this request.`
              : `This request is ${stateLabel(r.state).toLowerCase()}; it can be changed only while it is a draft or has been returned to you for revision.`}
          </Notice>
          <BackLink id={id} />
        </View>
      ) : (
        <>
          {mode === 'revise' ? <ReturnComment r={r} testID="edit-return-comment" /> : null}
          {mode === 'revise' ? (
            <Text variant="muted">{`Revision ${r.currentRevision} starts as a copy of revision ${r.currentRevision - 1}. Change what was asked, add any files, and resubmit; the section engineer sees what changed.`}</Text>
          ) : null}
          <EditForm r={r} mode={mode} projects={projectList} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  loading: { gap: space.md, padding: space.lg, alignItems: 'flex-start' },
  refused: { gap: space.md },
  link: { color: colors.slate, textDecorationLine: 'underline', fontWeight: '600', minHeight: 44, paddingVertical: space.sm },
});
