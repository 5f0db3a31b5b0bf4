import { describe, expect, it } from 'vitest';
import { engineeringCheckFor } from '../../shared/requests/engineeringCheck';
import type { RequestBody } from '../../shared/requests/requestBody';
import { otherDeviationBody } from '../support/requestFixtures';

const projectId = '0b6f3c8e-4a8e-4f3b-9a0e-5b1d2c3e4f5a';

function sealBody(substitute: { movementCapacityIn: number; minOpeningIn: number; maxOpeningIn: number }): RequestBody {
  const { type: _t, ...common } = otherDeviationBody(projectId) as Extract<RequestBody, { type: 'other_deviation' }>;
  return {
    ...common,
    type: 'joint_seal_substitution',
    jointLocation: 'Abutment 2',
    specified: { kind: 'strip_seal', movementCapacityIn: 4, minOpeningIn: 0.5, maxOpeningIn: 4.5 },
    substitute: { kind: 'strip_seal', ...substitute },
    contributingLengthFt: 310,
    material: 'steel',
    climate: 'moderate',
    installTempF: 85,
    gapAtReferenceIn: 2,
  };
}

describe('the engineering check of a seal substitution', () => {
  // AASHTO LRFD 3.12.2.1 Procedure A (from memory): steel, moderate climate, 0 to 120 °F; α = 6.5e-6 /°F (6.4.1).
  it('finds the thermal movement of the contributing length and judges the substitute by its openings', () => {
    const check = engineeringCheckFor(sealBody({ movementCapacityIn: 4, minOpeningIn: 0.5, maxOpeningIn: 4.5 }))!;
    const movement = (check.results as { movement: { movementRangeIn: number } }).movement;
    expect(movement.movementRangeIn).toBeCloseTo(6.5e-6 * 310 * 12 * 120, 3);
    expect(check.verdict).toBe('acceptable');
    expect(check.findings.some((f) => f.includes('stated movement capacity'))).toBe(false);
  });

  it('points out a stated movement capacity that disagrees with the seal’s own openings', () => {
    const check = engineeringCheckFor(sealBody({ movementCapacityIn: 3, minOpeningIn: 0.75, maxOpeningIn: 3 }))!;
    expect(check.verdict).toBe('not_acceptable');
    expect(check.findings).toContain(
      "The substitute seal's stated movement capacity (3 in) differs from its opening range (2.25 in); the check uses the opening range.",
    );
  });
});
