// Filing takes three calls: save the draft, store its files, submit it. Each can fail on its own;
// once the draft exists it is reused on the next try, so a retry never files the request twice
// and nothing typed or uploaded is lost. What is typed is also kept on the device meanwhile.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { RequestBody } from '../../shared/requests/requestBody';
import type { RequestDetail } from '../../shared/requests/types';
import { ApiError } from '../api/http';
import { browserOnline } from '../drafts/useOnline';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { UploadProgressList } from '../uploads/UploadProgressList';
import { useFileUploads } from '../uploads/useFileUploads';
import { requestKeys, useCreateDraft, useMyProjects, useUpdateDraft, useWorkflowEvent, type PickedFile } from './api';
import { DeviceDraftOffer } from './filing/DeviceDraftOffer';
import { fetchFreshDetail } from './filing/freshDraft';
import { fieldFor } from './filing/formSchema';
import { emptyFiling } from './filing/formValues';
import { isOffline, useFilingDraft, type KeptDraft } from './filing/useFilingDraft';
import { RequestFilingForm } from './RequestFilingForm';

type Phase = 'save' | 'upload' | 'submit';

type Failure = { phase: Phase; error: ApiError };

const phaseFailed: Record<Phase, string> = {
  save: 'The draft was not saved.',
  upload: 'The draft is saved, but its files were not stored.',
  submit: 'The draft and its files are saved, but it was not sent to the section engineer.',
};

function asApiError(err: unknown): ApiError {
  return err instanceof ApiError ? err : new ApiError(0, 'unexpected', err instanceof Error ? err.message : 'Something went wrong.');
}

const offlineError = () => new ApiError(0, 'offline', 'Spanrelay cannot be reached. Check the connection and try again.');

