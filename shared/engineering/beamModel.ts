// The continuous girder as the analysis sees it: prismatic (constant EI), on knife-edge supports
// that do not settle, simply supported at both ends, loaded downward by stretches of uniform load.
// Support moments come from the three-moment equation; between supports each span is a simple
// span plus the straight line joining its end moments. Under stretches of uniform load that makes
// the moment an exact quadratic between load boundaries, which is what lets the regions and
// inflection points be solved for instead of sampled.
import { solveTridiagonal } from './tridiagonal';

/** A stretch of uniform load on one span, in that span's own coordinate (0 at its left support). */
export type SpanLoad = { a: number; b: number; q: number };

/**
 * One stretch of girder over which the load intensity is constant:
 * M(t) = c0 + c1 t + c2 t^2 and V(t) = c1 + 2 c2 t, with t = x - fromFt (x along the girder).
 */
export type MomentPiece = { fromFt: number; toFt: number; c0: number; c1: number; c2: number };

export type BeamModel = {
  spansFt: readonly number[];
  /** Station of each support, 0 at the left end support. */
  supportsFt: number[];
  supportMomentsKipFt: number[];
  reactionsKip: number[];
  /** Pieces of each span in order; every span has at least one. */
  spanPieces: MomentPiece[][];
  totalLoadKip: number;
};

export type PatchLoadFt = { fromFt: number; toFt: number; kipPerFt: number };

/** Cuts the per-span loads and any patch loads into per-span stretches. */
export function spanLoadsFor(
  spansFt: readonly number[],
  uniformLoadKipPerFt: number | readonly number[],
  patchLoads: readonly PatchLoadFt[] = [],
): SpanLoad[][] {
  const out: SpanLoad[][] = [];
  let start = 0;
  for (let i = 0; i < spansFt.length; i++) {
    const L = spansFt[i]!;
    const loads: SpanLoad[] = [];
    const w = typeof uniformLoadKipPerFt === 'number' ? uniformLoadKipPerFt : (uniformLoadKipPerFt[i] ?? 0);
    if (w > 0) loads.push({ a: 0, b: L, q: w });
    for (const p of patchLoads) {
      if (p.kipPerFt <= 0) continue;
      const a = Math.max(p.fromFt - start, 0);
      const b = Math.min(p.toFt - start, L);
      if (b > a) loads.push({ a, b, q: p.kipPerFt });
    }
    out.push(loads);
    start += L;
  }
  return out;
}

// Simple-span end rotations times EI for a uniform stretch a..b, from integrating the point-load
// expressions P a b (L + b) / 6L (left end) and P a b (L + a) / 6L (right end) over the stretch.
function rotationLeftTimesEI(L: number, { a, b, q }: SpanLoad): number {
  const F = (x: number) => L * L * x * x - L * x * x * x + (x * x * x * x) / 4;
  return (q * (F(b) - F(a))) / (6 * L);
}

function rotationRightTimesEI(L: number, { a, b, q }: SpanLoad): number {
  const F = (x: number) => (L * L * x * x) / 2 - (x * x * x * x) / 4;
  return (q * (F(b) - F(a))) / (6 * L);
}

function simpleLeftReaction(L: number, loads: readonly SpanLoad[]): number {
  let r = 0;
  for (const { a, b, q } of loads) r += (q * (b - a) * (L - (a + b) / 2)) / L;
  return r;
}

function simpleMoment(x: number, ra: number, loads: readonly SpanLoad[]): number {
  let m = ra * x;
  for (const { a, b, q } of loads) {
    if (x <= a) continue;
    const e = Math.min(x, b);
    m -= q * (e - a) * (x - (a + e) / 2);
  }
  return m;
}

function simpleShear(x: number, ra: number, loads: readonly SpanLoad[]): number {
  let v = ra;
  for (const { a, b, q } of loads) if (x > a) v -= q * (Math.min(x, b) - a);
  return v;
}

