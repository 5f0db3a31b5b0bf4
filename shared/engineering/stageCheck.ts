// Staged deck placement: once a segment has been placed it starts to stiffen, and every later
// segment of wet concrete bends the girder again. Where that later load puts negative moment
// (tension at the top) into concrete already placed, the young deck can crack. This check places
// the segments one at a time as patch loads, tracks the moment each placed segment receives from
// everything placed after it, and compares placement orders by the worst of those.
//
// Model: the girder alone carries the wet concrete (constant EI, continuous before the deck is
// placed); the deck's own stiffness and creep are ignored. That is the usual simple basis for
// comparing orders, not a stress check of the deck.
import { solveBeam, spanLoadsFor, momentAt } from './beamModel';
import type { MomentSign } from './momentRegions';
import { kipFtToKnM } from './units';

export type StageSegment = { fromFt: number; toFt: number; sign: MomentSign };

export type StageSegmentResult = {
  /** The segment's number along the girder, 1 = leftmost (its `segmentNumber`). */
  segment: number;
  /** Step at which this order places the segment (1 = first). */
  placedAtStep: number;
  /** Largest negative moment (as a positive figure) added within the segment by later placements. */
  addedNegativeMomentKipFt: number;
  addedNegativeMomentKnM: number;
  /** Where in the segment it occurs, and after which step. */
  atFt: number;
  worstAfterStep: number;
};

export type StageOrderResult = {
  name: string;
  /** Segment numbers along the girder (1 = leftmost), in the order placed. */
  order: number[];
  worstAddedNegativeMomentKipFt: number;
  totalAddedNegativeMomentKipFt: number;
  worstAddedNegativeMomentKnM: number;
  /** True when no order compared does better (ties count as least). */
  isLeast: boolean;
  /** Every positive-moment segment placed before any negative-moment one. */
  positiveFirst: boolean;
  perSegment: StageSegmentResult[];
};

export type StageCheck = {
  method: 'every_order' | 'heuristic';
  ordersCompared: number;
  /** The order the plan adopts: the least found among positive-first orders. */
  proposed: StageOrderResult;
  /** The least added negative moment of all orders compared, positive-first or not. */
  least: StageOrderResult;
  proposedIsLeast: boolean;
  /** Named orders a reviewer would think of (other than the proposed one), with their figures. */
  alternatives: StageOrderResult[];
  criterion: string;
};

/** Every ordering is tried up to this many segments (7! = 5040 orders); beyond it, heuristics. */
export const EXHAUSTIVE_SEGMENT_LIMIT = 7;
const SAMPLES_PER_SEGMENT = 24;
const LOCAL_SEARCH_BUDGET = 800;

type Influence = {
  xs: Float64Array[];
  /** m[k][j][s]: moment at sample s of segment k from wet concrete over segment j alone. */
  m: Float64Array[][];
  /** Scratch space for scoring, as long as the longest sample list. */
  buffer: Float64Array;
};

function sampleStations(seg: StageSegment, supportsFt: readonly number[]): Float64Array {
  const xs: number[] = [];
  for (let s = 0; s <= SAMPLES_PER_SEGMENT; s++) xs.push(seg.fromFt + ((seg.toFt - seg.fromFt) * s) / SAMPLES_PER_SEGMENT);
  // Peaks of negative moment from loads elsewhere sit on the supports; make sure they are sampled.
  for (const x of supportsFt) if (x > seg.fromFt && x < seg.toFt) xs.push(x);
  return Float64Array.from(xs.sort((a, b) => a - b));
}

function influence(spansFt: readonly number[], wKipPerFt: number, segments: readonly StageSegment[]): Influence {
  const supports = [0];
  for (const L of spansFt) supports.push(supports[supports.length - 1]! + L);
  const xs = segments.map((s) => sampleStations(s, supports));
  const models = segments.map((s) =>
    solveBeam(spansFt, spanLoadsFor(spansFt, 0, [{ fromFt: s.fromFt, toFt: s.toFt, kipPerFt: wKipPerFt }])),
  );
  const m = xs.map((samples) => models.map((model) => samples.map((x) => momentAt(model, x))));
  return { xs, m, buffer: new Float64Array(Math.max(...xs.map((x) => x.length))) };
}

type Score = { worst: number; total: number };

