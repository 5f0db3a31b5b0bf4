// A contractor asks to install a different expansion-joint seal from the one on the plans. The
// substitute must work at every opening the joint will see (the narrowest, on the hottest day,
// and the widest, on the coldest), must take the whole movement range, and should belong to a
// joint family suited to that movement.
//
// Movement limits per family are common practice, not code values; they are our thresholds,
// rounded to what product literature and owner manuals commonly quote, and a project or owner
// rule overrides them:
//   poured sealant up to 1 in; asphaltic plug up to 2 in; compression seal up to 2.5 in;
//   strip seal and sliding plate under 4 in; finger joint 4 in and more;
//   modular joint 4 in and more, about 3 in per cell.
import { z } from 'zod';
import { parseInput } from './errors';
import { inToMm } from './units';
import { nonNegativeNumber, objectInput, positiveNumber } from './validation';
import { engineeringVersion } from './meta';

export const sealKinds = [
  'poured_sealant',
  'asphaltic_plug',
  'compression_seal',
  'strip_seal',
  'sliding_plate',
  'finger',
  'modular',
] as const;
export type SealKind = (typeof sealKinds)[number];

export const sealKindLabels: Record<SealKind, string> = {
  poured_sealant: 'poured sealant',
  asphaltic_plug: 'asphaltic plug joint',
  compression_seal: 'compression seal',
  strip_seal: 'strip seal',
  sliding_plate: 'sliding plate joint',
  finger: 'finger joint',
  modular: 'modular joint',
};

/** Movement at which large-movement joints take over (common practice). */
export const LARGE_MOVEMENT_IN = 4;
/** Movement one cell of a modular joint commonly takes (common practice). */
export const MODULAR_CELL_IN = 3;

/** Movement range each family suits, inches: lower bound inclusive, upper bound as marked. */
export const sealFamilyMovementIn: Record<SealKind, { min: number; max: number; maxInclusive: boolean }> = {
  poured_sealant: { min: 0, max: 1, maxInclusive: true },
  asphaltic_plug: { min: 0, max: 2, maxInclusive: true },
  compression_seal: { min: 0, max: 2.5, maxInclusive: true },
  strip_seal: { min: 0, max: LARGE_MOVEMENT_IN, maxInclusive: false },
  sliding_plate: { min: 0, max: LARGE_MOVEMENT_IN, maxInclusive: false },
  finger: { min: LARGE_MOVEMENT_IN, max: Infinity, maxInclusive: false },
  modular: { min: LARGE_MOVEMENT_IN, max: Infinity, maxInclusive: false },
};

export function familySuits(kind: SealKind, movementRangeIn: number): boolean {
  const r = sealFamilyMovementIn[kind];
  return movementRangeIn >= r.min && (r.maxInclusive ? movementRangeIn <= r.max : movementRangeIn < r.max);
}

export type MovementClass = 'small' | 'moderate' | 'large';

/** The family to reach for first, and the others that suit the movement (common practice). */
export function suggestJointFamily(movementRangeIn: number): {
  family: SealKind;
  suitable: SealKind[];
  movementClass: MovementClass;
  modularCells: number | null;
} {
  const suitable = sealKinds.filter((k) => familySuits(k, movementRangeIn));
  if (movementRangeIn >= LARGE_MOVEMENT_IN) {
    return { family: 'finger', suitable, movementClass: 'large', modularCells: Math.ceil(movementRangeIn / MODULAR_CELL_IN - 1e-9) };
  }
  if (movementRangeIn <= 2.5) return { family: 'compression_seal', suitable, movementClass: movementRangeIn <= 1 ? 'small' : 'moderate', modularCells: null };
  return { family: 'strip_seal', suitable, movementClass: 'moderate', modularCells: null };
}

const sealSchema = (which: string) =>
  z
    .strictObject(
      {
        kind: z.enum(sealKinds, { error: `${which}.kind must be one of: ${sealKinds.join(', ')}.` }),
        minOpeningIn: nonNegativeNumber(`${which}.minOpeningIn (narrowest opening)`, 'in'),
        maxOpeningIn: positiveNumber(`${which}.maxOpeningIn (widest opening)`, 'in'),
      },
      objectInput(`${which} seal`),
    )
    .superRefine((s, ctx) => {
      if (!(s.minOpeningIn < s.maxOpeningIn)) {
        ctx.addIssue({
          code: 'custom',
          path: ['maxOpeningIn'],
          message: `the widest opening (${s.maxOpeningIn} in) must be more than the narrowest (${s.minOpeningIn} in).`,
        });
      }
    });

export const sealSubstitutionInputSchema = z.strictObject(
  {
    movementRangeIn: positiveNumber('movementRangeIn (total thermal movement at the joint)', 'in'),
    specified: sealSchema('specified'),
    substitute: sealSchema('substitute'),
  },
  objectInput('seal substitution'),
);