export function solveBeam(spansFt: readonly number[], spanLoads: readonly SpanLoad[][]): BeamModel {
  const n = spansFt.length;
  const supportsFt = [0];
  for (const L of spansFt) supportsFt.push(supportsFt[supportsFt.length - 1]! + L);

  // Three-moment equation at interior support i (spans i-1 and i meet there):
  // L(i-1) M(i-1) + 2 (L(i-1) + L(i)) M(i) + L(i) M(i+1) = -6 EI (thetaRight(i-1) + thetaLeft(i)).
  const a: number[] = [];
  const b: number[] = [];
  const c: number[] = [];
  const d: number[] = [];
  for (let i = 1; i < n; i++) {
    const Ll = spansFt[i - 1]!;
    const Lr = spansFt[i]!;
    let rhs = 0;
    for (const load of spanLoads[i - 1] ?? []) rhs += rotationRightTimesEI(Ll, load);
    for (const load of spanLoads[i] ?? []) rhs += rotationLeftTimesEI(Lr, load);
    a.push(Ll);
    b.push(2 * (Ll + Lr));
    c.push(Lr);
    d.push(-6 * rhs);
  }
  const interior = solveTridiagonal(a, b, c, d);
  const supportMomentsKipFt = [0, ...interior, 0];

  const spanPieces: MomentPiece[][] = [];
  const shearStart: number[] = [];
  const shearEnd: number[] = [];
  let totalLoadKip = 0;
  for (let i = 0; i < n; i++) {
    const L = spansFt[i]!;
    const start = supportsFt[i]!;
    const loads = spanLoads[i] ?? [];
    const mL = supportMomentsKipFt[i]!;
    const mR = supportMomentsKipFt[i + 1]!;
    const ra = simpleLeftReaction(L, loads);
    const chord = (mR - mL) / L;
    for (const { a: la, b: lb, q } of loads) totalLoadKip += q * (lb - la);

    const cuts = [0, L];
    for (const { a: la, b: lb } of loads) cuts.push(la, lb);
    cuts.sort((p, r) => p - r);
    const pieces: MomentPiece[] = [];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const x0 = cuts[k]!;
      const x1 = cuts[k + 1]!;
      if (!(x1 - x0 > L * 1e-12)) continue;
      let q = 0;
      const mid = (x0 + x1) / 2;
      for (const load of loads) if (load.a <= mid && load.b >= mid) q += load.q;
      pieces.push({
        fromFt: start + x0,
        toFt: start + x1,
        // At the left support M is exactly the support moment; elsewhere the simple-span moment
        // plus the chord between the end moments.
        c0: x0 === 0 ? mL : simpleMoment(x0, ra, loads) + mL + chord * x0,
        c1: simpleShear(x0, ra, loads) + chord,
        c2: -q / 2,
      });
    }
    // Keep the last piece ending exactly on the support, whatever rounding the cuts picked up.
    const last = pieces[pieces.length - 1];
    if (last) last.toFt = start + L;
    const first = pieces[0]!;
    shearStart.push(first.c1);
    shearEnd.push(last ? last.c1 + 2 * last.c2 * (last.toFt - last.fromFt) : first.c1);
    spanPieces.push(pieces);
  }

  const reactionsKip: number[] = [];
  for (let j = 0; j <= n; j++) {
    const right = j < n ? shearStart[j]! : 0;
    const left = j > 0 ? shearEnd[j - 1]! : 0;
    reactionsKip.push(right - left);
  }

  return { spansFt, supportsFt, supportMomentsKipFt, reactionsKip, spanPieces, totalLoadKip };
}

export function pieceMoment(p: MomentPiece, xFt: number): number {
  const t = xFt - p.fromFt;
  return p.c0 + t * (p.c1 + t * p.c2);
}

export function pieceShear(p: MomentPiece, xFt: number): number {
  return p.c1 + 2 * p.c2 * (xFt - p.fromFt);
}

/** Index of the span holding xFt; a point on an interior support belongs to the span on its right. */
export function spanIndexAt(model: BeamModel, xFt: number): number {
  const s = model.supportsFt;
  let lo = 0;
  let hi = model.spansFt.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (s[mid]! <= xFt) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

export function momentAt(model: BeamModel, xFt: number): number {
  const i = spanIndexAt(model, xFt);
  const pieces = model.spanPieces[i]!;
  if (xFt >= model.supportsFt[i + 1]!) return model.supportMomentsKipFt[i + 1]!;
  if (xFt <= model.supportsFt[i]!) return model.supportMomentsKipFt[i]!;
  for (const p of pieces) if (xFt <= p.toFt) return pieceMoment(p, xFt);
  return model.supportMomentsKipFt[i + 1]!;
}
