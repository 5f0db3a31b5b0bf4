// The moves a person can make on a request, with the payload each needs. The server validates a
// posted event with `workflowEventSchema` before asking the machine whether this actor may make it.
import { z } from 'zod';

const comment = (what: string) => z.string({ message: `Say why ${what}.` }).trim().min(3, `Say why ${what}.`).max(8000);
const optionalComment = z.string().trim().max(8000).optional();
const version = z.number({ message: 'Send the version of the request you saw.' }).int().positive();

export const conditionInputSchema = z.strictObject({
  text: z.string().trim().min(5, 'Describe the condition (at least 5 characters).').max(2000),
  dueBefore: z.string().trim().min(3, 'Say when the condition must be met, e.g. "before placement".').max(200),
});

export const workflowEventSchema = z.discriminatedUnion('type', [
  z.strictObject({ type: z.literal('submit'), version, comment: optionalComment }),
  z.strictObject({ type: z.literal('forward'), version, comment: optionalComment }),
  z.strictObject({ type: z.literal('return_for_revision'), version, comment: comment('it goes back for revision') }),
  z.strictObject({ type: z.literal('route'), version, eorUserId: z.string().min(1, 'Choose the engineer of record.'), comment: optionalComment }),
  z.strictObject({ type: z.literal('reassign'), version, eorUserId: z.string().min(1, 'Choose the engineer of record.'), comment: comment('it is reassigned') }),
  z.strictObject({ type: z.literal('request_information'), version, comment: comment('more information is needed, and what') }),
  z.strictObject({ type: z.literal('provide_information'), version, comment: comment('this answers the question') }),
  z.strictObject({ type: z.literal('approve'), version, comment: optionalComment }),
  z.strictObject({
    type: z.literal('approve_with_conditions'),
    version,
    comment: optionalComment,
    conditions: z.array(conditionInputSchema).min(1, 'List at least one condition.').max(50),
  }),
  z.strictObject({ type: z.literal('reject'), version, comment: comment('it is rejected') }),
  z.strictObject({ type: z.literal('withdraw'), version, comment: optionalComment }),
  z.strictObject({ type: z.literal('resubmit'), version, comment: comment('it is resubmitted, and what changed') }),
  z.strictObject({
    type: z.literal('satisfy_condition'),
    version,
    conditionId: z.uuid({ message: 'Choose the condition.' }),
    comment: z.string().trim().min(3, 'Note how the condition was met on site.').max(8000),
    evidenceAttachmentId: z.uuid({ message: 'Attach the evidence (a photo or document) first.' }),
  }),
  z.strictObject({ type: z.literal('classify_change'), version, majorChange: z.boolean(), comment: optionalComment }),
  z.strictObject({
    type: z.literal('record_federal_concurrence'),
    version,
    letterAttachmentId: z.uuid({ message: 'Attach the concurrence letter first.' }),
    comment: optionalComment,
  }),
]);

export type WorkflowEventInput = z.infer<typeof workflowEventSchema>;
export type WorkflowEventType = WorkflowEventInput['type'];
export const workflowEventTypes = workflowEventSchema.options.map((o) => o.shape.type.value) as WorkflowEventType[];

export const workflowEventLabels: Record<WorkflowEventType, string> = {
  submit: 'Submit to the section engineer',
  forward: 'Forward to central office',
  return_for_revision: 'Return for revision',
  route: 'Route to an engineer of record',
  reassign: 'Reassign to another engineer of record',
  request_information: 'Ask for more information',
  provide_information: 'Answer the question',
  approve: 'Approve',
  approve_with_conditions: 'Approve with conditions',
  reject: 'Reject',
  withdraw: 'Withdraw the request',
  resubmit: 'Resubmit as a new revision',
  satisfy_condition: 'Mark a condition satisfied',
  classify_change: 'Classify as major or minor change',
  record_federal_concurrence: 'Record the federal concurrence',
};

// What the trail says happened, in the past tense.
export const workflowEventPastTense: Record<WorkflowEventType | 'created' | 'commented', string> = {
  created: 'Started the request',
  commented: 'Commented',
  submit: 'Submitted to the section engineer',
  forward: 'Forwarded to central office',
  return_for_revision: 'Returned for revision',
  route: 'Routed to an engineer of record',
  reassign: 'Reassigned to another engineer of record',
  request_information: 'Asked for more information',
  provide_information: 'Answered the question',
  approve: 'Approved',
  approve_with_conditions: 'Approved with conditions',
  reject: 'Rejected',
  withdraw: 'Withdrew the request',
  resubmit: 'Resubmitted as a new revision',
  satisfy_condition: 'Marked a condition satisfied',
  classify_change: 'Classified the change',
  record_federal_concurrence: 'Recorded the federal concurrence',
};
