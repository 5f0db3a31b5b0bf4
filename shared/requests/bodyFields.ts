// How each field of a request body is named on screens and in the decision record, in reading order.
export const bodyFieldLabels: [path: string, label: string][] = [
  ['title', 'Title'],
  ['structureNumber', 'Structure'],
  ['location.description', 'Location'],
  ['location.span', 'Span'],
  ['location.station', 'Station'],
  ['planSheets', 'Plan sheets'],
  ['reason', 'Reason'],
  ['proposedChange', 'Proposed change'],
  ['neededBy', 'Needed by'],
  ['costImpact.kind', 'Cost impact'],
  ['costImpact.amountUsd', 'Amount (USD)'],
  ['contractTimeImpactDays', 'Contract-time impact (days)'],
  ['deck.spansFt', 'Span lengths (ft)'],
  ['deck.deckWidthFt', 'Deck width (ft)'],
  ['deck.slabThicknessIn', 'Slab thickness (in)'],
  ['deck.haunchCyPerFt', 'Haunch (cy per ft)'],
  ['plannedSequence', 'Placement sequence on the plans'],
  ['proposedSequence.kind', 'Proposed sequence'],
  ['proposedSequence.description', 'Proposed sequence, described'],
  ['placement.rateCyPerHr', 'Placement rate (cy/h)'],
  ['placement.equipment', 'Placing equipment'],
  ['retarder.astmC494Type', 'Retarder, ASTM C494 type'],
  ['retarder.product', 'Retarder product'],
  ['retarder.initialSetHr', 'Tested initial set, ASTM C403 (h)'],
  ['emergencyJointAtFt', 'Emergency joint at (ft)'],
  ['element', 'Element'],
  ['spansFt', 'Span lengths (ft)'],
  ['plannedLocation.description', 'Joint location on the plans'],
  ['plannedLocation.atFt', 'Planned joint at (ft)'],
  ['proposedLocation.description', 'Proposed joint location'],
  ['proposedLocation.atFt', 'Proposed joint at (ft)'],
  ['preparation.roughened', 'Joint surface roughened'],
  ['preparation.keyed', 'Joint keyed'],
  ['preparation.waterstop', 'Waterstop'],
  ['plane', 'Joint plane'],
  ['jointLocation', 'Expansion joint'],
  ['specified.kind', 'Specified seal'],
  ['specified.product', 'Specified product'],
  ['specified.movementCapacityIn', 'Specified movement capacity (in)'],
  ['specified.minOpeningIn', 'Specified minimum opening (in)'],
  ['specified.maxOpeningIn', 'Specified maximum opening (in)'],
  ['substitute.kind', 'Substitute seal'],
  ['substitute.product', 'Substitute product'],
  ['substitute.movementCapacityIn', 'Substitute movement capacity (in)'],
  ['substitute.minOpeningIn', 'Substitute minimum opening (in)'],
  ['substitute.maxOpeningIn', 'Substitute maximum opening (in)'],
  ['contributingLengthFt', 'Contributing length (ft)'],
  ['material', 'Superstructure material'],
  ['climate', 'Climate'],
  ['installTempF', 'Installation temperature (°F)'],
  ['gapAtReferenceIn', 'Opening at the reference temperature (in)'],
  ['referenceTempF', 'Reference temperature (°F)'],
];

const order = new Map(bodyFieldLabels.map(([path], i) => [path, i]));
const labels = new Map(bodyFieldLabels);

function flatten(value: unknown, prefix: string, out: [string, unknown][]) {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (value !== undefined) {
    out.push([prefix, value]);
  }
}

function shown(value: unknown): string {
  if (Array.isArray(value)) return value.join(', ');
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value).replace(/_/g, ' ');
}

// The body as labelled lines in reading order; the type and project are shown elsewhere.
export function labelledBodyFields(body: unknown): { path: string; label: string; value: string }[] {
  const flat: [string, unknown][] = [];
  flatten(body, '', flat);
  return flat
    .filter(([path]) => path !== 'type' && path !== 'projectId')
    .sort(([a], [b]) => (order.get(a) ?? 999) - (order.get(b) ?? 999))
    .map(([path, value]) => ({ path, label: labels.get(path) ?? path, value: shown(value) }));
}
