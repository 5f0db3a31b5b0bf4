// Deck placement plans for a continuous girder: where to break the deck into placements, in what
// order, how long each takes, and what a single continuous placement would ask of the concrete.
//
// Common practice (no code clause): the deck is broken at the inflection points of the full
// dead-load moment diagram, the positive-moment segments are placed first and the negative-moment
// segments over the piers last, so that concrete over the piers is not yet placed while the spans
// deflect under their own wet concrete. A single placement instead keeps the whole deck plastic
// until it is all in place, which needs a retarder.
import { z } from 'zod';
import { parseInput } from './errors';
import { analyzeContinuousBeam, type MomentSign } from './continuousBeam';
import { stageCheck, type StageCheck } from './stageCheck';
import { cyToM3, ftToM } from './units';
import { nonNegativeNumber, objectInput, positiveNumber, spansFtSchema } from './validation';
import { engineeringVersion } from './meta';

export const CUBIC_FEET_PER_CY = 27;
/** Normal-weight reinforced concrete, 150 lb/ft^3 (from memory: AASHTO LRFD Table 3.5.1-1 gives
 *  0.145 kcf for the concrete plus about 0.005 kcf for the reinforcement). */
export const DEFAULT_CONCRETE_UNIT_WEIGHT_PCF = 150;
/** Our default allowance between the end of placement and initial set: finishing, curing cover,
 *  a late truck. Not a code value; the project specification governs. */
export const DEFAULT_SET_TIME_MARGIN_HR = 2;

export const deckPlacementInputSchema = z
  .strictObject(
    {
      spansFt: spansFtSchema,
      deckWidthFt: positiveNumber('deckWidthFt (deck width)', 'ft'),
      slabThicknessIn: positiveNumber('slabThicknessIn (slab thickness)', 'in'),
      haunchCyPerFt: nonNegativeNumber('haunchCyPerFt (haunch concrete per foot of deck)', 'cy/ft').optional(),
      placementRateCyPerHr: positiveNumber('placementRateCyPerHr (placement rate)', 'cy/hr').optional(),
      placementRateFtPerHr: positiveNumber('placementRateFtPerHr (placement rate)', 'ft/hr').optional(),
      setTimeMarginHr: nonNegativeNumber('setTimeMarginHr (margin on the initial set time)', 'hr').optional(),
      concreteUnitWeightPcf: positiveNumber('concreteUnitWeightPcf (unit weight of the concrete)', 'lb/ft³').optional(),
      emergencyJointClearanceFt: nonNegativeNumber('emergencyJointClearanceFt (clearance from inflection points)', 'ft').optional(),
    },
    objectInput('deck placement'),
  )
  .superRefine((v, ctx) => {
    const cy = v.placementRateCyPerHr !== undefined;
    const ft = v.placementRateFtPerHr !== undefined;
    if (cy === ft) {
      ctx.addIssue({
        code: 'custom',
        path: [cy ? 'placementRateFtPerHr' : 'placementRateCyPerHr'],
        message: cy
          ? 'give the placement rate once, either placementRateCyPerHr or placementRateFtPerHr, not both.'
          : 'give the placement rate, as placementRateCyPerHr (cy/hr) or placementRateFtPerHr (ft of deck per hour).',
      });
    }
  });

type PlacementRate =
  | { placementRateCyPerHr: number; placementRateFtPerHr?: undefined }
  | { placementRateFtPerHr: number; placementRateCyPerHr?: undefined };

export type DeckPlacementInput = {
  spansFt: number[];
  deckWidthFt: number;
  slabThicknessIn: number;
  /** Haunch (build-up over the girders) per foot of deck, added to every segment. */
  haunchCyPerFt?: number;
  /** Hours between the end of placement and initial set (default 2). */
  setTimeMarginHr?: number;
  concreteUnitWeightPcf?: number;
  /** Keep emergency joints this far from the inflection points (default 0). */
  emergencyJointClearanceFt?: number;
} & PlacementRate;

export type PlacementSegment = {
  /** Place in the proposed sequence, 1 first. */
  order: number;
  fromFt: number;
  toFt: number;
  sign: MomentSign;
  volumeCy: number;
  durationHr: number;
  /** Number along the girder, 1 = leftmost; the stage check names segments by it. */
  segmentNumber: number;
  lengthFt: number;
  fromM: number;
  toM: number;
  volumeM3: number;
};

export type EmergencyJointZone = { fromFt: number; toFt: number; fromM: number; toM: number };

export type DeckPlacementPlan = {
  segments: PlacementSegment[];
  singlePlacement: {
    volumeCy: number;
    durationHr: number;
    minInitialSetHr: number;
    volumeM3: number;
    setTimeMarginHr: number;
  };
  /** Wet concrete load used for the moment diagram and the stage check. */
  deadLoadKipPerFt: number;
  /** Support stations, 0 at the left end support, for drawing the plan. */
  supportsFt: number[];
  inflectionPointsFt: number[];
  stageCheck: StageCheck;
  emergencyJointZones: EmergencyJointZone[];
  retarderNote: string;
  placementSequenceNote: string;
  engineeringVersion: string;
};

