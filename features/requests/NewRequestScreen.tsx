// Filing takes three calls: save the draft, store its files, submit it. Each can fail on its own;
// once the draft exists it is reused on the next try, so a retry never files the request twice
// and nothing typed or uploaded is lost.
import { useQueryClient } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { RequestBody } from '../../shared/requests/requestBody';
import type { RequestDetail } from '../../shared/requests/types';
import { ApiError, apiFetch } from '../api/http';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { requestKeys, useCreateDraft, useMyProjects, useUpdateDraft, useWorkflowEvent, type PickedFile } from './api';
import { UploadProgressList } from '../uploads/UploadProgressList';
import { useFileUploads } from '../uploads/useFileUploads';
import { fieldFor } from './filing/formSchema';
import { RequestFilingForm } from './RequestFilingForm';

type Step = 'save' | 'upload' | 'submit';

type Failure = { step: Step; error: ApiError; draft: RequestDetail | null };

const stepFailed: Record<Step, string> = {
  save: 'The draft was not saved.',
  upload: 'The draft is saved, but its files were not stored.',
  submit: 'The draft and its files are saved, but it was not sent to the section engineer.',
};

function asApiError(err: unknown): ApiError {
  return err instanceof ApiError ? err : new ApiError(0, 'unexpected', err instanceof Error ? err.message : 'Something went wrong.');
}

export function NewRequestScreen() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const projects = useMyProjects();
  const createDraft = useCreateDraft();
  const updateDraft = useUpdateDraft();
  const uploads = useFileUploads();
  const workflow = useWorkflowEvent();

  const [draft, setDraft] = useState<RequestDetail | null>(null);
  const [step, setStep] = useState<Step | null>(null);
  const [failure, setFailure] = useState<Failure | null>(null);
  // Identity, not name: two files may share a name, and a saved one must not be sent again.
  const saved = useRef(new Set<PickedFile>());
  const [savedFiles, setSavedFiles] = useState<ReadonlySet<PickedFile>>(new Set());

  async function file(body: RequestBody, files: PickedFile[]) {
    setFailure(null);
    let current = draft;
    let at: Step = 'save';
    try {
      setStep('save');
      current = current ? await updateDraft.mutateAsync({ id: current.id, version: current.version, body }) : await createDraft.mutateAsync(body);
      setDraft(current);

      const pending = files.filter((f) => !saved.current.has(f));
      if (pending.length > 0) {
        at = 'upload';
        setStep('upload');
        const draftId = current.id;
        try {
          // One file at a time with its own bar; a file the person cancels is left out of this filing.
          const stored = await uploads.sendAll(`/api/requests/${encodeURIComponent(draftId)}/attachments?purpose=revision`, pending.map((f) => ({ name: f.name, size: f.size, blob: f.blob })));
          stored.forEach((a, i) => a && saved.current.add(pending[i]!));
        } finally {
          setSavedFiles(new Set(saved.current));
          void queryClient.invalidateQueries({ queryKey: requestKeys.detail(draftId) });
        }
      }

      at = 'submit';
      setStep('submit');
      const submitted = await workflow.mutateAsync({ id: current.id, event: { type: 'submit', version: current.version } });
      router.replace({ pathname: '/requests/[id]', params: { id: submitted.id, filed: '1' } });
    } catch (err) {
      const error = asApiError(err);
      if (current) {
        // The draft may have moved on under us (a submit that went through though its answer was
        // lost, or a newer version): read it again before deciding what to tell the person.
        const fresh = await queryClient
          .fetchQuery({ queryKey: requestKeys.detail(current.id), queryFn: () => apiFetch<RequestDetail>(`/api/requests/${encodeURIComponent(current!.id)}`), staleTime: 0 })
          .catch(() => null);
        if (fresh && fresh.state !== 'drafting') {
          router.replace(`/requests/${fresh.id}`);
          return;
        }
        if (fresh) {
          current = fresh;
          setDraft(fresh);
        }
      }
      setFailure({ step: at, error, draft: current });
    } finally {
      setStep(null);
    }
  }

  const progress =
    step === 'save' ? 'Saving the draft…' : step === 'upload' ? 'Storing the files…' : step === 'submit' ? 'Sending it to the section engineer…' : null;
  const unplaced = Object.entries(failure?.error.fields ?? {}).filter(([path]) => !fieldFor(path.split('.')));
  // Beside the button that was pressed, where the eye is on a long form.
  const failureNotice = failure ? (
    <View style={styles.failure} accessibilityLiveRegion="assertive" testID="filing-failure">
      <Notice tone="error">{`${stepFailed[failure.step]} The server answered: ${failure.error.message}`}</Notice>
      {unplaced.map(([path, message]) => (
        <Text key={path} variant="muted" style={styles.detail}>{path === '_' ? message : `${path}: ${message}`}</Text>
      ))}
      {failure.draft ? (
        <Text variant="muted">
          Draft {failure.draft.number} keeps what you entered. Press “File the request” to try again, or{' '}
          <Link href={`/requests/${failure.draft.id}`} style={styles.link} testID="filing-draft-link">open the draft</Link>.
        </Text>
      ) : null}
    </View>
  ) : null;

  return (
    <Screen>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">New request</Text>
        <Text variant="muted">
          A departure from the sealed plans needs approval before the work is done. It goes first to the section engineer, then to central office and the engineer of record.
        </Text>
      </View>
      {projects.isPending ? <ActivityIndicator /> : null}
      {projects.error ? <Notice tone="error">{projects.error.message}</Notice> : null}
      {projects.data && projects.data.length === 0 ? <Notice tone="info">You are not a member of any project yet; ask your administrator.</Notice> : null}
      {projects.data && projects.data.length > 0 ? (
        <RequestFilingForm
          projects={projects.data}
          busy={step !== null}
          progress={progress}
          projectLocked={draft !== null}
          savedFiles={savedFiles}
          serverFieldErrors={failure?.error.fields}
          beforeSubmit={
            <>
              <UploadProgressList items={uploads.items} onCancel={uploads.cancel} />
              {failureNotice}
            </>
          }
          onSubmit={(body, files) => void file(body, files)}
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
