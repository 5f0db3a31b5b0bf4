// Uniform temperature movement of a deck (AASHTO LRFD Art. 3.12.2): design temperatures by
// Procedure A, the coefficient of thermal expansion of the material, and the movement range the
// joint at the end of the contributing length must take. Values are quoted from memory of the
// AASHTO LRFD Bridge Design Specifications; check them against the edition the plans cite.
import { z } from 'zod';
import { parseInput } from './errors';
import { fToC, ftToM, inToMm, perFToPerC } from './units';
import { objectInput, positiveNumber, temperatureF } from './validation';
import { engineeringVersion } from './meta';

export const deckMaterials = ['concrete', 'steel'] as const;
export type DeckMaterial = (typeof deckMaterials)[number];
export const climates = ['moderate', 'cold'] as const;
export type Climate = (typeof climates)[number];

/** Procedure A, Table 3.12.2.1-1 (from memory). */
export const procedureATemperaturesF: Record<Climate, Record<DeckMaterial, { tMinF: number; tMaxF: number }>> = {
  moderate: { concrete: { tMinF: 10, tMaxF: 80 }, steel: { tMinF: 0, tMaxF: 120 } },
  cold: { concrete: { tMinF: 0, tMaxF: 80 }, steel: { tMinF: -30, tMaxF: 120 } },
};

/** Per °F: Art. 5.4.2.2 normal-weight concrete, Art. 6.4.1 structural steel (from memory). */
export const thermalCoefficientPerF: Record<DeckMaterial, number> = {
  concrete: 6.0e-6,
  steel: 6.5e-6,
};

export const materialSchema = z.enum(deckMaterials, { error: `material must be one of: ${deckMaterials.join(', ')}.` });
export const climateSchema = z.enum(climates, { error: `climate must be one of: ${climates.join(', ')}.` });

export const designTemperatureFields = {
  tMinF: temperatureF('tMinF (design minimum temperature)').optional(),
  tMaxF: temperatureF('tMaxF (design maximum temperature)').optional(),
};

export const thermalMovementInputSchema = z
  .strictObject(
    {
      contributingLengthFt: positiveNumber('contributingLengthFt (length of deck moving toward the joint)', 'ft'),
      material: materialSchema,
      climate: climateSchema,
      ...designTemperatureFields,
    },
    objectInput('thermal movement'),
  )
  .superRefine((v, ctx) => checkTemperatureOrder(v, ctx));

export function checkTemperatureOrder(
  v: { material: DeckMaterial; climate?: Climate; tMinF?: number; tMaxF?: number },
  ctx: z.RefinementCtx,
): void {
  const t = designTemperatures(v.material, v.climate ?? 'moderate', v.tMinF, v.tMaxF);
  if (!(t.tMinF < t.tMaxF)) {
    ctx.addIssue({
      code: 'custom',
      path: [v.tMaxF !== undefined ? 'tMaxF' : 'tMinF'],
      message: `the design minimum temperature (${t.tMinF} °F) must be below the design maximum (${t.tMaxF} °F).`,
    });
  }
}

export function designTemperatures(
  material: DeckMaterial,
  climate: Climate,
  tMinF?: number,
  tMaxF?: number,
): { tMinF: number; tMaxF: number; source: string } {
  const table = procedureATemperaturesF[climate][material];
  const own = tMinF !== undefined || tMaxF !== undefined;
  return {
    tMinF: tMinF ?? table.tMinF,
    tMaxF: tMaxF ?? table.tMaxF,
    source: own
      ? 'Design temperatures given by the user' + (tMinF === undefined || tMaxF === undefined ? ', the other from AASHTO LRFD Table 3.12.2.1-1 (Procedure A)' : '')
      : `AASHTO LRFD Table 3.12.2.1-1 (Procedure A), ${climate} climate, ${material}`,
  };
}

export type ThermalMovementInput = {
  contributingLengthFt: number;
  material: DeckMaterial;
  climate: Climate;
  tMinF?: number;
  tMaxF?: number;
};

export type ThermalMovementRange = {
  tMinF: number;
  tMaxF: number;
  alphaPerF: number;
  movementRangeIn: number;
  movementRangeMm: number;
  tMinC: number;
  tMaxC: number;
  alphaPerC: number;
  contributingLengthM: number;
  temperatureSource: string;
  engineeringVersion: string;
};

export function thermalMovementRange(input: ThermalMovementInput): ThermalMovementRange {
  const v = parseInput(thermalMovementInputSchema, input, 'Thermal movement');
  const t = designTemperatures(v.material, v.climate, v.tMinF, v.tMaxF);
  const alphaPerF = thermalCoefficientPerF[v.material];
  // Art. 3.12.2.3: delta = alpha L (TMaxDesign - TMinDesign), with L in inches for a result in inches.
  const movementRangeIn = alphaPerF * v.contributingLengthFt * 12 * (t.tMaxF - t.tMinF);
  return {
    tMinF: t.tMinF,
    tMaxF: t.tMaxF,
    alphaPerF,
    movementRangeIn,
    movementRangeMm: inToMm(movementRangeIn),
    tMinC: fToC(t.tMinF),
    tMaxC: fToC(t.tMaxF),
    alphaPerC: perFToPerC(alphaPerF),
    contributingLengthM: ftToM(v.contributingLengthFt),
    temperatureSource: t.source,
    engineeringVersion,
  };
}
