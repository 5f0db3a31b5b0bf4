// Thermal movement. The design temperatures and coefficients are from memory of the AASHTO LRFD
// Bridge Design Specifications: Table 3.12.2.1-1 (Procedure A), Art. 5.4.2.2 (concrete),
// Art. 6.4.1 (steel), Art. 3.12.2.3 (design thermal movement). Check them against the edition
// the plans cite.
import { describe, expect, it } from 'vitest';
import { thermalMovementRange } from '../../../shared/engineering';
import { expectRel } from './helpers';

describe('thermalMovementRange', () => {
  // from memory: AASHTO LRFD Table 3.12.2.1-1, Procedure A.
  it.each([
    ['moderate', 'concrete', 10, 80],
    ['moderate', 'steel', 0, 120],
    ['cold', 'concrete', 0, 80],
    ['cold', 'steel', -30, 120],
  ] as const)('%s climate, %s: %d to %d °F', (climate, material, tMin, tMax) => {
    const r = thermalMovementRange({ contributingLengthFt: 100, material, climate });
    expect(r.tMinF).toBe(tMin);
    expect(r.tMaxF).toBe(tMax);
  });

  // from memory: AASHTO LRFD 5.4.2.2 (normal-weight concrete 6.0e-6/°F), 6.4.1 (steel 6.5e-6/°F).
  it('uses the code coefficients of thermal expansion', () => {
    expect(thermalMovementRange({ contributingLengthFt: 100, material: 'concrete', climate: 'moderate' }).alphaPerF).toBe(6.0e-6);
    expect(thermalMovementRange({ contributingLengthFt: 100, material: 'steel', climate: 'moderate' }).alphaPerF).toBe(6.5e-6);
  });

  // Worked example, Art. 3.12.2.3 (from memory): 300 ft concrete deck, moderate climate,
  // delta T = 80 - 10 = 70 °F, movement = 6.0e-6 x 300 x 12 x 70 = 1.512 in = 38.4 mm.
  it('works the 300 ft concrete deck example', () => {
    const r = thermalMovementRange({ contributingLengthFt: 300, material: 'concrete', climate: 'moderate' });
    expectRel(r.movementRangeIn, 1.512, 1e-12);
    expectRel(r.movementRangeMm, 1.512 * 25.4, 1e-12);
    expectRel(r.tMinC, -12.2222222222, 1e-9);
  });

  // Hand calculation: 450 ft steel, cold climate, 150 °F range: 6.5e-6 x 450 x 12 x 150 = 5.265 in.
  it('works a steel girder in a cold climate', () => {
    const r = thermalMovementRange({ contributingLengthFt: 450, material: 'steel', climate: 'cold' });
    expectRel(r.movementRangeIn, 5.265, 1e-12);
  });

  it("takes the user's own design temperatures", () => {
    const r = thermalMovementRange({ contributingLengthFt: 200, material: 'concrete', climate: 'moderate', tMinF: 5, tMaxF: 105 });
    expect([r.tMinF, r.tMaxF]).toEqual([5, 105]);
    // Hand: 6.0e-6 x 200 x 12 x 100 = 1.44 in.
    expectRel(r.movementRangeIn, 1.44, 1e-12);
    expect(r.temperatureSource).toMatch(/user/);
  });
});
