// Where a request sits, whose desk that is, and its label on the screens. The workflow machine
// (shared/workflow/requestMachine.ts) is the authority on the moves between them.
import type { DeskRole } from '../workflow/desks';

export const requestStates = [
  'drafting',
  'section_review',
  'central_routing',
  'eor_review',
  'information_requested',
  'revising',
  'conditions_open',
  'closed',
  'rejected',
  'withdrawn',
] as const;
export type RequestState = (typeof requestStates)[number];

export const requestStateInfo: Record<RequestState, { label: string; desk: DeskRole | null; settled: boolean }> = {
  drafting: { label: 'Drafting', desk: 'contractor', settled: false },
  section_review: { label: 'With the section engineer', desk: 'section_engineer', settled: false },
  central_routing: { label: 'With central office for routing', desk: 'central_office', settled: false },
  eor_review: { label: 'With the engineer of record', desk: 'engineer_of_record', settled: false },
  information_requested: { label: 'Information asked of the contractor', desk: 'contractor', settled: false },
  revising: { label: 'Returned for revision', desk: 'contractor', settled: false },
  conditions_open: { label: 'Approved with conditions; conditions open', desk: 'field_inspector', settled: false },
  closed: { label: 'Closed (approved)', desk: null, settled: true },
  rejected: { label: 'Rejected', desk: null, settled: true },
  withdrawn: { label: 'Withdrawn', desk: null, settled: true },
};

export function isRequestState(value: string): value is RequestState {
  return (requestStates as readonly string[]).includes(value);
}

export function stateLabel(state: string): string {
  return isRequestState(state) ? requestStateInfo[state].label : state;
}

export function statesAtDesk(desk: string): RequestState[] {
  return requestStates.filter((s) => requestStateInfo[s].desk === desk);
}
