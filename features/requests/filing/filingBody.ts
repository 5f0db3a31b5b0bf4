// The form's text turned into a request body of the chosen type. Nothing is judged here: an empty
// box becomes "missing" (never 0) and a mistyped number NaN, so the shared schema says what is wrong.
import { parseNumberList } from '../../../shared/requests/numberList';
import type { FilingFormValues, SealValues } from './formValues';

const blankToUndefined = (s: string) => (s.trim() === '' ? undefined : s.trim());

export function numberOrUndefined(s: string): number | undefined {
  const cleaned = s.replace(/[$,\s]/g, '').replace(/^\+/, '');
  return cleaned === '' ? undefined : Number(cleaned);
}

export function splitPlanSheets(text: string): string[] {
  return text
    .split(/[,;\n]/)
    .map((s) => s.trim())
    .filter(Boolean);
}

const choice = <T extends string>(v: T | '') => (v === '' ? undefined : v);

function commonBody(v: FilingFormValues) {
  const kind = v.costImpact.kind;
  return {
    projectId: v.projectId,
    title: v.title,
    location: { description: v.location.description, span: blankToUndefined(v.location.span), station: blankToUndefined(v.location.station) },
    planSheets: splitPlanSheets(v.planSheets),
    reason: v.reason,
    proposedChange: v.proposedChange,
    neededBy: v.neededBy.trim(),
    costImpact: kind === '' ? undefined : kind === 'none' ? { kind } : { kind, amountUsd: numberOrUndefined(v.costImpact.amountUsd) },
    contractTimeImpactDays: numberOrUndefined(v.contractTimeImpactDays),
  };
}

function sealBody(s: SealValues) {
  return {
    kind: choice(s.kind),
    product: blankToUndefined(s.product),
    movementCapacityIn: numberOrUndefined(s.movementCapacityIn),
    minOpeningIn: numberOrUndefined(s.minOpeningIn),
    maxOpeningIn: numberOrUndefined(s.maxOpeningIn),
  };
}

export function filingBody(v: FilingFormValues): Record<string, unknown> {
  const common = commonBody(v);
  switch (v.type) {
    case 'deck_placement_change':
      return {
        type: v.type,
        ...common,
        deck: {
          spansFt: parseNumberList(v.deck.spansFt),
          deckWidthFt: numberOrUndefined(v.deck.deckWidthFt),
          slabThicknessIn: numberOrUndefined(v.deck.slabThicknessIn),
          haunchCyPerFt: numberOrUndefined(v.deck.haunchCyPerFt),
        },
        plannedSequence: v.plannedSequence,
        proposedSequence: { kind: choice(v.proposedSequence.kind), description: v.proposedSequence.description },
        placement: { rateCyPerHr: numberOrUndefined(v.placement.rateCyPerHr), equipment: v.placement.equipment },
        retarder: v.useRetarder
          ? { astmC494Type: choice(v.retarder.astmC494Type), product: v.retarder.product, initialSetHr: numberOrUndefined(v.retarder.initialSetHr) }
          : undefined,
        emergencyJointAtFt: numberOrUndefined(v.emergencyJointAtFt),
      };
    case 'construction_joint_relocation':
      return {
        type: v.type,
        ...common,
        element: choice(v.element),
        spansFt: parseNumberList(v.spansFt),
        plannedLocation: { description: v.plannedLocation.description, atFt: numberOrUndefined(v.plannedLocation.atFt) },
        proposedLocation: { description: v.proposedLocation.description, atFt: numberOrUndefined(v.proposedLocation.atFt) },
        preparation: { ...v.preparation },
        plane: choice(v.plane),
      };
    case 'joint_seal_substitution':
      return {
        type: v.type,
        ...common,
        jointLocation: v.jointLocation,
        specified: sealBody(v.specified),
        substitute: sealBody(v.substitute),
        contributingLengthFt: numberOrUndefined(v.contributingLengthFt),
        material: choice(v.material),
        climate: choice(v.climate),
        installTempF: numberOrUndefined(v.installTempF),
        gapAtReferenceIn: numberOrUndefined(v.gapAtReferenceIn),
        referenceTempF: numberOrUndefined(v.referenceTempF),
      };
    case 'other_deviation':
      return { type: v.type, ...common };
  }
}
