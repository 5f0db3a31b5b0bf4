// Every move × every role × member or not, in every state: allowed, or the exact refusal.
// The expected table is written out by hand below, not derived from the machine under test.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requestStates, type RequestState } from '../../shared/requests/states';
import { roles, type Role } from '../../shared/roles';
import { workflowEventTypes, type WorkflowEventType } from '../../shared/workflow/events';
import { buildTestApp, createScenario, signIn, type TestApp } from '../support/apiHarness';
import { agentsFor, proposedConditions, requestAt } from '../support/requestFixtures';
import { samplePhoto } from '../support/sampleFiles';

// Who may make each move in each state (the one role that may); anything not listed is refused.
const allowed: Partial<Record<RequestState, Partial<Record<WorkflowEventType, Role>>>> = {
  drafting: { submit: 'contractor', withdraw: 'contractor' },
  section_review: { forward: 'section_engineer', return_for_revision: 'section_engineer', withdraw: 'contractor' },
  central_routing: { route: 'central_office', return_for_revision: 'central_office', withdraw: 'contractor' },
  eor_review: {
    approve: 'engineer_of_record',
    approve_with_conditions: 'engineer_of_record',
    reject: 'engineer_of_record',
    request_information: 'engineer_of_record',
    return_for_revision: 'engineer_of_record',
    reassign: 'central_office',
    withdraw: 'contractor',
  },
  information_requested: { provide_information: 'contractor', withdraw: 'contractor' },
  revising: { resubmit: 'contractor', withdraw: 'contractor' },
  conditions_open: { satisfy_condition: 'field_inspector' },
};

// Moves a state takes but that wait on something else first (here: a federal-aid project).
const acceptedButNotReady: Partial<Record<RequestState, Partial<Record<WorkflowEventType, Role>>>> = {
  central_routing: { classify_change: 'central_office', record_federal_concurrence: 'central_office' },
  eor_review: { classify_change: 'central_office', record_federal_concurrence: 'central_office' },
};

function expectedStatus(state: RequestState, event: WorkflowEventType, role: Role, member: boolean): number {
  // A request of a project you are not on does not exist for you; auditors read every project.
  if (!member && role !== 'auditor') return 404;
  // A draft is the contractor's own until submitted: to the agency's desks it does not exist.
  if (state === 'drafting' && role !== 'contractor' && role !== 'auditor') return 404;
  const who = allowed[state]?.[event];
  const waiting = acceptedButNotReady[state]?.[event];
  const stateTakesIt = who !== undefined || waiting !== undefined;
  if (!stateTakesIt) return 409;
  if (!member) return 403;
  if (who === role) return 200;
  if (waiting === role) return 409;
  return 403;
}

describe('the authorisation matrix of workflow moves', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let outsiders: Record<Role, Awaited<ReturnType<typeof signIn>>>;
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    outsiders = Object.fromEntries(await Promise.all(roles.map(async (r) => [r, await signIn(t, s.outsiders[r].email)] as const))) as typeof outsiders;
  });
  afterAll(() => t.close());

  function payloadFor(event: WorkflowEventType): Record<string, unknown> {
    switch (event) {
      case 'route':
        return { eorUserId: s.members.engineer_of_record.id };
      case 'reassign':
        return { eorUserId: s.secondEor.id, comment: 'Workload.' };
      case 'approve_with_conditions':
        return { conditions: proposedConditions };
      case 'satisfy_condition':
        return { conditionId: randomUUID(), evidenceAttachmentId: randomUUID(), comment: 'Seen on site.' };
      case 'classify_change':
        return { majorChange: true };
      case 'record_federal_concurrence':
        return { letterAttachmentId: randomUUID() };
      case 'return_for_revision':
      case 'reject':
      case 'request_information':
      case 'provide_information':
      case 'resubmit':
        return { comment: 'A comment long enough.' };
      default:
        return {};
    }
  }

  for (const state of requestStates) {
    it(`in ${state}: every refusal is exact and writes nothing; every allowed move goes through`, async () => {
      const shared = await requestAt(t, s, a, state);
      const mismatches: string[] = [];
      let checked = 0;
      for (const event of workflowEventTypes) {
        for (const role of roles) {
          for (const member of [true, false]) {
            const want = expectedStatus(state, event, role, member);
            if (want === 200) continue;
            const agent = member ? a[role] : outsiders[role];
            const res = await agent.post(`/api/requests/${shared.id}/events`).send({ type: event, version: shared.version(), ...payloadFor(event) });
            checked += 1;
            if (res.status !== want) mismatches.push(`${event} by ${member ? '' : 'non-member '}${role}: ${res.status} (want ${want}) ${res.body?.error?.message ?? ''}`);
          }
        }
      }
      expect(mismatches).toEqual([]);
      expect(checked).toBeGreaterThan(150);
      // No refusal moved the request or added to its trail.
      const after = await a.auditor.get(`/api/requests/${shared.id}`);
      expect(after.body.version).toBe(shared.version());
      expect(after.body.state).toBe(state);

      for (const [event, role] of Object.entries(allowed[state] ?? {}) as [WorkflowEventType, Role][]) {
        const fresh = await requestAt(t, s, a, state);
        const payload = payloadFor(event);
        if (event === 'satisfy_condition') {
          const detail = (await a.field_inspector.get(`/api/requests/${fresh.id}`)).body;
          const evidence = await a.field_inspector.post(`/api/requests/${fresh.id}/attachments?purpose=condition_evidence`).attach('files', await samplePhoto(), 'photo.jpg');
          Object.assign(payload, { conditionId: detail.conditions[0].id, evidenceAttachmentId: evidence.body[0].id });
        }
        const before = (await a[role].get(`/api/requests/${fresh.id}`)).body;
        expect(before.availableActions, `${role} is offered ${event} in ${state}`).toContain(event);
        const res = await a[role].post(`/api/requests/${fresh.id}/events`).send({ type: event, version: fresh.version(), ...payload });
        expect(res.status, `${event} by ${role} in ${state}: ${res.text}`).toBe(200);
        expect(res.body.trail).toHaveLength(before.trail.length + 1);
      }
    });
  }
});
