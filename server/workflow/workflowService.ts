// Applies one workflow move. Under the request's row lock it checks the version the client saw,
// asks the shared machine whether this actor may make the move now, and then writes in one
// transaction: the new state and version, one trail event, and the mail jobs. The statements that
// every move sends are in moveStatements.ts.
import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { attachments, requestConditions, requestRevisions } from '../../db/schema';
import { EngineeringInputError } from '../../shared/engineering';
import { engineeringCheckFor } from '../../shared/requests/engineeringCheck';
import { requestBodySchema } from '../../shared/requests/requestBody';
import { isRequestState, type RequestState } from '../../shared/requests/states';
import type { Actor } from '../../shared/requests/types';
import { evaluateEvent } from '../../shared/workflow/evaluate';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import type { WorkflowFacts } from '../../shared/workflow/rules';
import { HttpError, validationError } from '../http/errors';
import { seesDrafts } from '../requests/access';
import { staleVersion } from '../requests/draftService';
import { attachmentOfRequest, currentRevisionRow, membersWithRole } from '../requests/requestRepository';
import { appendTrailEvent, nextLink, type RecordedAt } from '../trail/trailChain';
import { factsUnderLock, lockForMove, recordMove, type LockedForMove, type RequestChange } from './moveStatements';
import { notificationsFor, personNamedBy, rolesToTell } from './notifications';
import { queueDecisionRecord } from '../documents/decisionRecordJob';

type Locked = LockedForMove & { actorId: string };
type Change = RequestChange;

