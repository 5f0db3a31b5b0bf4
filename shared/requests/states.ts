// Where a request sits. The workflow machine (shared/workflow) is the authority on moves between
// them; this list gives each state the desk that holds it and a label for the screens.
import type { Role } from '../roles';

export const requestStates = ['drafting', 'section_review', 'central_routing', 'eor_review', 'closed'] as const;
export type RequestState = (typeof requestStates)[number];

export const requestStateInfo: Record<RequestState, { label: string; desk: Role | null }> = {
  drafting: { label: 'Drafting', desk: 'contractor' },
  section_review: { label: 'With the section engineer', desk: 'section_engineer' },
  central_routing: { label: 'With central office', desk: 'central_office' },
  eor_review: { label: 'With the engineer of record', desk: 'engineer_of_record' },
  closed: { label: 'Closed', desk: null },
};

export function stateLabel(state: string): string {
  return (requestStateInfo as Record<string, { label: string }>)[state]?.label ?? state;
}
