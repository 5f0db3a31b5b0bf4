import { describe, expect, it } from 'vitest';
import { requestStates } from '../../../shared/requests/states';
import { availableEvents, evaluateEvent } from '../../../shared/workflow/evaluate';
import { requestMachine } from '../../../shared/workflow/requestMachine';
import type { WorkflowFacts } from '../../../shared/workflow/rules';

const facts: WorkflowFacts = { assignedEorId: 'eor-1', federalAid: false, majorChange: null, federalConcurrence: false, openConditions: 0 };
const member = (role: Parameters<typeof availableEvents>[2]['role'], id = `${role}-1`) => ({ id, role, member: true });

describe('the request workflow machine', () => {
  it('has exactly the states the product shows', () => {
    expect(Object.keys(requestMachine.root.states).sort()).toEqual([...requestStates].sort());
  });

  it('offers each desk only its own moves', () => {
    expect(availableEvents('drafting', facts, member('contractor'))).toEqual(['submit', 'withdraw']);
    expect(availableEvents('section_review', facts, member('section_engineer'))).toEqual(['forward', 'return_for_revision']);
    expect(availableEvents('central_routing', facts, member('central_office'))).toEqual(['return_for_revision', 'route']);
    expect(availableEvents('eor_review', facts, member('engineer_of_record', 'eor-1'))).toEqual([
      'return_for_revision', 'request_information', 'approve', 'approve_with_conditions', 'reject',
    ]);
    // Another engineer of record on the project may not decide a request routed to a colleague.
    expect(availableEvents('eor_review', facts, member('engineer_of_record', 'eor-2'))).toEqual([]);
    expect(availableEvents('eor_review', facts, { ...member('engineer_of_record', 'eor-1'), member: false })).toEqual([]);
    expect(availableEvents('closed', facts, member('contractor'))).toEqual([]);
  });

  it('closes on the last condition satisfied, not before', () => {
    const inspector = member('field_inspector');
    const first = evaluateEvent('conditions_open', { ...facts, openConditions: 2 }, { type: 'satisfy_condition', actor: inspector });
    expect(first).toMatchObject({ allowed: true, nextState: 'conditions_open', nextFacts: { openConditions: 1 } });
    const last = evaluateEvent('conditions_open', { ...facts, openConditions: 1 }, { type: 'satisfy_condition', actor: inspector });
    expect(last).toMatchObject({ allowed: true, nextState: 'closed', nextFacts: { openConditions: 0 } });
  });

  it('tells "not yours" (403) from "not now" (409)', () => {
    expect(evaluateEvent('section_review', facts, { type: 'forward', actor: member('contractor') })).toMatchObject({ allowed: false, status: 403 });
    expect(evaluateEvent('drafting', facts, { type: 'forward', actor: member('section_engineer') })).toMatchObject({ allowed: false, status: 409, code: 'not_now' });
    // Only the desk that holds the request returns it.
    expect(evaluateEvent('central_routing', facts, { type: 'return_for_revision', actor: member('section_engineer') })).toMatchObject({ allowed: false, status: 403 });
  });

  // 23 CFR 635.120(a): major changes on federal-aid projects need formal approval before they take effect.
  it('holds any decision on a major federal-aid change until the concurrence is recorded', () => {
    const eor = member('engineer_of_record', 'eor-1');
    const federal = { ...facts, federalAid: true };
    expect(evaluateEvent('eor_review', federal, { type: 'approve', actor: eor })).toMatchObject({ allowed: false, status: 409, code: 'not_ready' });
    expect(evaluateEvent('eor_review', { ...federal, majorChange: true }, { type: 'reject', actor: eor })).toMatchObject({ allowed: false, code: 'not_ready' });
    expect(evaluateEvent('eor_review', { ...federal, majorChange: true, federalConcurrence: true }, { type: 'approve', actor: eor })).toMatchObject({ allowed: true, nextState: 'closed' });
    expect(evaluateEvent('eor_review', { ...federal, majorChange: false }, { type: 'approve', actor: eor })).toMatchObject({ allowed: true });
  });

  it('lets members comment in any state, but not auditors, who observe', () => {
    expect(evaluateEvent('closed', facts, { type: 'comment', actor: member('field_inspector') })).toMatchObject({ allowed: true, nextState: 'closed' });
    expect(evaluateEvent('section_review', facts, { type: 'comment', actor: member('auditor') })).toMatchObject({ allowed: false, status: 403 });
  });
});
