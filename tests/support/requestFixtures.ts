// Complete request bodies of each type, in our invented scenario, and helpers that walk a request
// to a given state through the real API.
import type { RequestBody } from '../../shared/requests/requestBody';
import type { RequestState } from '../../shared/requests/states';
import { signIn, type TestApp, type createScenario } from './apiHarness';

type Scenario = Awaited<ReturnType<typeof createScenario>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
type Answer = { status: number; text: string; body: any };

export function otherDeviationBody(projectId: string, title = 'Relocate drain outlet at pier 2'): RequestBody {
  return {
    type: 'other_deviation',
    projectId,
    title,
    location: { span: '2', station: '12+40', description: 'Deck drain DR-4 over pier 2' },
    planSheets: ['S-12', 'D-3'],
    reason: 'The outlet as drawn lands on the pier cap step; the pipe cannot clear it.',
    proposedChange: 'Move the outlet 18 in toward span 3 and extend the downspout.',
    neededBy: '2027-04-15',
    costImpact: { kind: 'added_cost', amountUsd: 1850 },
    contractTimeImpactDays: 0,
  };
}

export function deckPlacementBody(projectId: string): RequestBody {
  return {
    type: 'deck_placement_change',
    projectId,
    title: 'Place the three-span deck in one pour',
    location: { description: 'Full deck, abutment 1 to abutment 2' },
    planSheets: ['S-6'],
    reason: 'Two pump trucks are available and a single placement removes two transverse joints.',
    proposedChange: 'One continuous placement with Type D retarded concrete instead of the phased sequence.',
    neededBy: '2027-05-01',
    costImpact: { kind: 'none' },
    contractTimeImpactDays: -4,
    deck: { spansFt: [90, 110, 90], deckWidthFt: 44, slabThicknessIn: 8.5 },
    plannedSequence: 'Positive-moment segments of spans 1-3 first, then pier segments (sheet S-6).',
    proposedSequence: { kind: 'single_placement', description: 'Start at abutment 1 and finish at abutment 2.' },
    placement: { rateCyPerHr: 60, equipment: 'Two 47 m boom pumps, one finishing machine' },
    retarder: { astmC494Type: 'D', product: 'Generic Type D retarder', initialSetHr: 12 },
  };
}

export const proposedConditions = [
  { text: 'Trial batch set-time test (ASTM C403) repeated with the job cement lot', dueBefore: 'before placement' },
  { text: 'Standby pump on site for the whole placement', dueBefore: 'during placement' },
];

async function ok(res: Answer, what: string): Promise<Answer> {
  if (res.status >= 300) throw new Error(`${what} answered ${res.status}: ${res.text}`);
  return res;
}

export async function agentsFor(t: TestApp, s: Scenario) {
  const entries = await Promise.all(Object.entries(s.members).map(async ([role, p]) => [role, await signIn(t, p.email)] as const));
  return Object.fromEntries(entries) as Record<keyof Scenario['members'], Agent>;
}

// Files a complete request and walks it forward to `target` (states on the main path only).
export async function requestAt(t: TestApp, s: Scenario, agents: Awaited<ReturnType<typeof agentsFor>>, target: RequestState) {
  const created = await ok(await agents.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, `At ${target}`)), 'create');
  const id: string = created.body.id;
  let version: number = created.body.version;
  const move = async (agent: Agent, body: Record<string, unknown>) => {
    const res = await ok(await agent.post(`/api/requests/${id}/events`).send({ version, ...body }), String(body.type));
    version = res.body.version;
    return res;
  };
  const path: Record<RequestState, (() => Promise<unknown>)[]> = {
    drafting: [],
    section_review: [() => move(agents.contractor, { type: 'submit' })],
    central_routing: [() => move(agents.contractor, { type: 'submit' }), () => move(agents.section_engineer, { type: 'forward' })],
    eor_review: [
      () => move(agents.contractor, { type: 'submit' }),
      () => move(agents.section_engineer, { type: 'forward' }),
      () => move(agents.central_office, { type: 'route', eorUserId: s.members.engineer_of_record.id }),
    ],
    information_requested: [],
    revising: [],
    conditions_open: [],
    closed: [],
    rejected: [],
    withdrawn: [],
  };
  const toEor = path.eor_review;
  path.information_requested = [...toEor, () => move(agents.engineer_of_record, { type: 'request_information', comment: 'Send the pump layout.' })];
  path.revising = [() => move(agents.contractor, { type: 'submit' }), () => move(agents.section_engineer, { type: 'return_for_revision', comment: 'Add the drain detail.' })];
  path.conditions_open = [...toEor, () => move(agents.engineer_of_record, { type: 'approve_with_conditions', conditions: proposedConditions })];
  path.closed = [...toEor, () => move(agents.engineer_of_record, { type: 'approve' })];
  path.rejected = [...toEor, () => move(agents.engineer_of_record, { type: 'reject', comment: 'The outlet must stay clear of the bearing.' })];
  path.withdrawn = [() => move(agents.contractor, { type: 'withdraw' })];
  for (const step of path[target]) await step();
  return { id, version: () => version };
}