function score(inf: Influence, order: readonly number[], detail?: StageSegmentResult[]): Score {
  let worst = 0;
  let totalAdded = 0;
  const n = order.length;
  const buffer = inf.buffer;
  for (let s = 0; s < n; s++) {
    const k = order[s]!;
    const mk = inf.m[k]!;
    const acc = buffer.subarray(0, inf.xs[k]!.length).fill(0);
    let segWorst = 0;
    let at = 0;
    let after = 0;
    for (let t = s + 1; t < n; t++) {
      const add = mk[order[t]!]!;
      for (let i = 0; i < acc.length; i++) {
        acc[i]! += add[i]!;
        if (-acc[i]! > segWorst) {
          segWorst = -acc[i]!;
          at = i;
          after = t;
        }
      }
    }
    worst = Math.max(worst, segWorst);
    totalAdded += segWorst;
    detail?.push({
      segment: k + 1,
      placedAtStep: s + 1,
      addedNegativeMomentKipFt: segWorst,
      addedNegativeMomentKnM: kipFtToKnM(segWorst),
      atFt: segWorst > 0 ? inf.xs[k]![at]! : inf.xs[k]![0]!,
      worstAfterStep: segWorst > 0 ? after + 1 : s + 1,
    });
  }
  return { worst, total: totalAdded };
}

// Worst first, then the total; orders within a part in a million of each other are a tie, and
// the earlier candidate (the proposed order comes first) keeps the flag.
function better(a: Score, b: Score): boolean {
  if (!Number.isFinite(b.worst)) return Number.isFinite(a.worst);
  const tolW = 1e-6 * Math.max(a.worst, b.worst, 1e-30);
  if (a.worst < b.worst - tolW) return true;
  if (a.worst > b.worst + tolW) return false;
  const tolT = 1e-6 * Math.max(a.total, b.total, 1e-30);
  return a.total < b.total - tolT;
}

function* permutations(items: number[]): Generator<number[]> {
  // Heap's algorithm, iterative, so 5040 orders cost no recursion.
  const a = items.slice();
  const c = new Array<number>(a.length).fill(0);
  yield a.slice();
  let i = 1;
  while (i < a.length) {
    if (c[i]! < i) {
      const j = i % 2 === 0 ? 0 : c[i]!;
      [a[j], a[i]] = [a[i]!, a[j]!];
      yield a.slice();
      c[i] = c[i]! + 1;
      i = 1;
    } else {
      c[i] = 0;
      i++;
    }
  }
}

/** Each step places whichever remaining segment does the least harm to those already placed. */
function greedyOrder(inf: Influence, candidates: number[][]): number[] {
  const placed: number[] = [];
  const acc = new Map<number, Float64Array>();
  for (const group of candidates) {
    const left = new Set(group);
    while (left.size > 0) {
      let best = -1;
      let bestHarm = Infinity;
      for (const j of left) {
        let harm = 0;
        for (const k of placed) {
          const a = acc.get(k)!;
          const add = inf.m[k]![j]!;
          for (let i = 0; i < a.length; i++) harm = Math.max(harm, -(a[i]! + add[i]!));
        }
        if (harm < bestHarm - 1e-12) {
          bestHarm = harm;
          best = j;
        }
      }
      for (const k of placed) {
        const a = acc.get(k)!;
        const add = inf.m[k]![best]!;
        for (let i = 0; i < a.length; i++) a[i]! += add[i]!;
      }
      placed.push(best);
      acc.set(best, new Float64Array(inf.xs[best]!.length));
      left.delete(best);
    }
  }
  return placed;
}

function byPosition(segments: readonly StageSegment[], ids: number[], fromLeft = true): number[] {
  return ids.slice().sort((a, b) => (fromLeft ? 1 : -1) * (segments[a]!.fromFt - segments[b]!.fromFt));
}

function fromEndsInward(segments: readonly StageSegment[], ids: number[], lengthFt: number): number[] {
  const mid = (s: number) => (segments[s]!.fromFt + segments[s]!.toFt) / 2;
  return ids.slice().sort((a, b) => Math.abs(mid(b) - lengthFt / 2) - Math.abs(mid(a) - lengthFt / 2) || mid(a) - mid(b));
}

function namedOrders(segments: readonly StageSegment[], lengthFt: number): { name: string; order: number[] }[] {
  const all = segments.map((_, i) => i);
  const pos = all.filter((i) => segments[i]!.sign === 'positive');
  const neg = all.filter((i) => segments[i]!.sign === 'negative');
  const inward = (ids: number[]) => fromEndsInward(segments, ids, lengthFt);
  return [
    { name: 'Positive regions left to right, then negative regions left to right', order: [...byPosition(segments, pos), ...byPosition(segments, neg)] },
    { name: 'Positive regions right to left, then negative regions right to left', order: [...byPosition(segments, pos, false), ...byPosition(segments, neg, false)] },
    { name: 'Positive regions from the ends inward, then negative regions from the ends inward', order: [...inward(pos), ...inward(neg)] },
    { name: 'Positive regions from the middle outward, then negative regions from the middle outward', order: [...inward(pos).reverse(), ...inward(neg).reverse()] },
    { name: 'End to end, left to right (one continuous sweep)', order: byPosition(segments, all) },
  ];
}

