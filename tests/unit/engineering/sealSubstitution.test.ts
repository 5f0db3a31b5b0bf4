// Expansion-joint seal substitutions. Which family suits which movement is common practice; the
// thresholds are ours (documented in sealSubstitution.ts): compression seals to 2.5 in, strip
// seals under 4 in, finger and modular joints from 4 in, modular cells about 3 in each.
import { describe, expect, it } from 'vitest';
import { checkSealSubstitution, suggestJointFamily, EngineeringInputError } from '../../../shared/engineering';

describe('checkSealSubstitution', () => {
  // Movement 1.512 in: the 300 ft concrete deck of the thermal example (AASHTO LRFD 3.12.2.3, from memory).
  const specified = { kind: 'strip_seal' as const, minOpeningIn: 0.5, maxOpeningIn: 2.25 };

  it('passes a substitute that covers both design extremes and the range', () => {
    const r = checkSealSubstitution({ movementRangeIn: 1.512, specified, substitute: { kind: 'strip_seal', minOpeningIn: 0.25, maxOpeningIn: 3 } });
    expect(r.pass).toBe(true);
    expect(r.reasons.some((x) => /Short/.test(x))).toBe(false);
    expect(r.substituteCapacityIn).toBe(2.75);
  });

  it('fails short at the narrowest opening, saying by how much', () => {
    const r = checkSealSubstitution({ movementRangeIn: 1.512, specified, substitute: { kind: 'strip_seal', minOpeningIn: 0.75, maxOpeningIn: 3 } });
    expect(r.pass).toBe(false);
    expect(r.reasons.join(' ')).toMatch(/Short at the narrowest opening.*short by 0\.25 in/);
  });

  it('fails short at the widest opening', () => {
    const r = checkSealSubstitution({ movementRangeIn: 1.512, specified, substitute: { kind: 'strip_seal', minOpeningIn: 0.25, maxOpeningIn: 2 } });
    expect(r.pass).toBe(false);
    expect(r.reasons.join(' ')).toMatch(/Short at the widest opening.*short by 0\.25 in/);
  });

  it('fails short on movement capacity', () => {
    const r = checkSealSubstitution({
      movementRangeIn: 1.512,
      specified: { kind: 'compression_seal', minOpeningIn: 0.5, maxOpeningIn: 1.9 },
      substitute: { kind: 'compression_seal', minOpeningIn: 0.5, maxOpeningIn: 1.9 },
    });
    expect(r.pass).toBe(false);
    expect(r.reasons.join(' ')).toMatch(/Short on movement.*1\.4 in.*1\.512 in.*short by 0\.112 in/);
    // The plans' own openings are narrower than the movement: said, not hidden.
    expect(r.reasons.join(' ')).toMatch(/specified openings span only 1\.4 in/);
  });

  it('fails a family that does not suit the movement (common practice)', () => {
    const r = checkSealSubstitution({
      movementRangeIn: 3,
      specified: { kind: 'strip_seal', minOpeningIn: 0.5, maxOpeningIn: 3.5 },
      substitute: { kind: 'poured_sealant', minOpeningIn: 0.25, maxOpeningIn: 4 },
    });
    expect(r.pass).toBe(false);
    expect(r.reasons.join(' ')).toMatch(/poured sealant suits movement up to 1 in/);
    expect(r.reasons.join(' ')).toMatch(/changes the joint family/);
    expect(r.suggestedJointFamily).toBe('strip_seal');
  });

  it('suggests families by movement range (common practice)', () => {
    expect(suggestJointFamily(0.75).family).toBe('compression_seal');
    expect(suggestJointFamily(0.75).suitable).toContain('poured_sealant');
    expect(suggestJointFamily(2.5).family).toBe('compression_seal');
    expect(suggestJointFamily(3).family).toBe('strip_seal');
    expect(suggestJointFamily(3).suitable).not.toContain('compression_seal');
    expect(suggestJointFamily(3.99).suitable).toContain('strip_seal');
    expect(suggestJointFamily(4).family).toBe('finger');
    expect(suggestJointFamily(4).suitable).toEqual(['finger', 'modular']);
    expect(suggestJointFamily(4).movementClass).toBe('large');
    // 12 in at about 3 in per cell: four cells.
    expect(suggestJointFamily(12).modularCells).toBe(4);
    expect(suggestJointFamily(12.5).modularCells).toBe(5);
  });

  it('refuses openings the wrong way round and unknown kinds', () => {
    expect(() =>
      checkSealSubstitution({ movementRangeIn: 1, specified, substitute: { kind: 'strip_seal', minOpeningIn: 3, maxOpeningIn: 1 } }),
    ).toThrow(/substitute\.maxOpeningIn.*must be more than the narrowest/);
    expect(() =>
      checkSealSubstitution({ movementRangeIn: 1, specified, substitute: { kind: 'bubble_wrap' as never, minOpeningIn: 0, maxOpeningIn: 1 } }),
    ).toThrow(EngineeringInputError);
  });
});
