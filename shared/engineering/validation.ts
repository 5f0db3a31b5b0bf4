// Building blocks for the input schemas. Every message names the quantity and its unit, so a
// form can show it beside the field and the API can return it unchanged.
import { z } from 'zod';

export const MAX_SPANS = 20;

function shown(value: unknown): string {
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (value === null) return 'null';
  if (typeof value === 'string') return `the text "${value}"`;
  return typeof value;
}

/** A finite number. NaN, Infinity and numbers typed as text are refused by name. */
export function finiteNumber(label: string) {
  return z.number({
    error: (issue) =>
      issue.input === undefined
        ? `${label} is missing.`
        : `${label} must be a finite number, not ${shown(issue.input)}.`,
  });
}

export function positiveNumber(label: string, unit: string) {
  return finiteNumber(label).gt(0, {
    error: (issue) => `${label} must be greater than zero (got ${shown(issue.input)} ${unit}).`,
  });
}

export function nonNegativeNumber(label: string, unit: string) {
  return finiteNumber(label).gte(0, {
    error: (issue) => `${label} cannot be negative (got ${shown(issue.input)} ${unit}).`,
  });
}

/** Temperatures outside this band are not weather; they are almost always a unit mix-up. */
export function temperatureF(label: string) {
  return finiteNumber(label)
    .gte(-100, { error: (issue) => `${label} of ${shown(issue.input)} °F is below any bridge site; check the unit.` })
    .lte(200, { error: (issue) => `${label} of ${shown(issue.input)} °F is above any bridge site; check the unit.` });
}

export const spansFtSchema = z
  .array(positiveNumber('A span length', 'ft'), {
    error: (issue) =>
      issue.input === undefined ? 'spansFt is missing: give the span lengths in feet.' : 'spansFt must be a list of span lengths in feet.',
  })
  .min(1, { error: 'spansFt is empty: give at least one span length in feet.' })
  .max(MAX_SPANS, {
    error: (issue) =>
      `spansFt has ${Array.isArray(issue.input) ? issue.input.length : 'too many'} spans; these checks take 1 to ${MAX_SPANS}.`,
  });

export const uniformLoadSchema = z.union(
  [nonNegativeNumber('The uniform load', 'kip/ft'), z.array(nonNegativeNumber('A span load', 'kip/ft'))],
  {
    error: (issue) =>
      issue.input === undefined
        ? 'uniformLoadKipPerFt is missing: give one load in kip/ft, or one per span.'
        : typeof issue.input === 'number'
          ? `uniformLoadKipPerFt must be a finite number of kip/ft, not ${shown(issue.input)}.`
          : 'uniformLoadKipPerFt must be a load in kip/ft, or a list of one load per span.',
  },
);

/** Options for a strict object: unknown fields are refused, since a misspelt optional field
 * (say `patchLoad` for `patchLoads`) would otherwise be dropped and the check run without it. */
export function objectInput(what: string) {
  return {
    error: (issue: { code?: string; keys?: string[]; input?: unknown }) =>
      issue.code === 'unrecognized_keys'
        ? `The ${what} input has a field these checks do not know: ${(issue.keys ?? []).join(', ')}.`
        : `The ${what} input must be an object.`,
  };
}

export function total(values: readonly number[]): number {
  let sum = 0;
  for (const v of values) sum += v;
  return sum;
}
