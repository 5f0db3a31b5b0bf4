// Who may make each move, and what must be true of the request first. The machine's guards are
// built from these, and the server uses them to tell "not yours" (403) from "not now" (409).
import type { Role } from '../roles';
import type { WorkflowEventType } from './events';

export type WorkflowActor = { id: string; role: Role; member: boolean };

export type WorkflowFacts = {
  assignedEorId: string | null;
  federalAid: boolean;
  majorChange: boolean | null;
  federalConcurrence: boolean;
  openConditions: number;
};

export type MachineEventType = WorkflowEventType | 'comment';

export type MachineEvent = {
  type: MachineEventType;
  actor: WorkflowActor;
  eorUserId?: string;
  conditionCount?: number;
  majorChange?: boolean;
};

const of = (role: Role) => (_: WorkflowFacts, a: WorkflowActor) => a.member && a.role === role;
const contractor = of('contractor');
const sectionEngineer = of('section_engineer');
const centralOffice = of('central_office');
const fieldInspector = of('field_inspector');
const assignedEor = (f: WorkflowFacts, a: WorkflowActor) => a.member && a.role === 'engineer_of_record' && a.id === f.assignedEorId;
const anyReviewDesk = (f: WorkflowFacts, a: WorkflowActor) => sectionEngineer(f, a) || centralOffice(f, a) || assignedEor(f, a);

export const authority: Record<MachineEventType, (facts: WorkflowFacts, actor: WorkflowActor) => boolean> = {
  submit: contractor,
  resubmit: contractor,
  withdraw: contractor,
  provide_information: contractor,
  forward: sectionEngineer,
  route: centralOffice,
  reassign: centralOffice,
  classify_change: centralOffice,
  record_federal_concurrence: centralOffice,
  request_information: assignedEor,
  approve: assignedEor,
  approve_with_conditions: assignedEor,
  reject: assignedEor,
  satisfy_condition: fieldInspector,
  // Which review desk may return is narrowed by the state: only the desk holding the request.
  return_for_revision: anyReviewDesk,
  // Every member but the auditor, who observes and does not take part.
  comment: (_, a) => a.member && a.role !== 'auditor',
};

// The review desk that holds the request in each review state, for returns.
export const returningDesk: Partial<Record<string, Role>> = {
  section_review: 'section_engineer',
  central_routing: 'central_office',
  eor_review: 'engineer_of_record',
};

function federalClearance(f: WorkflowFacts): string | null {
  if (!f.federalAid) return null;
  if (f.majorChange === null) return 'This is a federal-aid project: central office must first classify the change as major or not.';
  if (f.majorChange && !f.federalConcurrence) {
    return 'A major change on a federal-aid project cannot be decided until central office records the federal oversight agency’s concurrence (23 CFR 635.120(a)).';
  }
  return null;
}

// null when the move may go ahead; otherwise what is missing, in plain words.
export const readiness: Partial<Record<MachineEventType, (facts: WorkflowFacts, event: MachineEvent) => string | null>> = {
  approve: federalClearance,
  approve_with_conditions: (f, e) => federalClearance(f) ?? ((e.conditionCount ?? 0) < 1 ? 'List at least one condition.' : null),
  reject: federalClearance,
  classify_change: (f) => (f.federalAid ? null : 'Only changes on federal-aid projects are classified as major or minor.'),
  record_federal_concurrence: (f) =>
    !f.federalAid ? 'This is not a federal-aid project.' : f.majorChange !== true ? 'Only a major change needs the federal concurrence.' : null,
  reassign: (f, e) => (e.eorUserId && e.eorUserId === f.assignedEorId ? 'The request is already with that engineer of record.' : null),
  satisfy_condition: (f) => (f.openConditions > 0 ? null : 'Every condition is already satisfied.'),
};