/**
 * `segments` are listed along the girder, left to right; orders are given as their numbers in
 * that list (1 = leftmost). The proposed order is the least found among positive-first orders.
 */
export function stageCheck(spansFt: readonly number[], wKipPerFt: number, segments: readonly StageSegment[]): StageCheck {
  const n = segments.length;
  const lengthFt = spansFt.reduce((a, b) => a + b, 0);
  const inf = influence(spansFt, wKipPerFt, segments);
  const all = segments.map((_, i) => i);
  const positiveFirst = (order: readonly number[]) => {
    let seenNegative = false;
    for (const i of order) {
      if (segments[i]!.sign === 'negative') seenNegative = true;
      else if (seenNegative) return false;
    }
    return true;
  };

  // Two searches at once: the least order of any kind, and the least that keeps to the common
  // practice of positive regions first (which becomes the proposal), so a reviewer sees what
  // keeping to the practice costs. Earlier offers win ties, so the plain named orders come first.
  type Best = { order: number[]; score: Score };
  const none = (): Best => ({ order: all, score: { worst: Infinity, total: Infinity } });
  const best = none();
  const bestPositiveFirst = none();
  let compared = 0;
  const offer = (order: readonly number[]) => {
    const s = score(inf, order);
    compared++;
    let improved = false;
    if (better(s, best.score)) {
      best.score = s;
      best.order = order.slice();
      improved = true;
    }
    if (positiveFirst(order) && better(s, bestPositiveFirst.score)) {
      bestPositiveFirst.score = s;
      bestPositiveFirst.order = order.slice();
      improved = true;
    }
    return improved;
  };

  const named = namedOrders(segments, lengthFt).filter(
    ({ order }, i, list) => list.findIndex((o) => o.order.join(',') === order.join(',')) === i,
  );
  for (const { order } of named) offer(order);
  let method: StageCheck['method'];
  if (n <= EXHAUSTIVE_SEGMENT_LIMIT) {
    method = 'every_order';
    const seen = new Set(named.map(({ order }) => order.join(',')));
    for (const p of permutations(all)) if (!seen.has(p.join(','))) offer(p);
  } else {
    method = 'heuristic';
    const pos = all.filter((i) => segments[i]!.sign === 'positive');
    const neg = all.filter((i) => segments[i]!.sign === 'negative');
    offer(greedyOrder(inf, [pos, neg]));
    offer(greedyOrder(inf, [all]));
    // Swap pairs while it helps, within a fixed budget so twenty spans stay quick. Swaps inside
    // one sign group keep an order positive-first; swaps across groups serve the open search.
    const climb = (from: Best, sameSignOnly: boolean, budget: number) => {
      let improved = true;
      while (improved && budget > 0) {
        improved = false;
        for (let i = 0; i < n && budget > 0; i++) {
          for (let j = i + 1; j < n && budget > 0; j++) {
            const a = from.order[i]!;
            const b = from.order[j]!;
            if (sameSignOnly && segments[a]!.sign !== segments[b]!.sign) continue;
            const trial = from.order.slice();
            trial[i] = b;
            trial[j] = a;
            budget--;
            if (offer(trial)) improved = true;
          }
        }
      }
    };
    climb(bestPositiveFirst, true, LOCAL_SEARCH_BUDGET / 2);
    climb(best, false, LOCAL_SEARCH_BUDGET / 2);
  }

  const key = (order: readonly number[]) => order.join(',');
  const nameOf = (order: readonly number[], fallback: string) => named.find((o) => key(o.order) === key(order))?.name ?? fallback;
  const result = (name: string, order: readonly number[]): StageOrderResult => {
    const perSegment: StageSegmentResult[] = [];
    const s = score(inf, order, perSegment);
    return {
      name,
      order: order.map((i) => i + 1),
      worstAddedNegativeMomentKipFt: s.worst,
      totalAddedNegativeMomentKipFt: s.total,
      worstAddedNegativeMomentKnM: kipFtToKnM(s.worst),
      isLeast: !better(best.score, s),
      positiveFirst: positiveFirst(order),
      perSegment,
    };
  };
  const proposed = result(nameOf(bestPositiveFirst.order, 'Least found with positive regions first'), bestPositiveFirst.order);
  const least = { ...result(nameOf(best.order, 'Least found in any order'), best.order), isLeast: true };
  return {
    method,
    ordersCompared: compared,
    proposed,
    least,
    proposedIsLeast: proposed.isLeast,
    alternatives: named.filter(({ order }) => key(order) !== key(bestPositiveFirst.order)).map(({ name, order }) => result(name, order)),
    criterion:
      'Orders are ranked by the largest negative moment that later placements add to any segment already placed, then by the sum over segments; ' +
      'figures within one part in a million count as equal. The proposed order is the least found among orders that place every positive-moment segment before any negative-moment one (common practice).',
  };
}
