// Setting an expansion joint on the day: opening = gap at reference - alpha L 12 (T - Tref).
// Coefficients and Procedure A temperatures from memory of AASHTO LRFD (see thermal.test.ts).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { EngineeringInputError, NegativeOpeningError, installationGap } from '../../../shared/engineering';
import { expectRel } from './helpers';

describe('installationGap', () => {
  const base = { gapAtReferenceIn: 1.5, contributingLengthFt: 300, material: 'concrete' as const };

  it('at the reference temperature the opening is the given gap', () => {
    const r = installationGap({ ...base, installTempF: 60 });
    expectRel(r.openingIn, 1.5, 1e-12);
    expectRel(r.openingMm, 38.1, 1e-12);
    expect(r.referenceTempF).toBe(60);
  });

  // Hand: 80 °F install, 20 °F above reference: 1.5 - 6.0e-6 x 300 x 12 x 20 = 1.5 - 0.432 = 1.068 in.
  it('a warmer installation gives a narrower opening, by the hand figure', () => {
    const warm = installationGap({ ...base, installTempF: 80 });
    const cool = installationGap({ ...base, installTempF: 40 });
    expectRel(warm.openingIn, 1.068, 1e-12);
    expectRel(cool.openingIn, 1.932, 1e-12);
    expect(warm.openingIn).toBeLessThan(cool.openingIn);
  });

  it('is narrower whenever it is warmer (any gap, length, material)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 120, noNaN: true }),
        fc.double({ min: 0.1, max: 40, noNaN: true }),
        fc.constantFrom('concrete' as const, 'steel' as const),
        (t, dt, material) => {
          const args = { gapAtReferenceIn: 50, contributingLengthFt: 100, material };
          const a = installationGap({ ...args, installTempF: t });
          const b = installationGap({ ...args, installTempF: t + dt });
          expect(b.openingIn).toBeLessThan(a.openingIn);
        },
      ),
    );
  });

  it('tabulates openings in 10 °F steps over the design range', () => {
    // from memory: Table 3.12.2.1-1, moderate climate, concrete 10 to 80 °F.
    const r = installationGap({ ...base, installTempF: 70 });
    expect(r.table.map((row) => row.tempF)).toEqual([10, 20, 30, 40, 50, 60, 70, 80]);
    const at60 = r.table.find((row) => row.tempF === 60)!;
    expectRel(at60.openingIn, 1.5, 1e-12);
    // Each 10 °F step narrows the opening by 6.0e-6 x 3600 in x 10 = 0.216 in.
    for (let i = 1; i < r.table.length; i++) expectRel(r.table[i - 1]!.openingIn - r.table[i]!.openingIn, 0.216, 1e-9);
  });

  it('covers the cold-climate steel range and ends on an odd maximum', () => {
    // from memory: Table 3.12.2.1-1, cold climate, steel -30 to 120 °F.
    const steel = installationGap({ gapAtReferenceIn: 3, contributingLengthFt: 200, material: 'steel', climate: 'cold', installTempF: 50 });
    expect(steel.table[0]!.tempF).toBe(-30);
    expect(steel.table[steel.table.length - 1]!.tempF).toBe(120);
    expect(steel.table).toHaveLength(16);
    const own = installationGap({ ...base, installTempF: 50, tMinF: 12, tMaxF: 85 });
    expect(own.table.map((row) => row.tempF)).toEqual([12, 22, 32, 42, 52, 62, 72, 82, 85]);
  });

  it('refuses a negative opening at the installation temperature, clearly', () => {
    // Hand: 0.3 in at 60 °F, installed at 80 °F: 0.3 - 0.432 = -0.132 in.
    const call = () => installationGap({ gapAtReferenceIn: 0.3, contributingLengthFt: 300, material: 'concrete', installTempF: 80 });
    expect(call).toThrow(NegativeOpeningError);
    expect(call).toThrow(EngineeringInputError);
    expect(call).toThrow(/-0\.132 in, below zero/);
    try {
      call();
    } catch (e) {
      expectRel((e as NegativeOpeningError).openingIn, -0.132, 1e-9);
    }
  });

  it('flags table rows where the joint would close', () => {
    // Hand: 0.4 in at 60 °F closes by 0.216 in per 10 °F: 0.184 in at 70 °F, -0.032 in at 80 °F.
    const r = installationGap({ gapAtReferenceIn: 0.4, contributingLengthFt: 300, material: 'concrete', installTempF: 50 });
    const closed = r.table.filter((row) => row.closed).map((row) => row.tempF);
    expect(closed).toEqual([80]);
    expect(r.warnings.join(' ')).toMatch(/below zero at 80 °F/);
  });
});
