// Tolerances relative to the size of the quantity, since moments run to thousands of kip-ft and
// toBeCloseTo counts decimal places.
import { expect } from 'vitest';

export function expectRel(actual: number, expected: number, rel = 1e-9, abs = 1e-9): void {
  const tol = Math.max(abs, rel * Math.abs(expected));
  if (!(Math.abs(actual - expected) <= tol)) {
    expect.fail(`expected ${actual} to be within ${tol} of ${expected}`);
  }
}
