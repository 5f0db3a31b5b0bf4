// Is a proposed construction joint in a sensible place? Common practice (no code clause):
// a transverse deck joint stays out of negative-moment regions, where the top of the deck is in
// tension and a cold joint would open into a crack; and a joint is never placed between a
// diaphragm and the deck, which are cast together so the diaphragm works with the deck.
import { z } from 'zod';
import { parseInput } from './errors';
import { continuousBeamModel, resultFromModel, regionAt } from './continuousBeam';
import { momentAt } from './beamModel';
import { finiteNumber, objectInput, spansFtSchema, total, uniformLoadSchema } from './validation';
import { ftToM, kipFtToKnM } from './units';
import { engineeringVersion } from './meta';

export const jointPlanes = ['transverse', 'between_diaphragm_and_deck'] as const;
export type JointPlane = (typeof jointPlanes)[number];

/** Within this share of its span, a joint is called close to an inflection point; the point
 *  moves with stiffness and load assumptions that the analysis simplifies (our threshold). */
export const NEAR_INFLECTION_SHARE_OF_SPAN = 0.05;

export const constructionJointInputSchema = z
  .strictObject(
    {
      spansFt: spansFtSchema,
      jointAtFt: finiteNumber('jointAtFt (joint location from the left end support)'),
      uniformLoadKipPerFt: uniformLoadSchema.optional(),
      plane: z
        .enum(jointPlanes, { error: `plane must be one of: ${jointPlanes.join(', ')}.` })
        .optional(),
    },
    objectInput('construction joint'),
  )
  .superRefine((v, ctx) => {
    const lengthFt = total(v.spansFt);
    if (!(v.jointAtFt > 0 && v.jointAtFt < lengthFt)) {
      ctx.addIssue({
        code: 'custom',
        path: ['jointAtFt'],
        message: `the joint at ${v.jointAtFt} ft is off the girder, which runs from 0 to ${lengthFt} ft between its end supports.`,
      });
    }
    const w = v.uniformLoadKipPerFt;
    if (Array.isArray(w)) {
      if (w.length !== v.spansFt.length) {
        ctx.addIssue({
          code: 'custom',
          path: ['uniformLoadKipPerFt'],
          message: `give one load per span: ${v.spansFt.length} spans but ${w.length} loads.`,
        });
      } else if (!w.some((x) => x > 0)) {
        ctx.addIssue({ code: 'custom', path: ['uniformLoadKipPerFt'], message: 'at least one span must carry load, or there are no moment regions to judge by.' });
      }
    } else if (w === 0) {
      ctx.addIssue({ code: 'custom', path: ['uniformLoadKipPerFt'], message: 'the load must be greater than zero, or there are no moment regions to judge by.' });
    }
  });

export type ConstructionJointInput = {
  spansFt: number[];
  jointAtFt: number;
  /** Load the regions are drawn for; default 1 kip/ft on every span, which gives the regions of
   *  any equal uniform load such as the deck's own weight. */
  uniformLoadKipPerFt?: number | number[];
  plane?: JointPlane;
};

export type ConstructionJointCheck = {
  inNegativeMomentRegion: boolean;
  /** Null when the girder has no inflection point (a single span). */
  distanceToInflectionPointFt: number | null;
  acceptable: boolean;
  reasons: string[];
  nearestInflectionPointFt: number | null;
  distanceToInflectionPointM: number | null;
  momentAtJointKipFt: number;
  momentAtJointKnM: number;
  inflectionPointsFt: number[];
  spanIndex: number;
  engineeringVersion: string;
};

const ft = (x: number) => `${x.toFixed(1)} ft`;

export function checkConstructionJointLocation(input: ConstructionJointInput): ConstructionJointCheck {
  const v = parseInput(constructionJointInputSchema, input, 'Construction joint');
  const { model } = continuousBeamModel({ spansFt: v.spansFt, uniformLoadKipPerFt: v.uniformLoadKipPerFt ?? 1 });
  const beam = resultFromModel(model, 1);
  const x = v.jointAtFt;
  const plane = v.plane ?? 'transverse';

  let spanIndex = 0;
  while (spanIndex < v.spansFt.length - 1 && x >= beam.supportsFt[spanIndex + 1]!) spanIndex++;
  const spanFt = v.spansFt[spanIndex]!;

  let nearest: number | null = null;
  for (const p of beam.inflectionPointsFt) if (nearest === null || Math.abs(p - x) < Math.abs(nearest - x)) nearest = p;
  const distance = nearest === null ? null : Math.abs(nearest - x);

  // Judged by the exact regions, so a joint a hair inside a region is judged by that region and
  // not by the nearest station.
  const where = regionAt(beam.regions, x);
  const inNegativeMomentRegion = where === 'negative';
  const moment = momentAt(model, x);

  const reasons: string[] = [];
  let acceptable = true;

  if (plane === 'between_diaphragm_and_deck') {
    acceptable = false;
    reasons.push(
      'A construction joint is never placed between a diaphragm and the deck: the two are cast together so that they act together (common practice).',
    );
  }

  const supportHere = beam.supportsFt.findIndex((s, i) => i > 0 && i < beam.supportsFt.length - 1 && Math.abs(s - x) < 1e-9 * beam.totalLengthFt);
  if (inNegativeMomentRegion) {
    acceptable = false;
    reasons.push(
      (supportHere > 0 ? `The joint at ${ft(x)} is over interior support ${supportHere + 1}, ` : `The joint at ${ft(x)} is `) +
        `in a negative-moment region (tension at the top of the deck)` +
        (distance !== null ? `, ${ft(distance)} from the nearest inflection point at ${ft(nearest!)}` : '') +
        '. Joints stay out of tension regions (common practice).',
    );
  } else if (where === 'boundary') {
    reasons.push(`The joint at ${ft(x)} sits on an inflection point, where the moment is zero.`);
  } else {
    reasons.push(
      `The joint at ${ft(x)} is in a positive-moment region (compression at the top of the deck)` +
        (distance !== null ? `, ${ft(distance)} from the nearest inflection point at ${ft(nearest!)}.` : '; this girder has no negative-moment region.'),
    );
  }

  if (!inNegativeMomentRegion && distance !== null && distance <= NEAR_INFLECTION_SHARE_OF_SPAN * spanFt) {
    reasons.push(
      `It is within ${Math.round(NEAR_INFLECTION_SHARE_OF_SPAN * 100)}% of the span of an inflection point. The analysis assumes a constant section and uniform load; the true point can move, so the engineer of record should confirm this location.`,
    );
  }
  if (acceptable) reasons.push('Location acceptable by these rules, subject to the engineer of record.');

  return {
    inNegativeMomentRegion,
    distanceToInflectionPointFt: distance,
    acceptable,
    reasons,
    nearestInflectionPointFt: nearest,
    distanceToInflectionPointM: distance === null ? null : ftToM(distance),
    momentAtJointKipFt: moment,
    momentAtJointKnM: kipFtToKnM(moment),
    inflectionPointsFt: beam.inflectionPointsFt,
    spanIndex,
    engineeringVersion,
  };
}