export function NewRequestScreen() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const projects = useMyProjects();
  const createDraft = useCreateDraft();
  const updateDraft = useUpdateDraft();
  const uploads = useFileUploads();
  const workflow = useWorkflowEvent();
  const draft = useFilingDraft();

  const [phase, setPhase] = useState<Phase | null>(null);
  const [failure, setFailure] = useState<Failure | null>(null);
  const [files, setFiles] = useState<PickedFile[]>([]);
  // Identity, not name: two files may share a name, and a saved one must not be sent again.
  const saved = useRef(new Set<PickedFile>());
  const [savedFiles, setSavedFiles] = useState<ReadonlySet<PickedFile>>(new Set());

  function changeFiles(next: PickedFile[]) {
    setFiles(next);
    draft.keepFiles(next.filter((f) => !saved.current.has(f)).map((f) => f.name));
  }

  // Files picked for another draft do not belong to this one.
  function carryOn(d: KeptDraft) {
    setFailure(null);
    setFiles([]);
    saved.current = new Set();
    setSavedFiles(new Set());
    uploads.reset();
    void draft.carryOn(d);
  }

  async function file(body: RequestBody) {
    setFailure(null);
    let current = draft.server;
    let at: Phase = 'save';
    try {
      setPhase('save');
      if (!browserOnline()) throw offlineError();
      const stored: RequestDetail = current ? await updateDraft.mutateAsync({ id: current.id, version: current.version, body }) : await createDraft.mutateAsync(body);
      current = { id: stored.id, version: stored.version, number: stored.number };
      draft.setServer(current);

      const pending = files.filter((f) => !saved.current.has(f));
      if (pending.length > 0) {
        at = 'upload';
        setPhase('upload');
        const draftId = current.id;
        try {
          // One file at a time with its own bar; a file the person cancels is left out of this filing.
          const sent = await uploads.sendAll(`/api/requests/${encodeURIComponent(draftId)}/attachments?purpose=revision`, pending.map((f) => ({ name: f.name, size: f.size, blob: f.blob })));
          sent.forEach((a, i) => a && saved.current.add(pending[i]!));
        } finally {
          setSavedFiles(new Set(saved.current));
          draft.keepFiles(files.filter((f) => !saved.current.has(f)).map((f) => f.name));
          void queryClient.invalidateQueries({ queryKey: requestKeys.detail(draftId) });
        }
      }

      at = 'submit';
      setPhase('submit');
      const submitted = await workflow.mutateAsync({ id: current.id, event: { type: 'submit', version: current.version } });
      draft.forget();
      router.replace({ pathname: '/requests/[id]', params: { id: submitted.id, filed: '1' } });
    } catch (err) {
      const error = asApiError(err);
      if (at === 'save' && isOffline(error)) draft.queueHere();
      if (current) {
        // The draft may have moved on under us (a submit that went through though its answer was
        // lost, or a newer version): read it again before deciding what to tell the person.
        const fresh = await fetchFreshDetail(queryClient, current.id).catch(() => null);
        if (fresh && fresh.state !== 'drafting') {
          draft.forget();
          router.replace(`/requests/${fresh.id}`);
          return;
        }
        if (fresh) draft.setServer({ id: fresh.id, version: fresh.version, number: fresh.number });
      }
      setFailure({ phase: at, error });
    } finally {
      setPhase(null);
    }
  }

  const progress =
    phase === 'save' ? 'Saving the draft…' : phase === 'upload' ? 'Storing the files…' : phase === 'submit' ? 'Sending it to the section engineer…' : null;
  const unplaced = Object.entries(failure?.error.fields ?? {}).filter(([path]) => !fieldFor(path.split('.')));
  // Beside the buttons, where the eye is on a long form.
  const failureNotice = failure ? (
    <View style={styles.failure} accessibilityLiveRegion="assertive" testID="filing-failure">
      <Notice tone="error">{`${phaseFailed[failure.phase]} The server answered: ${failure.error.message}`}</Notice>
      {unplaced.map(([path, message]) => (
        <Text key={path} variant="muted" style={styles.detail}>{path === '_' ? message : `${path}: ${message}`}</Text>
      ))}
      {draft.server ? (
        <Text variant="muted">
          Draft {draft.server.number} keeps what you entered. Press “File the request” to try again, or{' '}
          <Link href={`/requests/${draft.server.id}`} style={styles.link} testID="filing-draft-link">open the draft</Link>.
        </Text>
      ) : null}
    </View>
  ) : null;

  const single = projects.data?.length === 1 ? projects.data[0]!.id : '';

  return (
    <Screen>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">New request</Text>
        <Text variant="muted">
          A departure from the sealed plans needs approval before the work is done. It goes first to the section engineer, then to central office and the engineer of record.
        </Text>
      </View>
      {draft.online ? null : (
        <Notice tone="caution" testID="filing-offline">
          You are offline. What you type is kept on this device; saving to Spanrelay and filing wait for the connection.
        </Notice>
      )}
      <DeviceDraftOffer drafts={draft.kept} onCarryOn={carryOn} onDiscard={draft.discard} />
      {projects.isPending || !draft.ready ? <ActivityIndicator accessibilityLabel="Loading your projects" /> : null}
      {projects.error ? <Notice tone="error">{projects.error.message}</Notice> : null}
      {projects.data && projects.data.length === 0 ? <Notice tone="info">You are not a member of any project yet; ask your administrator.</Notice> : null}
      {projects.data && projects.data.length > 0 && draft.ready ? (
        <RequestFilingForm
          key={draft.seed.key}
          projects={projects.data}
          initialValues={draft.seed.values ?? emptyFiling('other_deviation', single)}
          initialStep={draft.seed.step}
          busy={phase !== null}
          progress={progress}
          projectLocked={draft.server !== null}
          files={files}
          onFilesChange={changeFiles}
          savedFiles={savedFiles}
          offline={!draft.online}
          pickAgain={draft.seed.pickAgain}
          serverFieldErrors={failure?.error.fields}
          status={
            <>
              <UploadProgressList items={uploads.items} onCancel={uploads.cancel} />
              {failureNotice}
            </>
          }
          saving={draft.saving}
          draftNotice={draft.notice}
          onKeep={draft.keep}
          onSaveDraft={(values, step) => void draft.save(values, step)}
          onSubmit={(body) => void file(body)}
        />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  failure: { gap: space.sm },
  detail: { color: colors.danger },
  link: { color: colors.slate, textDecorationLine: 'underline', fontWeight: '600' },
});
