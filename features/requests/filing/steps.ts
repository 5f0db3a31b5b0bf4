// The filing form in steps. The reducer only moves between them; whether a step may be left is
// the form's call (it checks that step's boxes first), so the same moves serve a person pressing
// Next, a draft reopened where it was left, and a server refusal that sends them back.
import type { RequestType } from '../../../shared/requests/requestBody';
import { filingFieldNames } from './formSchema';

export const filingSteps = ['kind', 'where', 'departure', 'files', 'review'] as const;
export type FilingStep = (typeof filingSteps)[number];

export const stepTitles: Record<FilingStep, string> = {
  kind: 'Kind of request',
  where: 'What and where',
  departure: 'The departure',
  files: 'Drawings and photos',
  review: 'Review and file',
};

export type StepState = { step: FilingStep; reached: FilingStep };

export type StepAction =
  | { type: 'next' }
  | { type: 'back' }
  // Only to a step already reached: a later one's boxes have not been checked yet.
  | { type: 'goTo'; step: FilingStep }
  // A draft reopened on this device carries on where it was left.
  | { type: 'resume'; step: FilingStep };

const at = (step: FilingStep) => filingSteps.indexOf(step);

export const firstStep: StepState = { step: 'kind', reached: 'kind' };

export function isFilingStep(value: unknown): value is FilingStep {
  return typeof value === 'string' && (filingSteps as readonly string[]).includes(value);
}

export function stepReducer(state: StepState, action: StepAction): StepState {
  switch (action.type) {
    case 'next': {
      const step = filingSteps[Math.min(at(state.step) + 1, filingSteps.length - 1)]!;
      return { step, reached: at(step) > at(state.reached) ? step : state.reached };
    }
    case 'back':
      return { ...state, step: filingSteps[Math.max(at(state.step) - 1, 0)]! };
    case 'goTo':
      return at(action.step) <= at(state.reached) ? { ...state, step: action.step } : state;
    case 'resume':
      return { step: action.step, reached: action.step };
  }
}

/** "Step 3 of 5: The departure" */
export function stepHeading(step: FilingStep): string {
  return `Step ${at(step) + 1} of ${filingSteps.length}: ${stepTitles[step]}`;
}

const whereBoxes = ['projectId', 'title', 'location.', 'planSheets'];
const changeBoxes = ['reason', 'proposedChange', 'neededBy', 'costImpact.', 'contractTimeImpactDays'];
const typedBoxes: Record<RequestType, string[]> = {
  deck_placement_change: ['deck.', 'plannedSequence', 'proposedSequence.', 'placement.', 'useRetarder', 'retarder.', 'emergencyJointAtFt'],
  construction_joint_relocation: ['element', 'spansFt', 'plannedLocation.', 'proposedLocation.', 'preparation.', 'plane'],
  joint_seal_substitution: ['jointLocation', 'specified.', 'substitute.', 'contributingLengthFt', 'material', 'climate', 'installTempF', 'gapAtReferenceIn', 'referenceTempF'],
  other_deviation: [],
};

const matches = (field: string, patterns: readonly string[]) => patterns.some((p) => (p.endsWith('.') ? field.startsWith(p) : field === p));

/** The boxes a step shows, which are the ones its Next checks. */
export function stepFields(step: FilingStep, type: RequestType): string[] {
  switch (step) {
    case 'where':
      return filingFieldNames.filter((f) => matches(f, whereBoxes));
    case 'departure':
      return filingFieldNames.filter((f) => matches(f, typedBoxes[type]) || matches(f, changeBoxes));
    case 'review':
      return [...stepFields('where', type), ...stepFields('departure', type)];
    default:
      return [];
  }
}

/** The step that shows a box; a complaint no box shows is read on the review step. */
export function stepOfField(field: string, type: RequestType): FilingStep {
  if (field === 'type') return 'kind';
  if (matches(field, whereBoxes)) return 'where';
  if (matches(field, typedBoxes[type]) || matches(field, changeBoxes)) return 'departure';
  return 'review';
}

/** The earliest step among the boxes named, so a person fixes things in the order they filled them. */
export function earliestStep(fields: readonly string[], type: RequestType): FilingStep | null {
  let best: FilingStep | null = null;
  for (const f of fields) {
    const s = stepOfField(f, type);
    if (best === null || at(s) < at(best)) best = s;
  }
  return best;
}
