// The continuous-beam analysis against handbook beam diagrams. The handbook figures below are
// recalled from memory, not copied from the books; each is also a textbook result of the
// three-moment equation, which is how they were re-derived for these comments.
import { describe, expect, it } from 'vitest';
import { analyzeContinuousBeam } from '../../../shared/engineering';
import { expectRel } from './helpers';

describe('single simple span', () => {
  // from memory: AISC Steel Construction Manual Table 3-23, case 1 (simple beam, uniform load):
  // R = wl/2, Mmax = wl^2/8 at mid-span.
  it('gives wl/2 reactions and wl^2/8 at mid-span, with no negative region', () => {
    const w = 2.5;
    const l = 80;
    const r = analyzeContinuousBeam({ spansFt: [l], uniformLoadKipPerFt: w });
    expectRel(r.reactionsKip[0]!, (w * l) / 2);
    expectRel(r.reactionsKip[1]!, (w * l) / 2);
    expect(r.supportMomentsKipFt).toEqual([0, 0]);
    expectRel(r.maxPositive.momentKipFt, (w * l * l) / 8);
    expectRel(r.maxPositive.xFt, l / 2);
    expect(r.inflectionPointsFt).toEqual([]);
    expect(r.regions).toEqual([{ fromFt: 0, toFt: l, sign: 'positive' }]);
    expect(r.maxNegative.momentKipFt).toBe(0);
    const mid = r.stations.find((s) => Math.abs(s.xFt - l / 2) < 1e-9)!;
    expectRel(mid.momentKipFt, (w * l * l) / 8);
    expectRel(mid.shearKip, 0, 0, 1e-9);
  });

  // from memory: AISC Table 3-23, case 4 (simple beam, uniform load partially distributed):
  // R1 = wb(2c + b)/2l, with a the unloaded length at the left, b the loaded length, c the rest;
  // Mmax = R1 (a + R1/2w) at x = a + R1/w.
  it('matches the handbook partial-uniform-load case for a patch load', () => {
    const l = 100;
    const a = 20;
    const b = 30;
    const c = l - a - b;
    const w = 1.6;
    const r = analyzeContinuousBeam({ spansFt: [l], uniformLoadKipPerFt: 0, patchLoads: [{ fromFt: a, toFt: a + b, kipPerFt: w }] });
    const r1 = (w * b * (2 * c + b)) / (2 * l);
    expectRel(r.reactionsKip[0]!, r1);
    expectRel(r.reactionsKip[1]!, w * b - r1);
    expectRel(r.maxPositive.momentKipFt, r1 * (a + r1 / (2 * w)));
    expectRel(r.maxPositive.xFt, a + r1 / w);
    expect(r.regions.map((g) => g.sign)).toEqual(['positive']);
  });
});

