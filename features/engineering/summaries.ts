// What each plot says, in words: read out as the plot's accessible label and shown under it, so
// nothing in a plot is only visible as a shape or a colour.
import type { ContinuousBeamResult, DeckPlacementPlan, InstallationGap } from '../../shared/engineering';
import { degF, ft, inches, kipFt, listOf } from './format';

export function momentDiagramSummary(beam: ContinuousBeamResult, proposedJointFt?: number): string {
  const spans = beam.supportsFt.length - 1;
  const parts = [
    `Moment diagram of a ${spans}-span girder, ${ft(beam.totalLengthFt)} long.`,
    `Largest positive moment ${kipFt(beam.maxPositive.momentKipFt)} at ${ft(beam.maxPositive.xFt)}.`,
  ];
  if (beam.maxNegative.momentKipFt < 0) {
    parts.push(`Largest negative moment ${kipFt(beam.maxNegative.momentKipFt)} at ${ft(beam.maxNegative.xFt)}.`);
  } else {
    parts.push('No negative moment.');
  }
  if (beam.inflectionPointsFt.length > 0) {
    parts.push(`Inflection points at ${listOf(beam.inflectionPointsFt.map((x) => ft(x)))}.`);
    const negatives = beam.regions.filter((r) => r.sign === 'negative');
    parts.push(`Negative-moment regions, shaded: ${listOf(negatives.map((r) => `${ft(r.fromFt)} to ${ft(r.toFt)}`))}.`);
  }
  if (proposedJointFt !== undefined) {
    const inNegative = beam.regions.some((r) => r.sign === 'negative' && proposedJointFt > r.fromFt && proposedJointFt < r.toFt);
    parts.push(`Proposed joint at ${ft(proposedJointFt)}, ${inNegative ? 'inside a negative-moment region' : 'outside the negative-moment regions'}.`);
  }
  return parts.join(' ');
}

export function placementSequenceSummary(plan: DeckPlacementPlan): string {
  const steps = plan.segments.map(
    (s) => `${s.order}: ${ft(s.fromFt)} to ${ft(s.toFt)}, ${s.sign} moment, ${s.volumeCy.toFixed(1)} cy, ${s.durationHr.toFixed(1)} h`,
  );
  return (
    `Deck placement sequence in ${plan.segments.length} ${plan.segments.length === 1 ? 'placement' : 'placements'}. ` +
    `${steps.join('; ')}. Single placement instead: ${plan.singlePlacement.volumeCy.toFixed(1)} cy in ` +
    `${plan.singlePlacement.durationHr.toFixed(1)} h, initial set no sooner than ${plan.singlePlacement.minInitialSetHr.toFixed(1)} h.`
  );
}

export function openingTemperatureSummary(gap: InstallationGap): string {
  const first = gap.table[0];
  const last = gap.table[gap.table.length - 1];
  const parts = [
    first && last
      ? `Joint opening from ${inches(first.openingIn)} at ${degF(first.tempF)} to ${inches(last.openingIn)} at ${degF(last.tempF)}.`
      : '',
    `Set the opening to ${inches(gap.openingIn)} (${gap.openingMm.toFixed(1)} mm) at the installation temperature of ${degF(gap.installTempF)}.`,
    ...gap.warnings,
  ];
  return parts.filter((p) => p !== '').join(' ');
}
