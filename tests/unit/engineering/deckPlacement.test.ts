// Deck placement plans. The placement rules (break at the inflection points of the full
// dead-load diagram, positive-moment segments first, negative last; emergency joints never in a
// negative-moment region) are common practice. The stage check is verified against a brute-force
// re-run written here from the public beam analysis plus statics.
import { describe, expect, it } from 'vitest';
import { analyzeContinuousBeam, planDeckPlacement, type PlacementSegment } from '../../../shared/engineering';
import { expectRel } from './helpers';

// Moment at x by statics from the reactions: the sum of the reactions to the left times their
// lever arms, less the patch loads to the left times theirs. Independent of the analysis' own
// moment routine.
function staticsMoment(spansFt: number[], patches: { fromFt: number; toFt: number; kipPerFt: number }[], x: number): number {
  const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: 0, patchLoads: patches, stationsPerSpan: 1 });
  let m = 0;
  r.supportsFt.forEach((s, j) => {
    if (s < x) m += r.reactionsKip[j]! * (x - s);
  });
  for (const p of patches) {
    const e = Math.min(p.toFt, x);
    if (e > p.fromFt) m -= p.kipPerFt * (e - p.fromFt) * (x - (p.fromFt + e) / 2);
  }
  return m;
}

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items];
  return items.flatMap((x, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [x, ...rest]));
}

/** Worst negative moment later placements add to any placed segment, for one order. */
function bruteWorst(spansFt: number[], w: number, byStation: PlacementSegment[], order: number[]): number {
  let supports = [0];
  for (const L of spansFt) supports = [...supports, supports[supports.length - 1]! + L];
  let worst = 0;
  order.forEach((k, s) => {
    const seg = byStation[k - 1]!;
    const points = [seg.fromFt, seg.toFt, (seg.fromFt + seg.toFt) / 2, ...supports.filter((x) => x > seg.fromFt && x < seg.toFt)];
    for (let t = s + 1; t < order.length; t++) {
      const later = order.slice(s + 1, t + 1).map((j) => ({ fromFt: byStation[j - 1]!.fromFt, toFt: byStation[j - 1]!.toFt, kipPerFt: w }));
      for (const x of points) worst = Math.max(worst, -staticsMoment(spansFt, later, x));
    }
  });
  return worst;
}

