// Who is told of each move, and what the message says: what happened, what is asked of the reader,
// and the link. The actor is never mailed about their own move. The people come with the request's
// row lock (server/workflow/moveStatements.ts), so telling them costs the move no statement of its own.
import { requestStateInfo, stateLabel, type RequestState } from '../../shared/requests/states';
import { roleLabels, type Role } from '../../shared/roles';
import { workflowEventPastTense, type WorkflowEventType } from '../../shared/workflow/events';

type Audience = 'filer' | 'section_engineers' | 'central_office' | 'assigned_eor' | 'previous_eor' | 'field_inspectors' | 'desk_before';

const audiences: Record<WorkflowEventType, Audience[]> = {
  submit: ['section_engineers'],
  resubmit: ['section_engineers'],
  forward: ['central_office'],
  route: ['assigned_eor'],
  reassign: ['assigned_eor', 'previous_eor'],
  // Down the chain: the contractor answers, the desks below the engineer of record are told.
  request_information: ['filer', 'section_engineers', 'central_office'],
  provide_information: ['assigned_eor'],
  return_for_revision: ['filer', 'section_engineers'],
  approve: ['filer', 'section_engineers', 'central_office'],
  approve_with_conditions: ['filer', 'section_engineers', 'central_office', 'field_inspectors'],
  reject: ['filer', 'section_engineers', 'central_office'],
  withdraw: ['desk_before', 'section_engineers'],
  satisfy_condition: ['filer'],
  classify_change: ['assigned_eor'],
  record_federal_concurrence: ['assigned_eor'],
};

const audienceRole: Partial<Record<Audience, Role>> = {
  section_engineers: 'section_engineer',
  central_office: 'central_office',
  field_inspectors: 'field_inspector',
};

// The project roles whose members a move may tell, known before the request is read: its audiences,
// the desks above a closing condition (closedByThisMove), and for a withdrawal any desk it may have
// been at (desk_before; the engineer of record's desk is one person, found by id).
export function rolesToTell(eventType: WorkflowEventType): Role[] {
  const wanted = new Set<Role>();
  for (const audience of audiences[eventType]) {
    const role = audienceRole[audience];
    if (role) wanted.add(role);
  }
  if (eventType === 'satisfy_condition') wanted.add('section_engineer').add('central_office');
  if (eventType === 'withdraw') wanted.add('section_engineer').add('central_office').add('field_inspector');
  return [...wanted];
}

// Besides the request's filer and assigned engineer of record, the one person a move may name: the
// engineer of record it routes or reassigns to.
export function personNamedBy(input: { type: WorkflowEventType; eorUserId?: string }): string | null {
  return input.type === 'route' || input.type === 'reassign' ? (input.eorUserId ?? null) : null;
}

export type Person = { id: string; name: string; email: string; role: Role };

// Members of the project holding the roles asked for (by name, as a desk lists them), and the
// people found by id (filer, engineers of record).
export type PeopleToTell = { members: Person[]; byId: Map<string, Person> };

const deskAsks: Partial<Record<RequestState, string>> = {
  section_review: 'Check it against the field, then forward it to central office with your comments, or return it for revision.',
  central_routing: 'Route it to an engineer of record (on a federal-aid project, also classify the change), or return it for revision.',
  eor_review: 'Review it and decide: approve, approve with conditions or reject; or ask for more information, or return it for revision.',
  information_requested: 'Answer the question of the engineer of record.',
  revising: 'Revise the request as the comment asks and resubmit it.',
  conditions_open: 'Confirm each condition on site and mark it satisfied with a note and evidence.',
};

export type NotificationContext = {
  people: PeopleToTell;
  publicUrl: string;
  eventType: WorkflowEventType;
  request: { id: string; number: string; title: string; projectId: string; filedById: string; projectName: string; structureNumber: string };
  stateBefore: RequestState;
  stateAfter: RequestState;
  assignedEorId: string | null;
  previousEorId: string | null;
  actor: { id: string; name: string; role: keyof typeof roleLabels };
  comment: string | null;
  closedByThisMove: boolean;
};

function peopleFor(ctx: NotificationContext, audience: Audience): Person[] {
  const withRole = (role: Role) => ctx.people.members.filter((p) => p.role === role);
  const byId = (id: string | null) => {
    const person = id ? ctx.people.byId.get(id) : undefined;
    return person ? [person] : [];
  };
  switch (audience) {
    case 'filer':
      return byId(ctx.request.filedById);
    case 'section_engineers':
      return withRole('section_engineer');
    case 'central_office':
      return withRole('central_office');
    case 'field_inspectors':
      return withRole('field_inspector');
    case 'assigned_eor':
      return byId(ctx.assignedEorId);
    case 'previous_eor':
      return byId(ctx.previousEorId);
    case 'desk_before': {
      const desk = requestStateInfo[ctx.stateBefore].desk;
      if (desk === 'engineer_of_record') return byId(ctx.assignedEorId);
      return desk && desk !== 'contractor' ? withRole(desk) : [];
    }
  }
}

// One message to one person; the outbox key (trail event and address) is added as the move's
// trail event is written (server/workflow/moveStatements.ts).
export type MoveMail = { to: string; subject: string; text: string };

export function notificationsFor(ctx: NotificationContext): MoveMail[] {
  const wanted = [...audiences[ctx.eventType]];
  if (ctx.closedByThisMove) wanted.push('section_engineers', 'central_office');
  const recipients = new Map<string, Person>();
  for (const audience of wanted) for (const p of peopleFor(ctx, audience)) recipients.set(p.email, p);

  const desk = requestStateInfo[ctx.stateAfter].desk;
  const r = ctx.request;
  const what = workflowEventPastTense[ctx.eventType];
  const mails: MoveMail[] = [];
  for (const person of recipients.values()) {
    if (person.id === ctx.actor.id) continue;
    const atTheirDesk =
      desk === person.role &&
      (desk !== 'engineer_of_record' || person.id === ctx.assignedEorId) &&
      (desk !== 'contractor' || person.id === r.filedById);
    const ask = atTheirDesk ? `It is now at your desk. ${deskAsks[ctx.stateAfter] ?? ''}`.trim() : 'Nothing is asked of you; this is for your information.';
    mails.push({
      to: person.email,
      subject: `${r.number}: ${what.toLowerCase()}${atTheirDesk ? ' (at your desk)' : ''}`,
      text: [
        `Hello ${person.name},`,
        '',
        `${ctx.actor.name} (${roleLabels[ctx.actor.role]}) ${what.toLowerCase()}: request ${r.number}, "${r.title}", on ${r.projectName} (structure ${r.structureNumber}).`,
        `It is now: ${stateLabel(ctx.stateAfter)}.`,
        ...(ctx.comment ? ['', `Comment: ${ctx.comment}`] : []),
        '',
        ask,
        '',
        `Open the request: ${ctx.publicUrl}/requests/${r.id}`,
      ].join('\n'),
    });
  }
  return mails;
}
