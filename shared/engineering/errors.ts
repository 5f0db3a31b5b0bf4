// One error type for every input the engineering checks refuse, so screens and the API can tell
// "you typed something impossible" apart from a fault in the code, and show the message as is.
import type { z } from 'zod';

export class EngineeringInputError extends Error {
  override readonly name: string = 'EngineeringInputError';
  /** Where in the input the problem is, e.g. `spansFt[2]`; empty for the input as a whole. */
  readonly input: string;

  constructor(message: string, input = '') {
    super(message);
    this.input = input;
  }
}

/**
 * The opening worked out for the installation temperature is below zero: the deck would already
 * be pressing the joint shut. It is an input problem (gap too small for the length and the
 * temperature), so it is an EngineeringInputError, with the computed figure kept for the screen.
 */
export class NegativeOpeningError extends EngineeringInputError {
  override readonly name: string = 'NegativeOpeningError';
  readonly openingIn: number;

  constructor(message: string, openingIn: number) {
    super(message, 'installTempF');
    this.openingIn = openingIn;
  }
}

export function pathLabel(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}

/** Validates with a shared schema and turns the first problem into a plain-words error. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown, what: string): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  if (!issue) throw new EngineeringInputError(`The ${what} input is not valid.`);
  const where = pathLabel(issue.path);
  const message = where === '' ? `${what}: ${issue.message}` : `${what}, ${where}: ${issue.message}`;
  throw new EngineeringInputError(message, where);
}