describe('planDeckPlacement, two equal spans', () => {
  const input = { spansFt: [100, 100], deckWidthFt: 40, slabThicknessIn: 8, haunchCyPerFt: 0.05, placementRateCyPerHr: 40 };
  const plan = planDeckPlacement(input);

  it('splits at the inflection points, 3l/4 and 5l/4 (AISC Table 3-23 case 29, from memory)', () => {
    const byStation = [...plan.segments].sort((a, b) => a.fromFt - b.fromFt);
    expect(byStation.map((s) => [s.sign])).toEqual([['positive'], ['negative'], ['positive']]);
    expectRel(byStation[0]!.toFt, 75, 1e-12);
    expectRel(byStation[2]!.fromFt, 125, 1e-12);
    expect(byStation.map((s) => s.segmentNumber)).toEqual([1, 2, 3]);
  });

  it('places positive-moment segments before negative ones (common practice)', () => {
    expect(plan.segments.map((s) => s.order)).toEqual([1, 2, 3]);
    expect(plan.segments.map((s) => s.sign)).toEqual(['positive', 'positive', 'negative']);
  });

  it('has volumes of length x width x thickness / 12 / 27 plus haunch, and durations of volume / rate', () => {
    // Hand: 200 ft x 40 ft x 8/12 ft / 27 = 197.531 cy, plus 0.05 cy/ft x 200 ft = 10 cy.
    const total = (200 * 40 * 8) / 12 / 27 + 0.05 * 200;
    expectRel(plan.singlePlacement.volumeCy, total, 1e-12);
    expectRel(plan.singlePlacement.durationHr, total / 40, 1e-12);
    expectRel(plan.segments.reduce((a, s) => a + s.volumeCy, 0), total, 1e-12);
    for (const s of plan.segments) {
      expectRel(s.volumeCy, (s.toFt - s.fromFt) * ((40 * 8) / 12 / 27 + 0.05), 1e-12);
      expectRel(s.durationHr, s.volumeCy / 40, 1e-12);
      expectRel(s.volumeM3, s.volumeCy * 0.764554857984, 1e-12);
    }
  });

  it('asks for an initial set of placement time plus margin, naming the ASTM tests', () => {
    expect(plan.singlePlacement.setTimeMarginHr).toBe(2);
    expectRel(plan.singlePlacement.minInitialSetHr, plan.singlePlacement.durationHr + 2, 1e-12);
    const own = planDeckPlacement({ ...input, setTimeMarginHr: 3.5 });
    expectRel(own.singlePlacement.minInitialSetHr, own.singlePlacement.durationHr + 3.5, 1e-12);
    expect(plan.retarderNote).toMatch(/ASTM C494 Type B/);
    expect(plan.retarderNote).toMatch(/Type D/);
    expect(plan.retarderNote).toMatch(/ASTM C403/);
    expect(plan.retarderNote).toMatch(/500 psi/);
  });

  it('uses the deck weight as the dead load (150 lb/ft³, from memory of AASHTO LRFD Table 3.5.1-1)', () => {
    expectRel(plan.deadLoadKipPerFt, ((40 * 8) / 12 + 0.05 * 27) * 0.15, 1e-12);
  });

  it('puts emergency joint zones only inside positive-moment regions (common practice)', () => {
    const beam = analyzeContinuousBeam({ spansFt: input.spansFt, uniformLoadKipPerFt: 1 });
    expect(plan.emergencyJointZones).toHaveLength(2);
    for (const z of plan.emergencyJointZones) {
      const holder = beam.regions.find((r) => r.fromFt <= z.fromFt + 1e-9 && r.toFt >= z.toFt - 1e-9);
      expect(holder?.sign).toBe('positive');
    }
    const clear = planDeckPlacement({ ...input, emergencyJointClearanceFt: 5 });
    expectRel(clear.emergencyJointZones[0]!.toFt, 70, 1e-12);
    expectRel(clear.emergencyJointZones[1]!.fromFt, 130, 1e-12);
    expect(clear.emergencyJointZones[0]!.fromFt).toBe(0);
  });

  it('takes the rate in feet of deck per hour too', () => {
    const byFt = planDeckPlacement({ spansFt: [100, 100], deckWidthFt: 40, slabThicknessIn: 8, placementRateFtPerHr: 25 });
    expectRel(byFt.singlePlacement.durationHr, 8, 1e-12);
    for (const s of byFt.segments) expectRel(s.durationHr, (s.toFt - s.fromFt) / 25, 1e-12);
  });
});

