// The opening to set an expansion joint to on the day it is installed. The plans give the opening
// at a reference temperature; a warmer day means a longer deck and so a narrower opening:
// opening(T) = gap at reference - alpha L (T - Tref), L in inches.
import { z } from 'zod';
import { NegativeOpeningError, parseInput } from './errors';
import {
  checkTemperatureOrder,
  climateSchema,
  designTemperatureFields,
  designTemperatures,
  materialSchema,
  thermalCoefficientPerF,
  type Climate,
  type DeckMaterial,
} from './thermal';
import { fToC, inToMm } from './units';
import { objectInput, positiveNumber, temperatureF } from './validation';
import { engineeringVersion } from './meta';

export const DEFAULT_REFERENCE_TEMP_F = 60;
export const TABLE_STEP_F = 10;

export const installationGapInputSchema = z
  .strictObject(
    {
      gapAtReferenceIn: positiveNumber('gapAtReferenceIn (opening at the reference temperature)', 'in'),
      referenceTempF: temperatureF('referenceTempF (reference temperature)').optional(),
      installTempF: temperatureF('installTempF (temperature at installation)'),
      contributingLengthFt: positiveNumber('contributingLengthFt (length of deck moving toward the joint)', 'ft'),
      material: materialSchema,
      climate: climateSchema.optional(),
      ...designTemperatureFields,
    },
    objectInput('installation gap'),
  )
  .superRefine((v, ctx) => checkTemperatureOrder(v, ctx));

export type InstallationGapInput = {
  gapAtReferenceIn: number;
  /** Default 60 °F. */
  referenceTempF?: number;
  installTempF: number;
  contributingLengthFt: number;
  material: DeckMaterial;
  /** Sets the design temperature span of the table (default moderate). */
  climate?: Climate;
  tMinF?: number;
  tMaxF?: number;
};

export type OpeningRow = { tempF: number; openingIn: number; tempC: number; openingMm: number; closed: boolean };

export type InstallationGap = {
  openingIn: number;
  openingMm: number;
  table: OpeningRow[];
  referenceTempF: number;
  installTempF: number;
  alphaPerF: number;
  tMinF: number;
  tMaxF: number;
  /** Plain-words warnings: openings that would close, installation outside the design range. */
  warnings: string[];
  engineeringVersion: string;
};

export function installationGap(input: InstallationGapInput): InstallationGap {
  const v = parseInput(installationGapInputSchema, input, 'Installation gap');
  const referenceTempF = v.referenceTempF ?? DEFAULT_REFERENCE_TEMP_F;
  const alphaPerF = thermalCoefficientPerF[v.material];
  const t = designTemperatures(v.material, v.climate ?? 'moderate', v.tMinF, v.tMaxF);
  const lengthIn = v.contributingLengthFt * 12;
  const openingAt = (tempF: number) => v.gapAtReferenceIn - alphaPerF * lengthIn * (tempF - referenceTempF);

  const openingIn = openingAt(v.installTempF);
  if (openingIn < 0) {
    throw new NegativeOpeningError(
      `Installation gap: at ${v.installTempF} °F the computed opening is ${openingIn.toFixed(3)} in, below zero. ` +
        `A ${v.gapAtReferenceIn} in gap at ${referenceTempF} °F is too small for ${v.contributingLengthFt} ft of ${v.material} deck; ` +
        'the deck would already bear on the joint. Check the gap, the reference temperature and the contributing length.',
      openingIn,
    );
  }

  const temps: number[] = [];
  for (let tempF = t.tMinF; tempF < t.tMaxF - 1e-9; tempF += TABLE_STEP_F) temps.push(tempF);
  temps.push(t.tMaxF);
  const table = temps.map((tempF) => {
    const o = openingAt(tempF);
    return { tempF, openingIn: o, tempC: fToC(tempF), openingMm: inToMm(o), closed: o < 0 };
  });

  const warnings: string[] = [];
  const closed = table.filter((r) => r.closed);
  if (closed.length > 0) {
    warnings.push(
      `The computed opening is below zero at ${closed.map((r) => `${r.tempF} °F`).join(', ')}: the joint would close and the deck bear on it. The gap or the joint type needs review.`,
    );
  }
  if (v.installTempF < t.tMinF || v.installTempF > t.tMaxF) {
    warnings.push(`The installation temperature ${v.installTempF} °F is outside the design range ${t.tMinF} to ${t.tMaxF} °F.`);
  }

  return {
    openingIn,
    openingMm: inToMm(openingIn),
    table,
    referenceTempF,
    installTempF: v.installTempF,
    alphaPerF,
    tMinF: t.tMinF,
    tMaxF: t.tMaxF,
    warnings,
    engineeringVersion,
  };
}