describe('two equal spans, uniform load', () => {
  // from memory: AISC Table 3-23, case 29 (continuous beam, two equal spans, uniform load on both):
  // R1 = R3 = 3wl/8, R2 = 10wl/8, M over the centre support = -wl^2/8,
  // max positive 9wl^2/128 at 3l/8 from the end, inflection point l/4 from the interior support.
  const w = 1.2;
  const l = 110;
  const r = analyzeContinuousBeam({ spansFt: [l, l], uniformLoadKipPerFt: w, stationsPerSpan: 40 });

  it('has the handbook reactions', () => {
    expectRel(r.reactionsKip[0]!, (3 * w * l) / 8);
    expectRel(r.reactionsKip[1]!, (10 * w * l) / 8);
    expectRel(r.reactionsKip[2]!, (3 * w * l) / 8);
  });

  it('has -wl^2/8 over the centre support and zero at the ends', () => {
    expect(r.supportMomentsKipFt).toHaveLength(3);
    expect(r.supportMomentsKipFt[0]).toBe(0);
    expect(r.supportMomentsKipFt[2]).toBe(0);
    expectRel(r.supportMomentsKipFt[1]!, (-w * l * l) / 8);
    expectRel(r.maxNegative.momentKipFt, (-w * l * l) / 8);
    expectRel(r.maxNegative.xFt, l);
  });

  it('has the max positive 9wl^2/128 at 3l/8 from an end', () => {
    expectRel(r.maxPositive.momentKipFt, (9 * w * l * l) / 128);
    const fromEnd = Math.min(r.maxPositive.xFt, 2 * l - r.maxPositive.xFt);
    expectRel(fromEnd, (3 * l) / 8);
  });

  it('puts the inflection points l/4 each side of the centre support, found exactly', () => {
    expect(r.inflectionPointsFt).toHaveLength(2);
    expectRel(r.inflectionPointsFt[0]!, (3 * l) / 4, 1e-12);
    expectRel(r.inflectionPointsFt[1]!, (5 * l) / 4, 1e-12);
    expect(r.regions.map((g) => g.sign)).toEqual(['positive', 'negative', 'positive']);
  });

  it('gives shear that jumps by the reaction at the centre support', () => {
    const atSupport = r.stations.filter((s) => Math.abs(s.xFt - l) < 1e-9);
    expect(atSupport).toHaveLength(2);
    // from memory: case 29, V2 = 5wl/8 each side of the centre support.
    expectRel(atSupport[0]!.shearKip, (-5 * w * l) / 8);
    expectRel(atSupport[1]!.shearKip, (5 * w * l) / 8);
  });

  it('gives SI values beside the US ones', () => {
    expectRel(r.supportMomentsKnM[1]!, r.supportMomentsKipFt[1]! * 1.3558179483314004, 1e-12);
    expectRel(r.reactionsKn[1]!, r.reactionsKip[1]! * 4.4482216152605, 1e-12);
    expectRel(r.maxPositive.xM, r.maxPositive.xFt * 0.3048, 1e-12);
  });
});

describe('two equal spans, uniform load on one span only', () => {
  // from memory: AISC Table 3-23, case 30 (two equal spans, uniform load on one span):
  // R1 = 7wl/16, R2 = 5wl/8, R3 = -wl/16, M over the support = -wl^2/16,
  // max positive 49wl^2/512 at 7l/16.
  it('matches the handbook', () => {
    const w = 2;
    const l = 90;
    const r = analyzeContinuousBeam({ spansFt: [l, l], uniformLoadKipPerFt: [w, 0] });
    expectRel(r.reactionsKip[0]!, (7 * w * l) / 16);
    expectRel(r.reactionsKip[1]!, (5 * w * l) / 8);
    expectRel(r.reactionsKip[2]!, (-w * l) / 16);
    expectRel(r.supportMomentsKipFt[1]!, (-w * l * l) / 16);
    expectRel(r.maxPositive.momentKipFt, (49 * w * l * l) / 512);
    expectRel(r.maxPositive.xFt, (7 * l) / 16);
    // The unloaded span is straight-line negative from the support to the far end.
    expect(r.regions.map((g) => g.sign)).toEqual(['positive', 'negative']);
    expectRel(r.inflectionPointsFt[0]!, (7 * l) / 8);
  });
});

describe('three equal spans, uniform load', () => {
  // from memory: continuous-beam coefficient tables (three equal spans, uniform load on all):
  // R = 0.4wl, 1.1wl, 1.1wl, 0.4wl; support moments -0.1wl^2; end span max +0.08wl^2 at 0.4l;
  // centre span +0.025wl^2 at mid-span; inflection points 0.8l from the end support in the end
  // spans and (1 - sqrt(0.2))/2 l = 0.2764l from each support in the centre span.
  const w = 0.9;
  const l = 120;
  const r = analyzeContinuousBeam({ spansFt: [l, l, l], uniformLoadKipPerFt: w });

  it('has the tabulated reactions and support moments', () => {
    [0.4, 1.1, 1.1, 0.4].forEach((k, i) => expectRel(r.reactionsKip[i]!, k * w * l));
    expect(r.supportMomentsKipFt).toHaveLength(4);
    [0, -0.1, -0.1, 0].forEach((k, i) => expectRel(r.supportMomentsKipFt[i]!, k * w * l * l));
  });

  it('has the end-span and centre-span maxima', () => {
    expectRel(r.maxPositive.momentKipFt, 0.08 * w * l * l);
    expectRel(Math.min(r.maxPositive.xFt, 3 * l - r.maxPositive.xFt), 0.4 * l);
    const mid = r.stations.find((s) => Math.abs(s.xFt - 1.5 * l) < 1e-9)!;
    expectRel(mid.momentKipFt, 0.025 * w * l * l);
  });

  it('has the tabulated inflection points', () => {
    const c = (1 - Math.sqrt(0.2)) / 2;
    expectRel(c, 0.2764, 1e-4); // the table's rounded figure
    const expected = [0.8 * l, l + c * l, 2 * l - c * l, 2.2 * l];
    expect(r.inflectionPointsFt).toHaveLength(4);
    expected.forEach((x, i) => expectRel(r.inflectionPointsFt[i]!, x, 1e-12));
    expect(r.regions.map((g) => g.sign)).toEqual(['positive', 'negative', 'positive', 'negative', 'positive']);
  });
});