describe('stage check', () => {
  it.each([
    [[100, 100]],
    [[100, 100, 100]],
    [[80, 110, 80]],
    // A short end span beside a long one is negative end to end: one negative, one positive segment.
    [[60, 140]],
  ])('flags the least-moment order for spans %j, matching a brute-force re-run', (spansFt) => {
    const plan = planDeckPlacement({ spansFt, deckWidthFt: 36, slabThicknessIn: 8.5, placementRateCyPerHr: 60 });
    const sc = plan.stageCheck;
    const w = plan.deadLoadKipPerFt;
    const byStation = [...plan.segments].sort((a, b) => a.segmentNumber - b.segmentNumber);
    expect(sc.method).toBe('every_order');

    const orders = permutations(byStation.map((s) => s.segmentNumber));
    expect(sc.ordersCompared).toBe(orders.length);
    const positiveFirst = (o: number[]) => {
      const signs = o.map((k) => byStation[k - 1]!.sign);
      return signs.lastIndexOf('positive') < Math.max(0, signs.indexOf('negative')) || !signs.includes('negative');
    };
    const worst = orders.map((o) => ({ o, w: bruteWorst(spansFt, w, byStation, o) }));
    const least = Math.min(...worst.map((x) => x.w));
    const leastPositiveFirst = Math.min(...worst.filter((x) => positiveFirst(x.o)).map((x) => x.w));

    expectRel(sc.least.worstAddedNegativeMomentKipFt, least, 1e-6);
    expectRel(bruteWorst(spansFt, w, byStation, sc.least.order), least, 1e-6);
    expect(least).toBeLessThan(Math.max(...worst.map((x) => x.w)));
    expect(sc.least.isLeast).toBe(true);
    // The plan adopts the least positive-first order, and its segments are numbered in it.
    expectRel(sc.proposed.worstAddedNegativeMomentKipFt, leastPositiveFirst, 1e-6);
    expect(sc.proposed.positiveFirst).toBe(true);
    expect(plan.segments.map((s) => s.segmentNumber)).toEqual(sc.proposed.order);
    // Ranked by the worst figure, then by the sum over segments; equal within a part in a million.
    const tiesLeast = (r: typeof sc.least) =>
      Math.abs(r.worstAddedNegativeMomentKipFt - least) <= Math.max(1e-6 * least, 1e-9) &&
      r.totalAddedNegativeMomentKipFt <= sc.least.totalAddedNegativeMomentKipFt * (1 + 1e-6) + 1e-9;
    expect(sc.proposedIsLeast).toBe(tiesLeast(sc.proposed));
    for (const alt of sc.alternatives) {
      expectRel(alt.worstAddedNegativeMomentKipFt, bruteWorst(spansFt, w, byStation, alt.order), 1e-6);
      expect(alt.worstAddedNegativeMomentKipFt).toBeGreaterThanOrEqual(sc.least.worstAddedNegativeMomentKipFt * (1 - 1e-6));
      expect(alt.isLeast).toBe(tiesLeast(alt));
    }
    // Every placed segment gets a figure; the last one placed sees nothing later.
    expect(sc.proposed.perSegment).toHaveLength(byStation.length);
    expect(sc.proposed.perSegment[sc.proposed.perSegment.length - 1]!.addedNegativeMomentKipFt).toBe(0);
  });

  it('on three equal spans places the end spans before the centre span', () => {
    // A known outcome of the rule: wet concrete in the centre span lifts the end spans' moment
    // negative, so the centre span goes after them. Segments along the girder: 1 end span,
    // 2 pier, 3 centre, 4 pier, 5 end span.
    const plan = planDeckPlacement({ spansFt: [100, 100, 100], deckWidthFt: 36, slabThicknessIn: 8.5, placementRateCyPerHr: 60 });
    const positives = plan.segments.filter((s) => s.sign === 'positive').map((s) => s.segmentNumber);
    expect(positives[2]).toBe(3);
  });

  it('uses heuristics for many spans, still positive-first and never worse than the named orders', () => {
    const plan = planDeckPlacement({ spansFt: Array<number>(12).fill(120), deckWidthFt: 40, slabThicknessIn: 8, placementRateFtPerHr: 30 });
    const sc = plan.stageCheck;
    expect(sc.method).toBe('heuristic');
    expect(plan.segments).toHaveLength(23);
    expect(sc.proposed.positiveFirst).toBe(true);
    for (const alt of sc.alternatives) {
      expect(alt.worstAddedNegativeMomentKipFt).toBeGreaterThanOrEqual(sc.least.worstAddedNegativeMomentKipFt * (1 - 1e-6));
      if (alt.positiveFirst) expect(alt.worstAddedNegativeMomentKipFt).toBeGreaterThanOrEqual(sc.proposed.worstAddedNegativeMomentKipFt * (1 - 1e-6));
    }
    const signs = plan.segments.map((s) => s.sign);
    expect(signs.lastIndexOf('positive')).toBeLessThan(signs.indexOf('negative'));
  });

  it('a single span is one placement with nothing added', () => {
    const plan = planDeckPlacement({ spansFt: [90], deckWidthFt: 30, slabThicknessIn: 8, placementRateCyPerHr: 50 });
    expect(plan.segments).toHaveLength(1);
    expect(plan.stageCheck.proposed.worstAddedNegativeMomentKipFt).toBe(0);
    expect(plan.emergencyJointZones).toEqual([{ fromFt: 0, toFt: 90, fromM: 0, toM: 90 * 0.3048 }]);
  });
});
