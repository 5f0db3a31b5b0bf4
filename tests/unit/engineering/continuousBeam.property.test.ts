// Properties any correct continuous-beam analysis has, on random girders: statics (reactions
// balance the load), boundary conditions (zero moment at the end supports), mirror symmetry,
// convergence of the station table, zero moment at the inflection points, and regions that
// alternate in sign and cover the girder. The moment checks rebuild M(x) by hand from the support
// moments: M = simple-span parabola w x (L - x) / 2 plus the straight line between the end moments.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyzeContinuousBeam, type ContinuousBeamResult } from '../../../shared/engineering';

const spanFt = fc.double({ min: 10, max: 250, noNaN: true });
const loadKipPerFt = fc.double({ min: 0.1, max: 10, noNaN: true });
const girder = fc
  .integer({ min: 1, max: 20 })
  .chain((n) => fc.record({ spansFt: fc.array(spanFt, { minLength: n, maxLength: n }), loads: fc.array(loadKipPerFt, { minLength: n, maxLength: n }) }));

function handMoment(r: ContinuousBeamResult, spansFt: number[], loads: number[], xFt: number): number {
  let start = 0;
  for (let i = 0; i < spansFt.length; i++) {
    const L = spansFt[i]!;
    if (xFt <= start + L || i === spansFt.length - 1) {
      const x = xFt - start;
      const mL = r.supportMomentsKipFt[i]!;
      const mR = r.supportMomentsKipFt[i + 1]!;
      return (loads[i]! * x * (L - x)) / 2 + mL + ((mR - mL) * x) / L;
    }
    start += L;
  }
  return 0;
}

const runs = { numRuns: 200 };

