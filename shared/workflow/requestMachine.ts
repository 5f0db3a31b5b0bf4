// The request workflow as an xstate machine. The server is the only authority: it restores the
// machine at the request's stored state, asks whether the event is allowed for this actor, and
// stores the state the machine moves to. The client uses the same machine to show what is possible.
import { and, assign, setup } from 'xstate';
import { authority, readiness, returningDesk, type MachineEvent, type MachineEventType, type WorkflowFacts } from './rules';

const may = (type: MachineEventType) => ({ context, event }: { context: WorkflowFacts; event: MachineEvent }) =>
  authority[type](context, event.actor);
const ready = (type: MachineEventType) => ({ context, event }: { context: WorkflowFacts; event: MachineEvent }) =>
  (readiness[type]?.(context, event) ?? null) === null;

export const requestMachine = setup({
  types: {
    context: {} as WorkflowFacts,
    events: {} as MachineEvent,
    input: {} as WorkflowFacts,
  },
  guards: {
    maySubmit: may('submit'),
    mayResubmit: may('resubmit'),
    mayWithdraw: may('withdraw'),
    mayProvideInformation: may('provide_information'),
    mayForward: may('forward'),
    mayRoute: may('route'),
    mayReassign: may('reassign'),
    readyToReassign: ready('reassign'),
    mayClassify: may('classify_change'),
    readyToClassify: ready('classify_change'),
    mayRecordConcurrence: may('record_federal_concurrence'),
    readyToRecordConcurrence: ready('record_federal_concurrence'),
    mayRequestInformation: may('request_information'),
    mayApprove: may('approve'),
    readyToApprove: ready('approve'),
    mayApproveWithConditions: may('approve_with_conditions'),
    readyToApproveWithConditions: ready('approve_with_conditions'),
    mayReject: may('reject'),
    readyToReject: ready('reject'),
    maySatisfyCondition: may('satisfy_condition'),
    readyToSatisfyCondition: ready('satisfy_condition'),
    isLastOpenCondition: ({ context }) => context.openConditions === 1,
    mayComment: may('comment'),
    // A return comes only from the desk holding the request.
    mayReturnFromSection: ({ event }) => event.actor.member && event.actor.role === returningDesk.section_review,
    mayReturnFromCentral: ({ event }) => event.actor.member && event.actor.role === returningDesk.central_routing,
    mayReturnFromEor: ({ context, event }) => event.actor.member && event.actor.role === 'engineer_of_record' && event.actor.id === context.assignedEorId,
  },
  actions: {
    // A comment changes nothing in the workflow; the named action makes the machine count it as a move.
    noteComment: () => {},
    assignEor: assign({ assignedEorId: ({ event }) => event.eorUserId ?? null }),
    recordClassification: assign({
      majorChange: ({ event }) => event.majorChange ?? null,
      // A new classification needs a fresh concurrence if it is major.
      federalConcurrence: ({ context, event }) => (event.majorChange ? context.federalConcurrence : false),
    }),
    recordConcurrence: assign({ federalConcurrence: true }),
    openConditions: assign({ openConditions: ({ event }) => event.conditionCount ?? 0 }),
    satisfyOneCondition: assign({ openConditions: ({ context }) => Math.max(0, context.openConditions - 1) }),
  },
}).createMachine({
  id: 'request',
  initial: 'drafting',
  context: ({ input }) => input,
  on: {
    comment: { guard: 'mayComment', actions: 'noteComment' },
  },
  states: {
    drafting: {
      on: {
        submit: { guard: 'maySubmit', target: 'section_review' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    section_review: {
      on: {
        forward: { guard: 'mayForward', target: 'central_routing' },
        return_for_revision: { guard: 'mayReturnFromSection', target: 'revising' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    central_routing: {
      on: {
        route: { guard: 'mayRoute', target: 'eor_review', actions: 'assignEor' },
        return_for_revision: { guard: 'mayReturnFromCentral', target: 'revising' },
        // Central office classifies the change and records the federal concurrence while the
        // request is with it or with the engineer of record; both states carry the same two moves.
        classify_change: { guard: and(['mayClassify', 'readyToClassify']), actions: 'recordClassification' },
        record_federal_concurrence: { guard: and(['mayRecordConcurrence', 'readyToRecordConcurrence']), actions: 'recordConcurrence' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    eor_review: {
      on: {
        approve: { guard: and(['mayApprove', 'readyToApprove']), target: 'closed' },
        approve_with_conditions: { guard: and(['mayApproveWithConditions', 'readyToApproveWithConditions']), target: 'conditions_open', actions: 'openConditions' },
        reject: { guard: and(['mayReject', 'readyToReject']), target: 'rejected' },
        request_information: { guard: 'mayRequestInformation', target: 'information_requested' },
        return_for_revision: { guard: 'mayReturnFromEor', target: 'revising' },
        reassign: { guard: and(['mayReassign', 'readyToReassign']), target: 'eor_review', actions: 'assignEor' },
        classify_change: { guard: and(['mayClassify', 'readyToClassify']), actions: 'recordClassification' },
        record_federal_concurrence: { guard: and(['mayRecordConcurrence', 'readyToRecordConcurrence']), actions: 'recordConcurrence' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    information_requested: {
      on: {
        provide_information: { guard: 'mayProvideInformation', target: 'eor_review' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    revising: {
      on: {
        resubmit: { guard: 'mayResubmit', target: 'section_review' },
        withdraw: { guard: 'mayWithdraw', target: 'withdrawn' },
      },
    },
    conditions_open: {
      on: {
        satisfy_condition: [
          { guard: and(['maySatisfyCondition', 'readyToSatisfyCondition', 'isLastOpenCondition']), target: 'closed', actions: 'satisfyOneCondition' },
          { guard: and(['maySatisfyCondition', 'readyToSatisfyCondition']), actions: 'satisfyOneCondition' },
        ],
      },
    },
    // Settled states take comments only (the root handler); nothing moves them again.
    closed: {},
    rejected: {},
    withdrawn: {},
  },
});
