// The engineering check on what the form holds now. It runs as soon as the figures the check
// reads are valid, whatever else is still empty, and says which figures it is waiting for.
import { EngineeringInputError } from '../../../shared/engineering';
import { bodyFieldLabels } from '../../../shared/requests/bodyFields';
import { engineeringCheckFor, type EngineeringCheck } from '../../../shared/requests/engineeringCheck';
import { requestBodySchema, type RequestBody, type RequestType } from '../../../shared/requests/requestBody';
import { filingBody } from './filingBody';
import { fieldFor } from './formSchema';
import type { FilingFormValues } from './formValues';

export type LiveCheck = { state: 'none' } | { state: 'waiting'; hint: string } | { state: 'refused'; hint: string } | { state: 'ready'; check: EngineeringCheck };

// The boxes each check reads; a complaint about any other box does not hold the check back.
const readBy: Record<RequestType, string[]> = {
  deck_placement_change: ['deck.', 'placement.rateCyPerHr', 'proposedSequence.kind', 'retarder.', 'emergencyJointAtFt'],
  construction_joint_relocation: ['spansFt', 'plannedLocation.atFt', 'proposedLocation.atFt', 'plane'],
  joint_seal_substitution: ['specified.', 'substitute.', 'contributingLengthFt', 'material', 'climate', 'installTempF', 'gapAtReferenceIn', 'referenceTempF'],
  other_deviation: [],
};

const labels = new Map(bodyFieldLabels);

export function liveCheckFor(values: FilingFormValues): LiveCheck {
  if (values.type === 'other_deviation') return { state: 'none' };
  // Without spans and a station the check has nothing to draw; say what it needs instead of a verdict.
  if (values.type === 'construction_joint_relocation' && (values.spansFt.trim() === '' || values.proposedLocation.atFt.trim() === '')) {
    return { state: 'waiting', hint: 'Give the span lengths and the proposed joint station to check the joint against the moment diagram; without them the reviewers judge the location.' };
  }
  const body = filingBody(values);
  const parsed = requestBodySchema.safeParse(body);
  if (!parsed.success) {
    const waitingFor = new Set<string>();
    for (const issue of parsed.error.issues) {
      const field = fieldFor(issue.path);
      if (field && readBy[values.type].some((p) => (p.endsWith('.') ? field.startsWith(p) : field === p))) waitingFor.add(field);
    }
    if (waitingFor.size > 0) {
      const names = [...waitingFor].map((f) => (labels.get(f) ?? f).replace(/ \((ft|in|cy\/h|°F|h)\)$/, ''));
      return { state: 'waiting', hint: `The check runs once these are filled in correctly: ${names.join(', ')}.` };
    }
  }
  try {
    // The check reads only the boxes above, which are valid by now; the rest may still be empty.
    const check = engineeringCheckFor(parsed.success ? parsed.data : (body as RequestBody));
    return check ? { state: 'ready', check } : { state: 'none' };
  } catch (err) {
    if (err instanceof EngineeringInputError) return { state: 'refused', hint: err.message };
    return { state: 'refused', hint: 'The check could not be worked out from these figures; check them, or file the request for the reviewers to judge.' };
  }
}