// Checks that need the database, and the side writes a move carries; returns the trail payload.
async function prepareMove(tx: Transaction, locked: Locked, input: WorkflowEventInput, change: Change, when: RecordedAt): Promise<Record<string, unknown>> {
  const r = locked.request;
  const now = when.at ?? sql`now()`;
  switch (input.type) {
    case 'submit':
    case 'resubmit': {
      const revision = await currentRevisionRow(tx, r.id, r.currentRevision);
      const body = requestBodySchema.safeParse(revision?.body);
      if (!body.success) throw validationError(body.error, 'The request is not complete yet; fill in the fields named below, then submit.');
      const files = await tx
        .select({ id: attachments.id, fileName: attachments.fileName, sha256: attachments.sha256 })
        .from(attachments)
        .where(and(eq(attachments.requestId, r.id), eq(attachments.revision, r.currentRevision), eq(attachments.purpose, 'revision')));
      if (body.data.type === 'joint_seal_substitution' && files.length === 0) {
        throw new HttpError(400, 'data_sheet_missing', 'Attach the substitute seal’s data sheet before submitting.');
      }
      let engineering;
      try {
        engineering = engineeringCheckFor(body.data);
      } catch (err) {
        if (err instanceof EngineeringInputError) throw new HttpError(400, 'engineering_input', err.message);
        throw err;
      }
      await tx
        .update(requestRevisions)
        .set({ engineering, submittedAt: now })
        .where(and(eq(requestRevisions.requestId, r.id), eq(requestRevisions.revision, r.currentRevision)));
      change.title = body.data.title;
      return { revision: r.currentRevision, body: body.data, attachments: files, engineering };
    }
    case 'route':
    case 'reassign': {
      const eors = await membersWithRole(tx, r.projectId, 'engineer_of_record');
      const eor = eors.find((e) => e.id === input.eorUserId);
      if (!eor) throw new HttpError(400, 'invalid_input', 'Choose an engineer of record who is on this project.', { eorUserId: 'Not an engineer of record on this project.' });
      change.assignedEorId = eor.id;
      return { eorUserId: eor.id, eorName: eor.name, previousEorUserId: r.assignedEorId };
    }
    case 'return_for_revision': {
      const current = await currentRevisionRow(tx, r.id, r.currentRevision);
      const next = r.currentRevision + 1;
      // The new revision starts as a copy of the one returned; the old one stays as it was.
      await tx.insert(requestRevisions).values({ requestId: r.id, revision: next, body: current?.body ?? {}, ...(when.at ? { createdAt: when.at } : {}) });
      change.currentRevision = next;
      return { returnedRevision: r.currentRevision, newRevision: next };
    }
    case 'approve':
      change.decision = 'approved';
      return { decision: 'approved' };
    case 'reject':
      change.decision = 'rejected';
      return { decision: 'rejected' };
    case 'approve_with_conditions': {
      change.decision = 'approved_with_conditions';
      const rows = await tx
        .insert(requestConditions)
        .values(input.conditions.map((c, i) => ({ requestId: r.id, seq: i + 1, text: c.text, dueBefore: c.dueBefore })))
        .returning({ id: requestConditions.id, seq: requestConditions.seq, text: requestConditions.text, dueBefore: requestConditions.dueBefore });
      return { decision: 'approved_with_conditions', conditions: rows };
    }
    case 'satisfy_condition': {
      const evidence = await attachmentOfRequest(tx, r.id, input.evidenceAttachmentId);
      if (!evidence || evidence.purpose !== 'condition_evidence') {
        throw new HttpError(400, 'invalid_input', 'Attach the evidence to this request first, then mark the condition.', { evidenceAttachmentId: 'Not evidence on this request.' });
      }
      const [condition] = await tx
        .update(requestConditions)
        .set({ satisfiedAt: now, satisfiedById: locked.actorId, note: input.comment, evidenceAttachmentId: evidence.id })
        .where(and(eq(requestConditions.id, input.conditionId), eq(requestConditions.requestId, r.id), isNull(requestConditions.satisfiedAt)))
        .returning({ id: requestConditions.id, seq: requestConditions.seq, text: requestConditions.text });
      if (!condition) throw new HttpError(409, 'condition_not_open', 'That condition is not open on this request (already satisfied, or not one of its conditions).');
      return { condition, evidence: { id: evidence.id, fileName: evidence.fileName, sha256: evidence.sha256 } };
    }
    case 'classify_change':
      change.majorChange = input.majorChange;
      if (!input.majorChange) change.federalConcurrenceAttachmentId = null;
      return { majorChange: input.majorChange };
    case 'record_federal_concurrence': {
      const letter = await attachmentOfRequest(tx, r.id, input.letterAttachmentId);
      if (!letter || letter.purpose !== 'federal_concurrence') {
        throw new HttpError(400, 'invalid_input', 'Attach the concurrence letter to this request first.', { letterAttachmentId: 'Not a concurrence letter on this request.' });
      }
      change.federalConcurrenceAttachmentId = letter.id;
      return { letter: { id: letter.id, fileName: letter.fileName, sha256: letter.sha256 } };
    }
    case 'forward':
    case 'request_information':
    case 'provide_information':
    case 'withdraw':
      return {};
  }
}

// Who may read a request (server/requests/access.ts, mayReadRequest): members of its project and
// auditors, and a draft only its contractor and auditors. The membership comes with the lock, so the
// check costs no statement; the workflow matrix's outsiders of every role keep this in step.
function mayReadLocked(actor: Actor, locked: LockedForMove): boolean {
  if (locked.request.state === 'drafting' && !seesDrafts(actor)) return false;
  return actor.role === 'auditor' || locked.member;
}

const notFound = () => new HttpError(404, 'request_not_found', 'No request you can see has that id.');

