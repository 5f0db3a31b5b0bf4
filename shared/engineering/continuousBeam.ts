// Moments, shears and reactions of a continuous girder under deck and construction loads, with the
// positive and negative moment regions that placement sequences and joint locations are judged by.
// Sign convention: sagging moment positive, so moments over interior supports come out negative;
// shear positive when the part left of the section is pushed up.
import { z } from 'zod';
import { parseInput } from './errors';
import { solveBeam, spanLoadsFor, pieceMoment, pieceShear, type BeamModel } from './beamModel';
import {
  momentRegions,
  inflectionPoints,
  momentPeaks,
  type MomentRegion,
  type MomentPeak,
  type MomentSign,
} from './momentRegions';
import { ftToM, kipToKn, kipFtToKnM } from './units';
import {
  finiteNumber,
  nonNegativeNumber,
  objectInput,
  spansFtSchema,
  total,
  uniformLoadSchema,
} from './validation';
import { engineeringVersion } from './meta';

export type { MomentSign, MomentRegion, MomentPeak } from './momentRegions';

export const DEFAULT_STATIONS_PER_SPAN = 20;
export const MAX_STATIONS_PER_SPAN = 1000;
export const MAX_PATCH_LOADS = 200;

export const patchLoadSchema = z.strictObject(
  {
    fromFt: nonNegativeNumber('fromFt (start of the patch load)', 'ft'),
    toFt: finiteNumber('toFt (end of the patch load)'),
    kipPerFt: nonNegativeNumber('kipPerFt (patch load intensity)', 'kip/ft'),
  },
  objectInput('patch load'),
);

export const continuousBeamInputSchema = z
  .strictObject(
    {
      spansFt: spansFtSchema,
      uniformLoadKipPerFt: uniformLoadSchema,
      patchLoads: z.array(patchLoadSchema).max(MAX_PATCH_LOADS, { error: `Give at most ${MAX_PATCH_LOADS} patch loads.` }).optional(),
      stationsPerSpan: finiteNumber('stationsPerSpan')
        .int({ error: 'stationsPerSpan must be a whole number.' })
        .min(1, { error: 'stationsPerSpan must be at least 1.' })
        .max(MAX_STATIONS_PER_SPAN, { error: `stationsPerSpan must be at most ${MAX_STATIONS_PER_SPAN}.` })
        .optional(),
    },
    objectInput('continuous beam'),
  )
  .superRefine((input, ctx) => {
    const lengthFt = total(input.spansFt);
    if (Array.isArray(input.uniformLoadKipPerFt) && input.uniformLoadKipPerFt.length !== input.spansFt.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['uniformLoadKipPerFt'],
        message: `give one load per span: ${input.spansFt.length} spans but ${input.uniformLoadKipPerFt.length} loads.`,
      });
    }
    (input.patchLoads ?? []).forEach((p, i) => {
      if (!(p.fromFt < p.toFt)) {
        ctx.addIssue({
          code: 'custom',
          path: ['patchLoads', i, 'toFt'],
          message: `a patch load must start before it ends: fromFt ${p.fromFt} ft is not less than toFt ${p.toFt} ft.`,
        });
      } else if (p.toFt > lengthFt * (1 + 1e-12)) {
        ctx.addIssue({
          code: 'custom',
          path: ['patchLoads', i, 'toFt'],
          message: `the patch load runs off the girder: toFt ${p.toFt} ft is beyond the far end at ${lengthFt} ft.`,
        });
      }
    });
  });

export type PatchLoad = { fromFt: number; toFt: number; kipPerFt: number };

export type ContinuousBeamInput = {
  spansFt: number[];
  /** One load for every span, or one per span (kip/ft, downward). */
  uniformLoadKipPerFt: number | number[];
  /** Extra load over any stretch, measured from the left end support; may cross supports. */
  patchLoads?: PatchLoad[];
  /** Equal divisions of each span for the station table (default 20). */
  stationsPerSpan?: number;
};

export type BeamStation = {
  xFt: number;
  shearKip: number;
  momentKipFt: number;
  /** Which span (0-based) the station belongs to. Both ends of every span are listed, so an
   *  interior support appears twice: with the shear just left of it and just right of it. */
  spanIndex: number;
  xM: number;
  shearKn: number;
  momentKnM: number;
};