describe('continuous beam on random girders', () => {
  it('reactions sum to the total load', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads });
        const load = spansFt.reduce((s, L, i) => s + L * loads[i]!, 0);
        const sum = r.reactionsKip.reduce((s, x) => s + x, 0);
        expect(r.reactionsKip).toHaveLength(spansFt.length + 1);
        expect(Math.abs(sum - load)).toBeLessThanOrEqual(1e-9 * load);
        expect(Math.abs(r.totalLoadKip - load)).toBeLessThanOrEqual(1e-9 * load);
      }),
      runs,
    );
  });

  it('moments are zero at the end supports and support moments match the stations', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, stationsPerSpan: 7 });
        expect(r.supportMomentsKipFt).toHaveLength(spansFt.length + 1);
        expect(r.supportMomentsKipFt[0]).toBe(0);
        expect(r.supportMomentsKipFt[spansFt.length]).toBe(0);
        expect(r.stations[0]!.momentKipFt).toBe(0);
        expect(r.stations[r.stations.length - 1]!.momentKipFt).toBe(0);
      }),
      runs,
    );
  });

  it('station moments agree with the moment rebuilt by hand from the support moments', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, stationsPerSpan: 5 });
        const scale = Math.max(Math.abs(r.maxPositive.momentKipFt), Math.abs(r.maxNegative.momentKipFt));
        for (const s of r.stations) {
          expect(Math.abs(s.momentKipFt - handMoment(r, spansFt, loads, s.xFt))).toBeLessThanOrEqual(1e-9 * scale);
        }
      }),
      runs,
    );
  });

  it('symmetric girders give symmetric results', () => {
    fc.assert(
      fc.property(girder, fc.boolean(), ({ spansFt, loads }, odd) => {
        // Mirror the girder about its centre, with or without a middle span.
        const half = spansFt.slice(0, 10);
        const halfLoads = loads.slice(0, 10);
        const s = odd ? [...half, ...half.slice(0, -1).reverse()] : [...half, ...half.slice().reverse()];
        const w = odd ? [...halfLoads, ...halfLoads.slice(0, -1).reverse()] : [...halfLoads, ...halfLoads.slice().reverse()];
        if (s.length > 20 || s.length === 0) return;
        const r = analyzeContinuousBeam({ spansFt: s, uniformLoadKipPerFt: w });
        const n = s.length;
        const length = s.reduce((a, b) => a + b, 0);
        const scaleR = Math.max(...r.reactionsKip.map(Math.abs));
        const scaleM = Math.max(1e-12, ...r.supportMomentsKipFt.map(Math.abs));
        for (let i = 0; i <= n; i++) {
          expect(Math.abs(r.reactionsKip[i]! - r.reactionsKip[n - i]!)).toBeLessThanOrEqual(1e-9 * scaleR);
          expect(Math.abs(r.supportMomentsKipFt[i]! - r.supportMomentsKipFt[n - i]!)).toBeLessThanOrEqual(1e-9 * scaleM);
        }
        const ip = r.inflectionPointsFt;
        for (let i = 0; i < ip.length; i++) {
          expect(Math.abs(ip[i]! + ip[ip.length - 1 - i]! - length)).toBeLessThanOrEqual(1e-7 * length);
        }
        expect(r.regions.map((g) => g.sign)).toEqual(r.regions.map((g) => g.sign).reverse());
      }),
      runs,
    );
  });

  it('the station table converges on the exact maximum as stations increase', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const exact = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads }).maxPositive.momentKipFt;
        const errorAt = (n: number) => {
          const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, stationsPerSpan: n });
          return exact - Math.max(...r.stations.map((s) => s.momentKipFt));
        };
        const coarse = errorAt(4);
        const fine = errorAt(200);
        expect(fine).toBeGreaterThanOrEqual(-1e-9 * exact);
        expect(fine).toBeLessThanOrEqual(coarse + 1e-9 * exact);
        // A station lies within half a division of the peak, and the moment there is a parabola of
        // curvature w, so the gap is at most w (L/n)^2 / 8 on the worst span.
        const bound = Math.max(...spansFt.map((L, i) => (loads[i]! * (L / 200) ** 2) / 8));
        expect(fine).toBeLessThanOrEqual(bound * (1 + 1e-9) + 1e-9 * exact);
      }),
      { numRuns: 100 },
    );
  });

  it('the moment at every inflection point is zero', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, stationsPerSpan: 1 });
        const scale = Math.max(Math.abs(r.maxPositive.momentKipFt), Math.abs(r.maxNegative.momentKipFt));
        for (const x of r.inflectionPointsFt) {
          expect(Math.abs(handMoment(r, spansFt, loads, x))).toBeLessThanOrEqual(1e-8 * scale);
        }
      }),
      runs,
    );
  });

  it('regions alternate in sign, cover the girder exactly and agree with the moment', () => {
    fc.assert(
      fc.property(girder, ({ spansFt, loads }) => {
        const r = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, stationsPerSpan: 1 });
        const length = spansFt.reduce((a, b) => a + b, 0);
        const noise = 1e-9 * Math.max(Math.abs(r.maxPositive.momentKipFt), Math.abs(r.maxNegative.momentKipFt));
        expect(r.regions[0]!.fromFt).toBe(0);
        expect(r.regions[r.regions.length - 1]!.toFt).toBe(length);
        for (let i = 0; i < r.regions.length; i++) {
          const g = r.regions[i]!;
          expect(g.toFt).toBeGreaterThan(g.fromFt);
          if (i > 0) {
            expect(g.fromFt).toBe(r.regions[i - 1]!.toFt);
            expect(g.sign).not.toBe(r.regions[i - 1]!.sign);
          }
          for (const f of [0.25, 0.5, 0.75]) {
            const m = handMoment(r, spansFt, loads, g.fromFt + f * (g.toFt - g.fromFt));
            expect(g.sign === 'negative' ? m < 0 : m >= -noise).toBe(true);
          }
        }
        expect(r.inflectionPointsFt).toEqual(r.regions.slice(0, -1).map((g) => g.toFt));
        if (spansFt.length === 1) expect(r.regions.map((g) => g.sign)).toEqual(['positive']);
      }),
      runs,
    );
  });

  // Pattern loads and very unequal spans can lift an interior support moment above zero, so
  // "one negative region per interior support" holds only for equal spans under one load
  // (from memory: continuous-beam coefficient tables, all support coefficients negative and all
  // span coefficients positive for equal spans, uniform load on every span).
  it('equal spans under one uniform load have a negative region over each interior support', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20 }), spanFt, loadKipPerFt, (n, L, w) => {
        const r = analyzeContinuousBeam({ spansFt: Array<number>(n).fill(L), uniformLoadKipPerFt: w, stationsPerSpan: 1 });
        const negatives = r.regions.filter((g) => g.sign === 'negative');
        expect(negatives).toHaveLength(n - 1);
        negatives.forEach((g, i) => {
          expect(g.fromFt).toBeLessThan((i + 1) * L);
          expect(g.toFt).toBeGreaterThan((i + 1) * L);
        });
        for (const m of r.supportMomentsKipFt.slice(1, -1)) expect(m).toBeLessThan(0);
      }),
      runs,
    );
  });

  it('is linear: results for two load cases add up', () => {
    fc.assert(
      fc.property(
        girder,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        loadKipPerFt,
        ({ spansFt, loads }, f1, f2, q) => {
          const length = spansFt.reduce((a, b) => a + b, 0);
          const a = Math.min(f1, f2) * length;
          const b = Math.max(f1, f2) * length;
          if (!(b - a > 1e-6 * length)) return;
          const patch = [{ fromFt: a, toFt: b, kipPerFt: q }];
          const both = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads, patchLoads: patch });
          const u = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: loads });
          const p = analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt: 0, patchLoads: patch });
          const scale = Math.max(...both.reactionsKip.map(Math.abs), ...u.reactionsKip.map(Math.abs));
          both.reactionsKip.forEach((x, i) => expect(Math.abs(x - u.reactionsKip[i]! - p.reactionsKip[i]!)).toBeLessThanOrEqual(1e-9 * scale));
          const mScale = Math.max(...both.supportMomentsKipFt.map(Math.abs), 1e-9);
          both.supportMomentsKipFt.forEach((x, i) =>
            expect(Math.abs(x - u.supportMomentsKipFt[i]! - p.supportMomentsKipFt[i]!)).toBeLessThanOrEqual(1e-9 * mScale),
          );
        },
      ),
      runs,
    );
  });
});
