// Filing takes three calls: save the draft, store its files, then the move that sends it on
// (submit, or resubmit for a returned request). Each can fail on its own; once the draft exists it
// is reused on the next try, so a retry never files the request twice and nothing typed or
// uploaded is lost.
import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { useRef, useState } from 'react';
import type { RequestBody } from '../../../shared/requests/requestBody';
import type { RequestDetail } from '../../../shared/requests/types';
import type { WorkflowEventInput } from '../../../shared/workflow/events';
import { ApiError } from '../../api/http';
import type { ServerDraftRef } from '../../drafts/deviceDrafts';
import { browserOnline } from '../../drafts/useOnline';
import { useFileUploads } from '../../uploads/useFileUploads';
import { requestKeys, useCreateDraft, useUpdateDraft, useWorkflowEvent, type PickedFile } from '../api';
import { isEditableState } from './editRequest';
import { fetchFreshDetail } from './freshDraft';
import { isOffline, type KeptDraft, type useFilingDraft } from './useFilingDraft';

export type FilingPhase = 'save' | 'upload' | 'submit';
export type FilingFailure = { phase: FilingPhase; error: ApiError };

type FilingDraft = ReturnType<typeof useFilingDraft>;

type How = {
  // The move that sends the saved draft on, at the version the save left it.
  move: (saved: ServerDraftRef, comment: string | undefined) => WorkflowEventInput;
  onFiled: (filed: RequestDetail) => void;
};

function asApiError(err: unknown): ApiError {
  return err instanceof ApiError ? err : new ApiError(0, 'unexpected', err instanceof Error ? err.message : 'Something went wrong.');
}

const offlineError = () => new ApiError(0, 'offline', 'Spanrelay cannot be reached. Check the connection and try again.');

export const phaseProgress: Record<FilingPhase, string> = {
  save: 'Saving the draft…',
  upload: 'Storing the files…',
  submit: 'Sending it to the section engineer…',
};

export function useFilingRun(draft: FilingDraft, how: How) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const createDraft = useCreateDraft();
  const updateDraft = useUpdateDraft();
  const uploads = useFileUploads();
  const workflow = useWorkflowEvent();

  const [phase, setPhase] = useState<FilingPhase | null>(null);
  const [failure, setFailure] = useState<FilingFailure | null>(null);
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

  async function file(body: RequestBody, comment?: string) {
    setFailure(null);
    let current = draft.server;
    let at: FilingPhase = 'save';
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
      const filed = await workflow.mutateAsync({ id: current.id, event: how.move(current, comment) });
      draft.forget();
      how.onFiled(filed);
    } catch (err) {
      const error = asApiError(err);
      if (at === 'save' && isOffline(error)) draft.queueHere();
      // Someone else saved it in between: the form shows their version and says so.
      if (at === 'save' && error.status === 409 && (await draft.onServerRefusal(error))) {
        setFailure({ phase: at, error });
        return;
      }
      if (current) {
        // The draft may have moved on under us (a submit that went through though its answer was
        // lost, or a newer version): read it again before deciding what to tell the person.
        const fresh = await fetchFreshDetail(queryClient, current.id).catch(() => null);
        if (fresh && !isEditableState(fresh.state)) {
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

  return { phase, progress: phase ? phaseProgress[phase] : null, failure, files, changeFiles, savedFiles, uploads, carryOn, file };
}
