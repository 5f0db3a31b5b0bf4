// What the filing form holds while the person types: every box as text (or a choice, or a tick),
// for all four request types at once, so switching type keeps what was typed in the shared part.
// `filingBody` turns it into a request body and the shared schema judges it.
import { jointPlanes, sealKinds, climates, deckMaterials, type SealKind } from '../../../shared/engineering';
import type { RequestType } from '../../../shared/requests/requestBody';

export const costKinds = ['none', 'credit', 'added_cost'] as const;
export type CostKind = (typeof costKinds)[number];

export const costKindLabels: Record<CostKind, string> = {
  none: 'No change in cost',
  credit: 'Credit to the owner',
  added_cost: 'Added cost',
};

export const sequenceKinds = ['single_placement', 'revised_sequence'] as const;
export const sequenceKindLabels: Record<(typeof sequenceKinds)[number], string> = {
  single_placement: 'One continuous placement',
  revised_sequence: 'A different staged sequence',
};

export const jointElements = ['deck', 'wall', 'footing', 'diaphragm', 'pier_cap', 'abutment', 'other'] as const;
export const jointElementLabels: Record<(typeof jointElements)[number], string> = {
  deck: 'Deck',
  wall: 'Wall',
  footing: 'Footing',
  diaphragm: 'Diaphragm',
  pier_cap: 'Pier cap',
  abutment: 'Abutment',
  other: 'Other',
};

export const planeLabels: Record<(typeof jointPlanes)[number], string> = {
  transverse: 'Transverse, across the deck',
  between_diaphragm_and_deck: 'Between a diaphragm and the deck',
};

export const materialLabels: Record<(typeof deckMaterials)[number], string> = { concrete: 'Concrete', steel: 'Steel' };
export const climateLabels: Record<(typeof climates)[number], string> = { moderate: 'Moderate', cold: 'Cold' };

type Blank<T extends string> = T | '';

export type SealValues = { kind: Blank<SealKind>; product: string; movementCapacityIn: string; minOpeningIn: string; maxOpeningIn: string };

export type FilingFormValues = {
  type: RequestType;
  projectId: string;
  title: string;
  location: { description: string; span: string; station: string };
  planSheets: string;
  reason: string;
  proposedChange: string;
  neededBy: string;
  costImpact: { kind: Blank<CostKind>; amountUsd: string };
  contractTimeImpactDays: string;
  // Deck placement change
  deck: { spansFt: string; deckWidthFt: string; slabThicknessIn: string; haunchCyPerFt: string };
  plannedSequence: string;
  proposedSequence: { kind: Blank<(typeof sequenceKinds)[number]>; description: string };
  placement: { rateCyPerHr: string; equipment: string };
  useRetarder: boolean;
  retarder: { astmC494Type: Blank<'B' | 'D'>; product: string; initialSetHr: string };
  emergencyJointAtFt: string;
  // Construction joint relocation
  element: Blank<(typeof jointElements)[number]>;
  spansFt: string;
  plannedLocation: { description: string; atFt: string };
  proposedLocation: { description: string; atFt: string };
  preparation: { roughened: boolean; keyed: boolean; waterstop: boolean };
  plane: Blank<(typeof jointPlanes)[number]>;
  // Joint seal substitution
  jointLocation: string;
  specified: SealValues;
  substitute: SealValues;
  contributingLengthFt: string;
  material: Blank<(typeof deckMaterials)[number]>;
  climate: Blank<(typeof climates)[number]>;
  installTempF: string;
  gapAtReferenceIn: string;
  referenceTempF: string;
};

const emptySeal = (): SealValues => ({ kind: '', product: '', movementCapacityIn: '', minOpeningIn: '', maxOpeningIn: '' });

export function emptyFiling(type: RequestType, projectId: string): FilingFormValues {
  return {
    type,
    projectId,
    title: '',
    location: { description: '', span: '', station: '' },
    planSheets: '',
    reason: '',
    proposedChange: '',
    neededBy: '',
    costImpact: { kind: '', amountUsd: '' },
    contractTimeImpactDays: '',
    deck: { spansFt: '', deckWidthFt: '', slabThicknessIn: '', haunchCyPerFt: '' },
    plannedSequence: '',
    proposedSequence: { kind: '', description: '' },
    placement: { rateCyPerHr: '', equipment: '' },
    useRetarder: false,
    retarder: { astmC494Type: '', product: '', initialSetHr: '' },
    emergencyJointAtFt: '',
    element: '',
    spansFt: '',
    plannedLocation: { description: '', atFt: '' },
    proposedLocation: { description: '', atFt: '' },
    preparation: { roughened: false, keyed: false, waterstop: false },
    plane: '',
    jointLocation: '',
    specified: emptySeal(),
    substitute: emptySeal(),
    contributingLengthFt: '',
    material: '',
    climate: '',
    installTempF: '',
    gapAtReferenceIn: '',
    referenceTempF: '',
  };
}

export { sealKinds, climates, deckMaterials, jointPlanes };

// The form's control: typed values in, a request body out of the resolver.
export type FilingControl = import('react-hook-form').Control<FilingFormValues, unknown, import('../../../shared/requests/requestBody').RequestBody>;
