// A request already on Spanrelay, opened again in the filing form: a draft carried on, or a
// request returned for revision being prepared as its next revision. Only its filer does this,
// and only while it waits at their desk; the server refuses anyone else anyway.
import type { RequestDraft } from '../../../shared/requests/requestBody';
import { revisionChanges } from '../../../shared/requests/revisionDiff';
import { workflowEventSchema } from '../../../shared/workflow/events';
import type { AttachmentSummary, RequestDetail } from '../../../shared/requests/types';
import type { DeviceDraft } from '../../drafts/deviceDrafts';
import { changedFieldName, changedValue } from '../changeWords';

export type EditMode = 'revise' | 'continue';

const editableStates: readonly string[] = ['drafting', 'revising'];

export const isEditableState = (state: string) => editableStates.includes(state);

type Editable = Pick<RequestDetail, 'state' | 'availableActions' | 'filedBy'>;

/** How this person may open the request in the form, or null when it is not theirs to change now. */
export function editModeFor(r: Editable, actorId: string | null | undefined): EditMode | null {
  if (!actorId || r.filedBy.id !== actorId) return null;
  if (r.state === 'revising' && r.availableActions.includes('resubmit')) return 'revise';
  if (r.state === 'drafting' && r.availableActions.includes('submit')) return 'continue';
  return null;
}

// The device keeps one copy per request, so reopening it finds the typing left there.
const copyPrefix = 'request-';
export const requestCopyId = (requestId: string) => `${copyPrefix}${requestId}`;
export const requestOfCopy = (localId: string): string | null => (localId.startsWith(copyPrefix) ? localId.slice(copyPrefix.length) : null);

type Revisions = Pick<RequestDetail, 'revisions' | 'currentRevision'>;

export function revisionBody(r: Revisions, revision: number): RequestDraft | undefined {
  return r.revisions.find((v) => v.revision === revision)?.body;
}

/** The files filed with the revision being prepared (earlier revisions keep their own). */
export function filesOfCurrentRevision(r: Pick<RequestDetail, 'attachments' | 'currentRevision'>): AttachmentSummary[] {
  return r.attachments.filter((a) => a.revision === r.currentRevision && a.purpose === 'revision');
}

export type ChangeLine = { path: string; name: string; before: string; after: string };

/** What differs from the revision before, as the request's page will show it once resubmitted. */
export function changesSince(before: unknown, after: unknown): ChangeLine[] {
  return revisionChanges(before, after)
    .filter((c) => c.path !== 'type' && c.path !== 'projectId')
    .map((c) => ({ path: c.path, name: changedFieldName(c.path), before: changedValue(c.before), after: changedValue(c.after) }));
}

// `unsaved`: the device's copy holds typing Spanrelay does not have yet.
export type RequestSeed<V> = { values: V; step: string | null; pickAgain: string[]; unsaved: boolean; queued: boolean; setAside: boolean };

/**
 * Where the form starts: the device's copy when it was typed over the version Spanrelay still has
 * (or is waiting to be sent), else Spanrelay's copy; a device copy left behind by a change made
 * elsewhere is set aside rather than sent over it.
 */
export function seedForRequest<V>(r: Pick<RequestDetail, 'id' | 'version'>, serverValues: V, kept: DeviceDraft<V> | null): RequestSeed<V> {
  const ours = kept && kept.server?.id === r.id ? kept : null;
  const differs = ours !== null && JSON.stringify(ours.values) !== JSON.stringify(serverValues);
  if (ours && (ours.queued || ours.server?.version === r.version)) {
    return { values: ours.values, step: ours.step || null, pickAgain: ours.fileNames, unsaved: differs, queued: ours.queued, setAside: false };
  }
  return { values: serverValues, step: null, pickAgain: [], unsaved: false, queued: false, setAside: differs };
}

/** Why the resubmit comment will not do, in the shared move's own words; null when it will. */
export function resubmitCommentProblem(comment: string): string | null {
  const parsed = workflowEventSchema.safeParse({ type: 'resubmit', version: 1, comment });
  if (parsed.success) return null;
  return parsed.error.issues.find((i) => i.path[0] === 'comment')?.message ?? parsed.error.issues[0]?.message ?? 'Say what changed.';
}
