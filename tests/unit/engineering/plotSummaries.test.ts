// The words each plot is read out as: they must carry the same figures the plot draws.
import { describe, expect, it } from 'vitest';
import { analyzeContinuousBeam, installationGap, planDeckPlacement } from '../../../shared/engineering';
import { momentDiagramSummary, openingTemperatureSummary, placementSequenceSummary } from '../../../features/engineering/summaries';

describe('plot summaries', () => {
  it('names the peaks, inflection points, negative regions and the joint', () => {
    // from memory: AISC Table 3-23 case 29 with w = 1 kip/ft, l = 100 ft: +703 at 37.5 ft, -1250 at 100 ft.
    const beam = analyzeContinuousBeam({ spansFt: [100, 100], uniformLoadKipPerFt: 1 });
    const text = momentDiagramSummary(beam, 110);
    expect(text).toMatch(/2-span girder, 200\.0 ft long/);
    expect(text).toMatch(/Largest positive moment 703 kip-ft at 37\.5 ft/);
    expect(text).toMatch(/Largest negative moment -1250 kip-ft at 100\.0 ft/);
    expect(text).toMatch(/Inflection points at 75\.0 ft and 125\.0 ft/);
    expect(text).toMatch(/Proposed joint at 110\.0 ft, inside a negative-moment region/);
    expect(momentDiagramSummary(analyzeContinuousBeam({ spansFt: [80], uniformLoadKipPerFt: 1 }))).toMatch(/No negative moment/);
  });

  it('lists the placements in order', () => {
    const plan = planDeckPlacement({ spansFt: [100, 100], deckWidthFt: 40, slabThicknessIn: 8, placementRateCyPerHr: 40 });
    const text = placementSequenceSummary(plan);
    expect(text).toMatch(/in 3 placements/);
    expect(text).toMatch(/1: 0\.0 ft to 75\.0 ft, positive moment/);
    expect(text).toMatch(/3: 75\.0 ft to 125\.0 ft, negative moment/);
  });

  it('states the opening to set and any closing', () => {
    // Hand: 1.5 - 6.0e-6 x 3600 x 20 = 1.068 in at 80 °F.
    const gap = installationGap({ gapAtReferenceIn: 1.5, installTempF: 80, contributingLengthFt: 300, material: 'concrete' });
    expect(openingTemperatureSummary(gap)).toMatch(/Set the opening to 1\.07 in \(27\.1 mm\) at the installation temperature of 80 °F/);
  });
});
