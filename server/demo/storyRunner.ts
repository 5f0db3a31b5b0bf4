// Replays one demo story through the services the API itself uses (drafts, uploads, workflow
// moves, comments), each at the instant the story gives, so the checks, trail, mail and decision
// records are the product's own.
import { and, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { requestConditions } from '../../db/schema';
import type { RequestBody, RequestDraft } from '../../shared/requests/requestBody';
import type { Actor } from '../../shared/requests/types';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import { createDraft, updateDraft } from '../requests/draftService';
import { currentRevisionRow, requestRow } from '../requests/requestRepository';
import type { ObjectStore } from '../storage/objectStore';
import { addComment, applyEvent } from '../workflow/workflowService';
import { produceDecisionRecord } from '../documents/decisionRecordJob';
import { attachDemoFile } from './demoAttachments';
import type { DemoPersonKey, DemoProjectKey } from './demoCast';
import type { DemoClock } from './demoClock';
import { makeDemoFile } from './demoFileRecipes';
import type { RequestStory } from './storyTypes';

const decisions = new Set(['approve', 'approve_with_conditions', 'reject']);

export type StoryDeps = {
  db: Database;
  store: ObjectStore;
  publicUrl: string;
  clock: DemoClock;
  people: Record<DemoPersonKey, Actor>;
  projectIds: Record<DemoProjectKey, string>;
};

export async function runStory(deps: StoryDeps, story: RequestStory): Promise<string> {
  const { db, clock, people } = deps;
  const filedAt = clock.instant(story.filedOn);
  const draft = { ...story.body, projectId: deps.projectIds[story.project] } as RequestDraft;
  const requestId = await createDraft(db, people[story.filedBy], draft, { at: filedAt });

  let previous = filedAt;
  const fileContext = (at: Date, by: DemoPersonKey) => ({ project: story.project, date: at.toISOString().slice(0, 10), preparedBy: people[by] });
  const version = async () => (await requestRow(db, requestId))!.request.version;
  const move = async (actor: Actor, event: WorkflowEventInput, at: Date) => applyEvent({ db, publicUrl: deps.publicUrl }, actor, requestId, event, { at });

  for (const step of story.steps) {
    const at = clock.instant(step.on);
    // The trail's times must read in the order things happened.
    if (at.getTime() <= previous.getTime()) throw new Error(`demo story "${story.body.title}": a step on ${at.toISOString()} comes before the one on ${previous.toISOString()}`);
    previous = at;
    const actor = people[step.by];
    if ('attach' in step) {
      await attachDemoFile(deps, actor, requestId, step.purpose ?? 'revision', await makeDemoFile(step.attach, fileContext(at, step.by)), at);
    } else if ('move' in step) {
      await move(actor, { ...step.move, version: await version() } as WorkflowEventInput, at);
      if (decisions.has(step.move.type)) {
        // Made a minute after the decision, as the worker would have; the job queued by the move
        // then finds it and does nothing, so no record is dated the day the seed ran.
        previous = new Date(at.getTime() + 60_000);
        await produceDecisionRecord({ db, store: deps.store, publicUrl: deps.publicUrl }, requestId, actor.id, { at: previous });
      }
    } else if ('route' in step) {
      await move(actor, { type: 'route', eorUserId: people[step.route].id, comment: step.comment, version: await version() }, at);
    } else if ('reassign' in step) {
      await move(actor, { type: 'reassign', eorUserId: people[step.reassign].id, comment: step.comment, version: await version() }, at);
    } else if ('comment' in step) {
      await addComment(db, actor, requestId, step.comment, { at });
    } else if ('revise' in step) {
      const row = await requestRow(db, requestId);
      const revision = await currentRevisionRow(db, requestId, row!.request.currentRevision);
      await updateDraft(db, actor, requestId, row!.request.version, step.revise(revision!.body as RequestBody), { at });
    } else if ('satisfy' in step) {
      const evidenceId = await attachDemoFile(deps, actor, requestId, 'condition_evidence', await makeDemoFile(step.satisfy.evidence, fileContext(at, step.by)), at);
      const [condition] = await db
        .select({ id: requestConditions.id })
        .from(requestConditions)
        .where(and(eq(requestConditions.requestId, requestId), eq(requestConditions.seq, step.satisfy.seq)));
      if (!condition) throw new Error(`demo story "${story.body.title}": no condition ${step.satisfy.seq}`);
      const event = { type: 'satisfy_condition', conditionId: condition.id, comment: step.satisfy.note, evidenceAttachmentId: evidenceId, version: await version() } as const;
      // One second after the evidence, as on site: photo first, then the mark.
      await move(actor, event, new Date(at.getTime() + 1000));
      previous = new Date(at.getTime() + 1000);
    } else {
      const letterId = await attachDemoFile(deps, actor, requestId, 'federal_concurrence', await makeDemoFile(step.concurrence.letter, fileContext(at, step.by)), at);
      await move(actor, { type: 'record_federal_concurrence', letterAttachmentId: letterId, comment: step.concurrence.comment, version: await version() }, new Date(at.getTime() + 1000));
      previous = new Date(at.getTime() + 1000);
    }
  }
  return requestId;
}
