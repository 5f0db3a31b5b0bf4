// Opening a request already on Spanrelay in the filing form: who may, where the form starts from,
// what the review step lists as changed, and the resubmit comment judged by the shared move.
import { describe, expect, it } from 'vitest';
import {
  changesSince,
  editModeFor,
  filesOfCurrentRevision,
  requestCopyId,
  requestOfCopy,
  resubmitCommentProblem,
  seedForRequest,
} from '../../../features/requests/filing/editRequest';
import type { DeviceDraft } from '../../../features/drafts/deviceDrafts';
import type { AttachmentSummary, RequestDetail } from '../../../shared/requests/types';

const filer = { id: 'u-contractor', name: 'Dana Whitlock', organization: 'Corbel & Fane Constructors' };
const request = (state: string, availableActions: string[]) => ({ state, availableActions, filedBy: filer }) as unknown as RequestDetail;

describe('who opens a request in the filing form', () => {
  it('is the filer, revising a returned request or carrying on a draft', () => {
    expect(editModeFor(request('revising', ['resubmit', 'withdraw', 'comment']), filer.id)).toBe('revise');
    expect(editModeFor(request('drafting', ['submit', 'withdraw']), filer.id)).toBe('continue');
  });

  it('is nobody else, and not the filer once the request is with a reviewer or the move is not theirs', () => {
    expect(editModeFor(request('revising', ['resubmit']), 'u-other-contractor')).toBeNull();
    expect(editModeFor(request('revising', ['resubmit']), undefined)).toBeNull();
    expect(editModeFor(request('section_review', ['withdraw', 'comment']), filer.id)).toBeNull();
    expect(editModeFor(request('revising', ['withdraw']), filer.id)).toBeNull();
    expect(editModeFor(request('drafting', ['resubmit']), filer.id)).toBeNull();
  });
});

describe('the device copy of a request', () => {
  it('is kept under the request id and found from it', () => {
    expect(requestOfCopy(requestCopyId('8c1d'))).toBe('8c1d');
    expect(requestOfCopy('lq2x9-00abcd')).toBeNull();
  });

  type V = { reason: string };
  const copy = (over: Partial<DeviceDraft<V>>): DeviceDraft<V> => ({
    localId: requestCopyId('r1'),
    userId: filer.id,
    server: { id: 'r1', version: 7, number: 'PC-0114-004' },
    values: { reason: 'typed on the device' },
    step: 'departure',
    fileNames: ['pier 2 photo.jpg'],
    queued: false,
    refused: null,
    updatedAt: '2026-11-30T10:00:00.000Z',
    ...over,
  });
  const server = { reason: 'as returned' };

  it('starts from Spanrelay when nothing is kept', () => {
    expect(seedForRequest({ id: 'r1', version: 7 }, server, null)).toEqual({ values: server, step: null, pickAgain: [], unsaved: false, queued: false, setAside: false });
  });

  it('carries on from the device when it was typed over the version Spanrelay still has', () => {
    const s = seedForRequest({ id: 'r1', version: 7 }, server, copy({}));
    expect(s).toMatchObject({ values: { reason: 'typed on the device' }, step: 'departure', pickAgain: ['pier 2 photo.jpg'], unsaved: true, setAside: false });
  });

  it('carries on from a queued copy even though its version is older, since it is waiting to be sent', () => {
    expect(seedForRequest({ id: 'r1', version: 9 }, server, copy({ queued: true }))).toMatchObject({ values: { reason: 'typed on the device' }, queued: true });
  });

  it('sets aside a copy left behind by a change made elsewhere', () => {
    expect(seedForRequest({ id: 'r1', version: 9 }, server, copy({}))).toMatchObject({ values: server, setAside: true, unsaved: false });
    expect(seedForRequest({ id: 'r1', version: 9 }, server, copy({ values: server }))).toMatchObject({ values: server, setAside: false });
  });

  it('ignores a copy of another request', () => {
    expect(seedForRequest({ id: 'r2', version: 7 }, server, copy({}))).toMatchObject({ values: server, setAside: false });
  });
});

describe('what changed since the returned revision', () => {
  const before = { type: 'other_deviation', projectId: 'p1', title: 'Relocate drain outlet', reason: 'Clears the pier cap.', planSheets: ['S-12'], costImpact: { kind: 'none' } };

  it('names each changed field as the request page does and leaves out the fixed ones', () => {
    const after = { ...before, reason: 'Clears the pier cap step by 4 in.', planSheets: ['S-12', 'D-3'], costImpact: { kind: 'added_cost', amountUsd: 1850 } };
    expect(changesSince(before, after)).toEqual([
      { path: 'costImpact.amountUsd', name: 'Cost amount', before: '(empty)', after: '1850' },
      { path: 'costImpact.kind', name: 'Cost impact', before: 'none', after: 'added_cost' },
      { path: 'planSheets', name: 'Plan sheets', before: 'S-12', after: 'S-12, D-3' },
      { path: 'reason', name: 'Reason', before: 'Clears the pier cap.', after: 'Clears the pier cap step by 4 in.' },
    ]);
  });

  it('uses the record labels for typed fields and lists nothing when nothing changed', () => {
    expect(changesSince({ deck: { deckWidthFt: 42 } }, { deck: { deckWidthFt: 44 } })[0]!.name).toBe('Deck width (ft)');
    expect(changesSince(before, { ...before, projectId: 'p2' })).toEqual([]);
  });
});

describe('the resubmit comment', () => {
  it('is required by the shared move, with its own message', () => {
    expect(resubmitCommentProblem('')).toBe('Say why it is resubmitted, and what changed.');
    expect(resubmitCommentProblem('  ok ')).toBe('Say why it is resubmitted, and what changed.');
    expect(resubmitCommentProblem('Moved the outlet 4 in further toward span 3, as asked.')).toBeNull();
  });
});

describe('files of the revision being prepared', () => {
  it('are the revision files of the current revision only', () => {
    const a = (id: string, revision: number, purpose = 'revision') => ({ id, revision, purpose }) as AttachmentSummary;
    const r = { currentRevision: 2, attachments: [a('old', 1), a('new', 2), a('answer', 2, 'information_response')] };
    expect(filesOfCurrentRevision(r).map((f) => f.id)).toEqual(['new']);
  });
});