export type MomentPeakSI = MomentPeak & { xM: number; momentKnM: number };

export type ContinuousBeamResult = {
  reactionsKip: number[];
  supportMomentsKipFt: number[];
  stations: BeamStation[];
  inflectionPointsFt: number[];
  regions: MomentRegion[];
  maxPositive: MomentPeakSI;
  /** The most negative moment; on a single span (no negative moment) it is 0 at the left support. */
  maxNegative: MomentPeakSI;
  supportsFt: number[];
  totalLengthFt: number;
  totalLoadKip: number;
  reactionsKn: number[];
  supportMomentsKnM: number[];
  inflectionPointsM: number[];
  engineeringVersion: string;
};

function withSI(p: MomentPeak): MomentPeakSI {
  return { ...p, xM: ftToM(p.xFt), momentKnM: kipFtToKnM(p.momentKipFt) };
}

function stationsOf(model: BeamModel, perSpan: number): BeamStation[] {
  const out: BeamStation[] = [];
  model.spansFt.forEach((L, i) => {
    const start = model.supportsFt[i]!;
    const pieces = model.spanPieces[i]!;
    let k = 0;
    for (let s = 0; s <= perSpan; s++) {
      const xFt = s === perSpan ? start + L : start + (L * s) / perSpan;
      while (k < pieces.length - 1 && xFt > pieces[k]!.toFt) k++;
      const p = pieces[k]!;
      const shearKip = pieceShear(p, xFt);
      const momentKipFt =
        s === 0 ? model.supportMomentsKipFt[i]! : s === perSpan ? model.supportMomentsKipFt[i + 1]! : pieceMoment(p, xFt);
      out.push({
        xFt,
        shearKip,
        momentKipFt,
        spanIndex: i,
        xM: ftToM(xFt),
        shearKn: kipToKn(shearKip),
        momentKnM: kipFtToKnM(momentKipFt),
      });
    }
  });
  return out;
}

/** Validates, then solves; the model is what the placement stage check reuses. */
export function continuousBeamModel(input: ContinuousBeamInput): { model: BeamModel; stationsPerSpan: number } {
  const v = parseInput(continuousBeamInputSchema, input, 'Continuous beam');
  const loads = spanLoadsFor(v.spansFt, v.uniformLoadKipPerFt, v.patchLoads);
  return { model: solveBeam(v.spansFt, loads), stationsPerSpan: v.stationsPerSpan ?? DEFAULT_STATIONS_PER_SPAN };
}

export function resultFromModel(model: BeamModel, stationsPerSpan: number): ContinuousBeamResult {
  const regions = momentRegions(model);
  const inflectionPointsFt = inflectionPoints(regions);
  const { maxPositive, maxNegative } = momentPeaks(model);
  return {
    reactionsKip: model.reactionsKip,
    supportMomentsKipFt: model.supportMomentsKipFt,
    stations: stationsOf(model, stationsPerSpan),
    inflectionPointsFt,
    regions,
    maxPositive: withSI(maxPositive),
    maxNegative: withSI(maxNegative),
    supportsFt: model.supportsFt,
    totalLengthFt: model.supportsFt[model.supportsFt.length - 1]!,
    totalLoadKip: model.totalLoadKip,
    reactionsKn: model.reactionsKip.map(kipToKn),
    supportMomentsKnM: model.supportMomentsKipFt.map(kipFtToKnM),
    inflectionPointsM: inflectionPointsFt.map(ftToM),
    engineeringVersion,
  };
}

export function analyzeContinuousBeam(input: ContinuousBeamInput): ContinuousBeamResult {
  const { model, stationsPerSpan } = continuousBeamModel(input);
  return resultFromModel(model, stationsPerSpan);
}

/** Which region holds a point; a point on a boundary belongs to neither and reports 'boundary'. */
export function regionAt(regions: readonly MomentRegion[], xFt: number): MomentSign | 'boundary' {
  for (const r of regions) {
    if (xFt > r.fromFt && xFt < r.toFt) return r.sign;
  }
  return 'boundary';
}