export type SealSpec = {
  kind: SealKind;
  /** Specified: the narrowest opening the joint will see (design maximum temperature).
   *  Substitute: the narrowest opening the product is rated to work at. */
  minOpeningIn: number;
  /** Specified: the widest opening the joint will see (design minimum temperature).
   *  Substitute: the widest opening the product is rated to work at. */
  maxOpeningIn: number;
};

export type SealSubstitutionInput = { movementRangeIn: number; specified: SealSpec; substitute: SealSpec };

export type SealSubstitutionCheck = {
  pass: boolean;
  reasons: string[];
  suggestedJointFamily: SealKind;
  suitableJointFamilies: SealKind[];
  movementClass: MovementClass;
  /** For a modular joint, the cells the movement calls for (about 3 in each, common practice). */
  modularCells: number | null;
  /** The substitute's own movement capacity, widest minus narrowest rated opening. */
  substituteCapacityIn: number;
  movementRangeMm: number;
  engineeringVersion: string;
};

const inch = (x: number) => `${Number(x.toFixed(3))} in`;

export function checkSealSubstitution(input: SealSubstitutionInput): SealSubstitutionCheck {
  const v = parseInput(sealSubstitutionInputSchema, input, 'Seal substitution');
  const { specified: spec, substitute: sub, movementRangeIn: move } = v;
  const suggestion = suggestJointFamily(move);
  const reasons: string[] = [];
  let pass = true;
  const capacity = sub.maxOpeningIn - sub.minOpeningIn;
  const subName = sealKindLabels[sub.kind];

  if (sub.minOpeningIn > spec.minOpeningIn) {
    pass = false;
    reasons.push(
      `Short at the narrowest opening: the joint closes to ${inch(spec.minOpeningIn)} at the design maximum temperature, but the substitute ${subName} works only down to ${inch(sub.minOpeningIn)} (short by ${inch(sub.minOpeningIn - spec.minOpeningIn)}).`,
    );
  } else {
    reasons.push(`Covers the narrowest opening: ${inch(spec.minOpeningIn)} required, rated down to ${inch(sub.minOpeningIn)}.`);
  }
  if (sub.maxOpeningIn < spec.maxOpeningIn) {
    pass = false;
    reasons.push(
      `Short at the widest opening: the joint opens to ${inch(spec.maxOpeningIn)} at the design minimum temperature, but the substitute ${subName} works only up to ${inch(sub.maxOpeningIn)} (short by ${inch(spec.maxOpeningIn - sub.maxOpeningIn)}).`,
    );
  } else {
    reasons.push(`Covers the widest opening: ${inch(spec.maxOpeningIn)} required, rated up to ${inch(sub.maxOpeningIn)}.`);
  }
  if (capacity < move) {
    pass = false;
    reasons.push(
      `Short on movement: the substitute takes ${inch(capacity)} of movement, the joint moves ${inch(move)} (short by ${inch(move - capacity)}).`,
    );
  } else {
    reasons.push(`Takes the movement range: ${inch(move)} required, ${inch(capacity)} rated.`);
  }
  if (!familySuits(sub.kind, move)) {
    pass = false;
    const r = sealFamilyMovementIn[sub.kind];
    reasons.push(
      move < r.min
        ? `A ${subName} is a large-movement joint, meant for ${inch(r.min)} of movement or more; ${inch(move)} calls for a ${sealKindLabels[suggestion.family]} (common practice).`
        : `A ${subName} suits movement ${r.maxInclusive ? 'up to' : 'under'} ${inch(r.max)}; ${inch(move)} calls for a ${sealKindLabels[suggestion.family]} (common practice).`,
    );
  }
  if (spec.maxOpeningIn - spec.minOpeningIn < move - 1e-9) {
    reasons.push(
      `Note: the specified openings span only ${inch(spec.maxOpeningIn - spec.minOpeningIn)}, less than the ${inch(move)} movement range; the plans' figures should be confirmed with the engineer of record.`,
    );
  }
  if (sub.kind !== spec.kind) {
    reasons.push(
      `The substitute changes the joint family (${sealKindLabels[spec.kind]} to ${subName}), not just the product; the engineer of record decides on a change of family.`,
    );
  }

  return {
    pass,
    reasons,
    suggestedJointFamily: suggestion.family,
    suitableJointFamilies: suggestion.suitable,
    movementClass: suggestion.movementClass,
    modularCells: suggestion.family === 'finger' ? suggestion.modularCells : null,
    substituteCapacityIn: capacity,
    movementRangeMm: inToMm(move),
    engineeringVersion,
  };
}
