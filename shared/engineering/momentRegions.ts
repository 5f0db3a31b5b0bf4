// Where the moment changes sign, and where it peaks, solved on each quadratic piece rather than
// read off stations: a joint 2 ft from an inflection point must not be judged by a grid that is
// 5 ft coarse.
import { type BeamModel, type MomentPiece, pieceMoment } from './beamModel';

export type MomentSign = 'positive' | 'negative';
export type MomentRegion = { fromFt: number; toFt: number; sign: MomentSign };
export type MomentPeak = { xFt: number; momentKipFt: number };

/** Roots of c0 + c1 t + c2 t^2 strictly inside (0, h), in the numerically stable form. */
export function rootsInside(p: MomentPiece): number[] {
  const h = p.toFt - p.fromFt;
  const { c0, c1, c2 } = p;
  const found: number[] = [];
  const scale = Math.abs(c0) + Math.abs(c1) * h + Math.abs(c2) * h * h;
  if (scale === 0) return found;
  if (Math.abs(c2) * h * h <= 1e-14 * scale) {
    if (c1 !== 0) found.push(-c0 / c1);
  } else {
    const disc = c1 * c1 - 4 * c2 * c0;
    // A double root touches zero without changing sign, so it bounds no region.
    if (disc <= 0) return [];
    const sq = Math.sqrt(disc);
    const qq = -0.5 * (c1 + (c1 >= 0 ? sq : -sq));
    found.push(qq / c2);
    if (qq !== 0) found.push(c0 / qq);
  }
  const inside: number[] = [];
  for (let t of found) {
    if (!(t > h * 1e-12 && t < h * (1 - 1e-12))) continue;
    // One Newton step takes off the last rounding of the closed form.
    const slope = c1 + 2 * c2 * t;
    if (slope !== 0) t -= (c0 + t * (c1 + t * c2)) / slope;
    if (t > 0 && t < h) inside.push(t);
  }
  return inside.sort((x, y) => x - y);
}

function allPieces(model: BeamModel): MomentPiece[] {
  const out: MomentPiece[] = [];
  for (const span of model.spanPieces) for (const p of span) out.push(p);
  return out;
}

/** The largest moment magnitude anywhere, used to tell a real sign from rounding noise. */
export function momentScale(model: BeamModel): number {
  let s = 0;
  for (const p of allPieces(model)) {
    s = Math.max(s, Math.abs(p.c0));
    const h = p.toFt - p.fromFt;
    s = Math.max(s, Math.abs(pieceMoment(p, p.toFt)));
    if (p.c2 !== 0) {
      const t = -p.c1 / (2 * p.c2);
      if (t > 0 && t < h) s = Math.max(s, Math.abs(pieceMoment(p, p.fromFt + t)));
    }
  }
  return s;
}

/**
 * Regions of one sign, alternating, covering the girder end to end. Zero moment (an unloaded
 * girder) counts as positive: the rule these regions serve is about tension at the top.
 */
export function momentRegions(model: BeamModel): MomentRegion[] {
  const lengthFt = model.supportsFt[model.supportsFt.length - 1]!;
  const tol = momentScale(model) * 1e-9;
  const raw: MomentRegion[] = [];
  const push = (fromFt: number, toFt: number, sign: MomentSign) => {
    const last = raw[raw.length - 1];
    if (last && last.sign === sign) last.toFt = toFt;
    else raw.push({ fromFt, toFt, sign });
  };
  for (const p of allPieces(model)) {
    const cuts = [0, ...rootsInside(p), p.toFt - p.fromFt];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const t0 = cuts[k]!;
      const t1 = cuts[k + 1]!;
      const m = pieceMoment(p, p.fromFt + (t0 + t1) / 2);
      push(p.fromFt + t0, k + 2 === cuts.length ? p.toFt : p.fromFt + t1, m < -tol ? 'negative' : 'positive');
    }
  }
  // Slivers left by rounding at a root that sits on a piece boundary are absorbed into their
  // neighbours, then neighbours of one sign are joined again.
  const minLength = lengthFt * 1e-9;
  let regions = raw;
  for (;;) {
    const k = regions.findIndex((r) => r.toFt - r.fromFt < minLength);
    if (k < 0 || regions.length === 1) break;
    const next: MomentRegion[] = [];
    regions.forEach((r, i) => {
      if (i === k) {
        const prev = next[next.length - 1];
        if (prev) prev.toFt = r.toFt;
        else if (regions[i + 1]) regions[i + 1]!.fromFt = r.fromFt;
        return;
      }
      const prev = next[next.length - 1];
      if (prev && prev.sign === r.sign) prev.toFt = r.toFt;
      else next.push({ ...r });
    });
    regions = next;
  }
  const first = regions[0];
  const last = regions[regions.length - 1];
  if (first) first.fromFt = 0;
  if (last) last.toFt = lengthFt;
  return regions;
}

export function inflectionPoints(regions: readonly MomentRegion[]): number[] {
  return regions.slice(0, -1).map((r) => r.toFt);
}

/** Peaks at piece ends and where the shear is zero. The first of equal peaks wins, so a
 *  symmetric girder reports its left-hand one. */
export function momentPeaks(model: BeamModel): { maxPositive: MomentPeak; maxNegative: MomentPeak } {
  const tol = momentScale(model) * 1e-12;
  let maxPositive: MomentPeak = { xFt: 0, momentKipFt: 0 };
  let maxNegative: MomentPeak = { xFt: 0, momentKipFt: 0 };
  const consider = (xFt: number, m: number) => {
    if (m > maxPositive.momentKipFt + tol) maxPositive = { xFt, momentKipFt: m };
    if (m < maxNegative.momentKipFt - tol) maxNegative = { xFt, momentKipFt: m };
  };
  model.spanPieces.forEach((pieces, i) => {
    consider(model.supportsFt[i]!, model.supportMomentsKipFt[i]!);
    for (const p of pieces) {
      consider(p.fromFt, p.c0);
      if (p.c2 !== 0) {
        const t = -p.c1 / (2 * p.c2);
        if (t > 0 && t < p.toFt - p.fromFt) consider(p.fromFt + t, pieceMoment(p, p.fromFt + t));
      }
    }
  });
  const n = model.spansFt.length;
  consider(model.supportsFt[n]!, model.supportMomentsKipFt[n]!);
  return { maxPositive, maxNegative };
}