describe('unequal spans and patch loads', () => {
  // Three-moment equation by hand for two spans l1, l2 under w: M2 = -w (l1^3 + l2^3) / (8 (l1 + l2)).
  it('gives the three-moment support moment for two unequal spans', () => {
    const w = 1.4;
    const l1 = 80;
    const l2 = 130;
    const r = analyzeContinuousBeam({ spansFt: [l1, l2], uniformLoadKipPerFt: w });
    expectRel(r.supportMomentsKipFt[1]!, (-w * (l1 ** 3 + l2 ** 3)) / (8 * (l1 + l2)));
    expectRel(r.reactionsKip[0]!, (w * l1) / 2 + r.supportMomentsKipFt[1]! / l1);
  });

  // Three-moment equation by hand, two equal spans l, patch w over the far three quarters of
  // span 2 (local 0.25l to l): EI theta_left = w/(6l) [F(l) - F(l/4)], F(x) = l^2x^2 - lx^3 + x^4/4,
  // = 0.03369140625 w l^3, so M2 = -6 EI theta / 4l = -0.050537109375 w l^2.
  it('gives the hand value for a patch load on part of one span', () => {
    const w = 1.1;
    const l = 100;
    const r = analyzeContinuousBeam({ spansFt: [l, l], uniformLoadKipPerFt: 0, patchLoads: [{ fromFt: 1.25 * l, toFt: 2 * l, kipPerFt: w }] });
    expectRel(r.supportMomentsKipFt[1]!, -0.050537109375 * w * l * l);
  });

  it('treats a patch over a whole span like that span loaded', () => {
    const spans = [70, 95, 60, 110];
    const byPatch = analyzeContinuousBeam({ spansFt: spans, uniformLoadKipPerFt: 0, patchLoads: [{ fromFt: 70, toFt: 165, kipPerFt: 2 }] });
    const bySpan = analyzeContinuousBeam({ spansFt: spans, uniformLoadKipPerFt: [0, 2, 0, 0] });
    bySpan.supportMomentsKipFt.forEach((m, i) => expectRel(byPatch.supportMomentsKipFt[i]!, m, 1e-12));
    bySpan.reactionsKip.forEach((rk, i) => expectRel(byPatch.reactionsKip[i]!, rk, 1e-12, 1e-9));
  });

  it('finds an inflection point inside a patch-loaded stretch exactly', () => {
    // A patch that ends inside span 1 changes the parabola part-way; the root must still be exact.
    // The loading is symmetric about the centre support, so the two points mirror each other.
    const r = analyzeContinuousBeam({ spansFt: [100, 100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: 60, toFt: 140, kipPerFt: 3 }] });
    expect(r.inflectionPointsFt).toHaveLength(2);
    const [x1, x2] = r.inflectionPointsFt as [number, number];
    expect(x1).toBeGreaterThan(60);
    expectRel(x1 + x2, 200, 1e-12);
    // Moment in span 1 by statics from the end reaction: M(x) = R1 x - x^2/2 - 3 (x - 60)^2 / 2.
    const hand = r.reactionsKip[0]! * x1 - (x1 * x1) / 2 - (3 * (x1 - 60) ** 2) / 2;
    expect(Math.abs(hand)).toBeLessThan(1e-9 * Math.abs(r.supportMomentsKipFt[1]!));
  });
});
