// Applies one workflow move. Under the request's row lock it checks the version the client saw,
// asks the shared machine whether this actor may make the move now, and then writes in one
// transaction: the new state and version, one trail event, and the mail jobs.
import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { attachments, changeRequests, requestConditions, requestRevisions } from '../../db/schema';
import { EngineeringInputError } from '../../shared/engineering';
import { engineeringCheckFor } from '../../shared/requests/engineeringCheck';
import { requestBodySchema } from '../../shared/requests/requestBody';
import { isRequestState, type RequestState } from '../../shared/requests/states';
import type { Actor } from '../../shared/requests/types';
import { evaluateEvent } from '../../shared/workflow/evaluate';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import type { WorkflowFacts } from '../../shared/workflow/rules';
import { HttpError, validationError } from '../http/errors';
import { queueMail } from '../mail/mailQueue';
import { isProjectMember } from '../projects/projectRepository';
import { mayReadRequest } from '../requests/access';
import { staleVersion } from '../requests/draftService';
import { attachmentOfRequest, currentRevisionRow, lockRequest, membersWithRole, openConditionCount } from '../requests/requestRepository';
import { appendTrailEvent, type RecordedAt } from '../trail/trailChain';
import { notificationsFor } from './notifications';
import { queueDecisionRecord } from '../documents/decisionRecordJob';

type Locked = NonNullable<Awaited<ReturnType<typeof lockRequest>>> & { actorId: string };
type Change = Partial<typeof changeRequests.$inferInsert>;

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

// Whether someone who has just passed the read check (mayReadRequest) is a member of the project.
// That check admits members and auditors only (server/requests/access.ts), and for anyone but an
// auditor it has just asked the membership itself; asking again would be one more statement under
// the request's lock on every move. The workflow matrix's outsiders of every role (404, never a
// move) keep this in step with access.ts.
async function membershipOfReader(tx: Transaction, reader: Actor, projectId: string): Promise<boolean> {
  return reader.role === 'auditor' ? isProjectMember(tx, projectId, reader.id) : true;
}

export async function applyEvent(deps: { db: Database; publicUrl: string }, actor: Actor, requestId: string, input: WorkflowEventInput, when: RecordedAt = {}): Promise<void> {
  await deps.db.transaction(async (tx) => {
    const found = await lockRequest(tx, requestId);
    if (!found || !(await mayReadRequest(tx, actor, found.request))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
    const locked = { ...found, actorId: actor.id };
    const r = found.request;
    if (r.version !== input.version) throw staleVersion(r.version);
    if (!isRequestState(r.state)) throw new Error(`request ${r.id} has unknown state ${r.state}`);
    const stateBefore: RequestState = r.state;
    const facts: WorkflowFacts = {
      assignedEorId: r.assignedEorId,
      federalAid: found.federalAid,
      majorChange: r.majorChange,
      federalConcurrence: r.federalConcurrenceAttachmentId !== null,
      openConditions: await openConditionCount(tx, r.id),
    };
    const member = await membershipOfReader(tx, actor, r.projectId);
    const verdict = evaluateEvent(stateBefore, facts, {
      type: input.type,
      actor: { id: actor.id, role: actor.role, member },
      eorUserId: 'eorUserId' in input ? input.eorUserId : undefined,
      conditionCount: input.type === 'approve_with_conditions' ? input.conditions.length : undefined,
      majorChange: input.type === 'classify_change' ? input.majorChange : undefined,
    });
    if (!verdict.allowed) throw new HttpError(verdict.status, verdict.code, verdict.message);

    const change: Change = {};
    const payload = await prepareMove(tx, locked, input, change, when);
    const stateAfter = verdict.nextState;
    const event = await appendTrailEvent(tx, {
      requestId: r.id,
      eventType: input.type,
      stateBefore,
      stateAfter,
      actor,
      comment: input.comment ?? null,
      payload,
      at: when.at,
    });
    // The desk clock restarts when the request reaches another desk or another engineer.
    const newDesk = stateAfter !== stateBefore || input.type === 'reassign';
    await tx
      .update(changeRequests)
      .set({ ...change, state: stateAfter, version: r.version + 1, updatedAt: event.createdAt, ...(newDesk ? { deskSince: event.createdAt } : {}) })
      .where(eq(changeRequests.id, r.id));

    const mails = await notificationsFor({
      db: tx,
      publicUrl: deps.publicUrl,
      trailEventId: event.id,
      eventType: input.type,
      request: { id: r.id, number: r.number, title: change.title ?? r.title, projectId: r.projectId, filedById: r.filedById, projectName: found.projectName, structureNumber: found.structureNumber },
      stateBefore,
      stateAfter,
      assignedEorId: change.assignedEorId ?? r.assignedEorId,
      previousEorId: input.type === 'reassign' ? r.assignedEorId : null,
      actor: { id: actor.id, name: actor.name, role: actor.role },
      comment: input.comment ?? null,
      closedByThisMove: stateAfter === 'closed' && input.type === 'satisfy_condition',
    });
    await queueMail(tx, mails);
    if (input.type === 'approve' || input.type === 'approve_with_conditions' || input.type === 'reject') await queueDecisionRecord(tx, r.id, actor.id);
  });
}

// A comment is on the record (a trail event) but moves nothing, so it needs no version.
export async function addComment(db: Database, actor: Actor, requestId: string, comment: string, when: RecordedAt = {}): Promise<void> {
  await db.transaction(async (tx) => {
    const found = await lockRequest(tx, requestId);
    if (!found || !(await mayReadRequest(tx, actor, found.request))) throw new HttpError(404, 'request_not_found', 'No request you can see has that id.');
    const r = found.request;
    if (!isRequestState(r.state)) throw new Error(`request ${r.id} has unknown state ${r.state}`);
    const member = await membershipOfReader(tx, actor, r.projectId);
    const facts: WorkflowFacts = { assignedEorId: r.assignedEorId, federalAid: found.federalAid, majorChange: r.majorChange, federalConcurrence: false, openConditions: 0 };
    const verdict = evaluateEvent(r.state, facts, { type: 'comment', actor: { id: actor.id, role: actor.role, member } });
    if (!verdict.allowed) throw new HttpError(verdict.status, verdict.code, verdict.code === 'not_your_move' ? 'Only the people working on this project comment on its requests.' : verdict.message);
    await appendTrailEvent(tx, { requestId: r.id, eventType: 'commented', stateBefore: r.state, stateAfter: r.state, actor, comment, at: when.at });
  });
}
