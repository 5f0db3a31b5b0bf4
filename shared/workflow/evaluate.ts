// Asks the machine about one event for one actor at the request's stored state. Used by the server
// (the authority) and by the client (to show only the moves this person may make now).
import { getNextSnapshot } from 'xstate';
import { isRequestState, stateLabel, type RequestState } from '../requests/states';
import { requestMachine } from './requestMachine';
import { authority, readiness, type MachineEvent, type MachineEventType, type WorkflowActor, type WorkflowFacts } from './rules';
import { workflowEventTypes } from './events';

export type Evaluation =
  | { allowed: true; nextState: RequestState; nextFacts: WorkflowFacts }
  | { allowed: false; status: 403 | 409; code: 'not_your_move' | 'not_now' | 'not_ready'; message: string };

function snapshotAt(state: RequestState, facts: WorkflowFacts) {
  return requestMachine.resolveState({ value: state, context: facts });
}

export function stateAccepts(state: RequestState, type: MachineEventType): boolean {
  const node = requestMachine.root.states[state];
  return type === 'comment' || (node?.ownEvents ?? []).includes(type);
}

export function evaluateEvent(state: RequestState, facts: WorkflowFacts, event: MachineEvent): Evaluation {
  if (!stateAccepts(state, event.type)) {
    return { allowed: false, status: 409, code: 'not_now', message: `That cannot be done now: the request is ${stateLabel(state).toLowerCase()}.` };
  }
  if (!authority[event.type](facts, event.actor)) {
    return { allowed: false, status: 403, code: 'not_your_move', message: 'This move is not yours to make on this request.' };
  }
  const problem = readiness[event.type]?.(facts, event) ?? null;
  if (problem) return { allowed: false, status: 409, code: 'not_ready', message: problem };

  const snapshot = snapshotAt(state, facts);
  if (!snapshot.can(event)) {
    // Authority by state (e.g. a return only from the desk holding it) is decided by the machine alone.
    return { allowed: false, status: 403, code: 'not_your_move', message: 'This move is not yours to make on this request.' };
  }
  const next = getNextSnapshot(requestMachine, snapshot, event);
  const value = String(next.value);
  if (!isRequestState(value)) throw new Error(`workflow machine reached an unknown state ${value}`);
  return { allowed: true, nextState: value, nextFacts: next.context };
}

// The moves this actor may make now; payload details (which engineer, which condition) are checked
// when the move is made.
export function availableEvents(state: RequestState, facts: WorkflowFacts, actor: WorkflowActor): MachineEventType[] {
  const snapshot = snapshotAt(state, facts);
  return workflowEventTypes.filter((type) => {
    if (!stateAccepts(state, type)) return false;
    const probe: MachineEvent = { type, actor, conditionCount: 1, majorChange: true };
    return snapshot.can(probe);
  });
}
