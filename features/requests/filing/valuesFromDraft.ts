// A draft as the server holds it, back in the form's boxes: used when someone else saved the same
// draft in between and the form shows their version before the person saves again.
import type { RequestDraft } from '../../../shared/requests/requestBody';
import { emptyFiling, type FilingFormValues, type SealValues } from './formValues';

type Loose = Record<string, unknown>;

const text = (v: unknown) => (v === undefined || v === null ? '' : String(v));
const list = (v: unknown) => (Array.isArray(v) ? v.join(', ') : '');
const group = (v: unknown): Loose => (v !== null && typeof v === 'object' ? (v as Loose) : {});

function seal(v: unknown, empty: SealValues): SealValues {
  const s = group(v);
  return {
    kind: (s.kind as SealValues['kind']) ?? empty.kind,
    product: text(s.product),
    movementCapacityIn: text(s.movementCapacityIn),
    minOpeningIn: text(s.minOpeningIn),
    maxOpeningIn: text(s.maxOpeningIn),
  };
}

export function filingValuesFrom(draft: RequestDraft): FilingFormValues {
  const d = draft as Loose;
  const empty = emptyFiling(draft.type, draft.projectId);
  const location = group(d.location);
  const cost = group(d.costImpact);
  const deck = group(d.deck);
  const proposedSequence = group(d.proposedSequence);
  const placement = group(d.placement);
  const retarder = d.retarder === undefined ? null : group(d.retarder);
  const planned = group(d.plannedLocation);
  const proposed = group(d.proposedLocation);
  const preparation = group(d.preparation);
  return {
    ...empty,
    title: text(d.title),
    location: { description: text(location.description), span: text(location.span), station: text(location.station) },
    planSheets: list(d.planSheets),
    reason: text(d.reason),
    proposedChange: text(d.proposedChange),
    neededBy: text(d.neededBy),
    costImpact: { kind: (cost.kind as FilingFormValues['costImpact']['kind']) ?? '', amountUsd: text(cost.amountUsd) },
    contractTimeImpactDays: text(d.contractTimeImpactDays),
    deck: { spansFt: list(deck.spansFt), deckWidthFt: text(deck.deckWidthFt), slabThicknessIn: text(deck.slabThicknessIn), haunchCyPerFt: text(deck.haunchCyPerFt) },
    plannedSequence: text(d.plannedSequence),
    proposedSequence: { kind: (proposedSequence.kind as FilingFormValues['proposedSequence']['kind']) ?? '', description: text(proposedSequence.description) },
    placement: { rateCyPerHr: text(placement.rateCyPerHr), equipment: text(placement.equipment) },
    useRetarder: retarder !== null,
    retarder: {
      astmC494Type: (retarder?.astmC494Type as FilingFormValues['retarder']['astmC494Type']) ?? '',
      product: text(retarder?.product),
      initialSetHr: text(retarder?.initialSetHr),
    },
    emergencyJointAtFt: text(d.emergencyJointAtFt),
    element: (d.element as FilingFormValues['element']) ?? '',
    spansFt: list(d.spansFt),
    plannedLocation: { description: text(planned.description), atFt: text(planned.atFt) },
    proposedLocation: { description: text(proposed.description), atFt: text(proposed.atFt) },
    preparation: { roughened: preparation.roughened === true, keyed: preparation.keyed === true, waterstop: preparation.waterstop === true },
    plane: (d.plane as FilingFormValues['plane']) ?? '',
    jointLocation: text(d.jointLocation),
    specified: seal(d.specified, empty.specified),
    substitute: seal(d.substitute, empty.substitute),
    contributingLengthFt: text(d.contributingLengthFt),
    material: (d.material as FilingFormValues['material']) ?? '',
    climate: (d.climate as FilingFormValues['climate']) ?? '',
    installTempF: text(d.installTempF),
    gapAtReferenceIn: text(d.gapAtReferenceIn),
    referenceTempF: text(d.referenceTempF),
  };
}