function round(x: number, digits: number): string {
  return x.toFixed(digits);
}

export function planDeckPlacement(input: DeckPlacementInput): DeckPlacementPlan {
  const v = parseInput(deckPlacementInputSchema, input, 'Deck placement');
  const unitWeightKcf = (v.concreteUnitWeightPcf ?? DEFAULT_CONCRETE_UNIT_WEIGHT_PCF) / 1000;
  const haunchCyPerFt = v.haunchCyPerFt ?? 0;
  const cyPerFt = (v.deckWidthFt * v.slabThicknessIn) / 12 / CUBIC_FEET_PER_CY + haunchCyPerFt;
  const deadLoadKipPerFt = cyPerFt * CUBIC_FEET_PER_CY * unitWeightKcf;
  const hoursFor = (lengthFt: number, volumeCy: number) =>
    v.placementRateCyPerHr !== undefined ? volumeCy / v.placementRateCyPerHr : lengthFt / v.placementRateFtPerHr!;

  // The regions of a uniform load do not depend on its size, but the stage check does.
  const beam = analyzeContinuousBeam({ spansFt: v.spansFt, uniformLoadKipPerFt: deadLoadKipPerFt });
  const check = stageCheck(v.spansFt, deadLoadKipPerFt, beam.regions);
  const segments: PlacementSegment[] = check.proposed.order.map((segmentNumber, i) => {
    const r = beam.regions[segmentNumber - 1]!;
    const lengthFt = r.toFt - r.fromFt;
    const volumeCy = lengthFt * cyPerFt;
    return {
      order: i + 1,
      fromFt: r.fromFt,
      toFt: r.toFt,
      sign: r.sign,
      volumeCy,
      durationHr: hoursFor(lengthFt, volumeCy),
      segmentNumber,
      lengthFt,
      fromM: ftToM(r.fromFt),
      toM: ftToM(r.toFt),
      volumeM3: cyToM3(volumeCy),
    };
  });

  const lengthFt = beam.totalLengthFt;
  const volumeCy = lengthFt * cyPerFt;
  const durationHr = hoursFor(lengthFt, volumeCy);
  const setTimeMarginHr = v.setTimeMarginHr ?? DEFAULT_SET_TIME_MARGIN_HR;
  const minInitialSetHr = durationHr + setTimeMarginHr;

  // An interrupted single placement needs a joint somewhere; it goes where the finished deck will
  // be in compression at the top, never in a negative-moment region (common practice).
  const clearance = v.emergencyJointClearanceFt ?? 0;
  const emergencyJointZones: EmergencyJointZone[] = [];
  for (const r of beam.regions) {
    if (r.sign !== 'positive') continue;
    const fromFt = r.fromFt > 0 ? r.fromFt + clearance : r.fromFt;
    const toFt = r.toFt < lengthFt ? r.toFt - clearance : r.toFt;
    if (toFt > fromFt) emergencyJointZones.push({ fromFt, toFt, fromM: ftToM(fromFt), toM: ftToM(toFt) });
  }

  const retarderNote =
    `A single placement of ${round(volumeCy, 1)} cy takes about ${round(durationHr, 1)} h. ` +
    `The concrete first placed must stay plastic until the last is in, so it needs a retarding admixture ` +
    `(ASTM C494 Type B, retarding, or Type D, water-reducing and retarding) giving a time of initial setting ` +
    `(ASTM C403: penetration resistance of 500 psi) of at least ${round(minInitialSetHr, 1)} h: ` +
    `the placement time plus a ${round(setTimeMarginHr, 1)} h margin. Confirm the set time with trial batches ` +
    `at the concrete and air temperatures expected on the day.`;

  const placementSequenceNote =
    segments.length === 1
      ? 'One span, no negative-moment region: the deck can go in as one placement without a sequence.'
      : `Deck broken at the ${beam.inflectionPointsFt.length} inflection points of the full dead-load moment diagram; ` +
        'positive-moment segments first, negative-moment segments over the piers last (common practice), ' +
        'in the order within each group that adds the least negative moment to concrete already placed (see the stage check).';

  return {
    segments,
    singlePlacement: { volumeCy, durationHr, minInitialSetHr, volumeM3: cyToM3(volumeCy), setTimeMarginHr },
    deadLoadKipPerFt,
    supportsFt: beam.supportsFt,
    inflectionPointsFt: beam.inflectionPointsFt,
    stageCheck: check,
    emergencyJointZones,
    retarderNote,
    placementSequenceNote,
    engineeringVersion,
  };
}