export async function applyEvent(deps: { db: Database; publicUrl: string }, actor: Actor, requestId: string, input: WorkflowEventInput, when: RecordedAt = {}): Promise<void> {
  await deps.db.transaction(async (tx) => {
    const found = await lockForMove(tx, requestId, actor.id, { roles: rolesToTell(input.type), personId: personNamedBy({ type: input.type, eorUserId: 'eorUserId' in input ? input.eorUserId : undefined }) });
    if (!found || !mayReadLocked(actor, found)) throw notFound();
    const locked = { ...found, actorId: actor.id };
    const r = found.request;
    if (r.version !== input.version) throw staleVersion(r.version);
    if (!isRequestState(r.state)) throw new Error(`request ${r.id} has unknown state ${r.state}`);
    const stateBefore: RequestState = r.state;
    const { openConditions, link } = await factsUnderLock(tx, r.id);
    const facts: WorkflowFacts = {
      assignedEorId: r.assignedEorId,
      federalAid: found.federalAid,
      majorChange: r.majorChange,
      federalConcurrence: r.federalConcurrenceAttachmentId !== null,
      openConditions,
    };
    const verdict = evaluateEvent(stateBefore, facts, {
      type: input.type,
      actor: { id: actor.id, role: actor.role, member: found.member },
      eorUserId: 'eorUserId' in input ? input.eorUserId : undefined,
      conditionCount: input.type === 'approve_with_conditions' ? input.conditions.length : undefined,
      majorChange: input.type === 'classify_change' ? input.majorChange : undefined,
    });
    if (!verdict.allowed) throw new HttpError(verdict.status, verdict.code, verdict.message);

    const change: Change = {};
    const payload = await prepareMove(tx, locked, input, change, when);
    const stateAfter = verdict.nextState;
    const comment = input.comment ?? null;
    const next = nextLink(link, { requestId: r.id, eventType: input.type, stateBefore, stateAfter, actor, comment, payload, at: when.at });
    const mails = notificationsFor({
      people: found.people,
      publicUrl: deps.publicUrl,
      eventType: input.type,
      request: { id: r.id, number: r.number, title: change.title ?? r.title, projectId: r.projectId, filedById: r.filedById, projectName: found.projectName, structureNumber: found.structureNumber },
      stateBefore,
      stateAfter,
      assignedEorId: change.assignedEorId ?? r.assignedEorId,
      previousEorId: input.type === 'reassign' ? r.assignedEorId : null,
      actor: { id: actor.id, name: actor.name, role: actor.role },
      comment,
      closedByThisMove: stateAfter === 'closed' && input.type === 'satisfy_condition',
    });
    await recordMove(tx, {
      requestId: r.id,
      link: { seq: next.event.seq, prevHash: next.prevHash, hash: next.hash, createdAt: next.createdAt },
      eventType: input.type,
      stateBefore,
      stateAfter,
      actor,
      comment,
      payload: next.payload,
      version: r.version + 1,
      // The desk clock restarts when the request reaches another desk or another engineer.
      newDesk: stateAfter !== stateBefore || input.type === 'reassign',
      change,
      mails,
    });
    if (input.type === 'approve' || input.type === 'approve_with_conditions' || input.type === 'reject') await queueDecisionRecord(tx, r.id, actor.id);
  });
}

// A comment is on the record (a trail event) but moves nothing, so it needs no version.
export async function addComment(db: Database, actor: Actor, requestId: string, comment: string, when: RecordedAt = {}): Promise<void> {
  await db.transaction(async (tx) => {
    const found = await lockForMove(tx, requestId, actor.id, null);
    if (!found || !mayReadLocked(actor, found)) throw notFound();
    const r = found.request;
    if (!isRequestState(r.state)) throw new Error(`request ${r.id} has unknown state ${r.state}`);
    const facts: WorkflowFacts = { assignedEorId: r.assignedEorId, federalAid: found.federalAid, majorChange: r.majorChange, federalConcurrence: false, openConditions: 0 };
    const verdict = evaluateEvent(r.state, facts, { type: 'comment', actor: { id: actor.id, role: actor.role, member: found.member } });
    if (!verdict.allowed) throw new HttpError(verdict.status, verdict.code, verdict.code === 'not_your_move' ? 'Only the people working on this project comment on its requests.' : verdict.message);
    await appendTrailEvent(tx, { requestId: r.id, eventType: 'commented', stateBefore: r.state, stateAfter: r.state, actor, comment, at: when.at });
  });
}
