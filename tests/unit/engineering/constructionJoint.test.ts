// Construction joint locations. The rules are common practice: a joint stays out of
// negative-moment (tension at the top) regions, and is never placed between a diaphragm and the
// deck. Inflection-point locations are the handbook ones (from memory, see the beam tests).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkConstructionJointLocation, EngineeringInputError } from '../../../shared/engineering';
import { expectRel } from './helpers';

describe('checkConstructionJointLocation', () => {
  it('refuses a joint over an interior support', () => {
    // from memory: AISC Table 3-23 case 29, inflection points l/4 each side of the centre support.
    const r = checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: 100 });
    expect(r.inNegativeMomentRegion).toBe(true);
    expect(r.acceptable).toBe(false);
    expectRel(r.distanceToInflectionPointFt!, 25, 1e-12);
    expect(r.reasons.join(' ')).toMatch(/over interior support 2/);
    expect(r.reasons.join(' ')).toMatch(/negative-moment region/);
    // from memory: case 29, M over the support = -wl^2/8, here with the default 1 kip/ft.
    expectRel(r.momentAtJointKipFt, -1250, 1e-12);
  });

  it('accepts a joint near mid-span of an end span', () => {
    const r = checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: 40 });
    expect(r.inNegativeMomentRegion).toBe(false);
    expect(r.acceptable).toBe(true);
    // Hand: nearest inflection point at 3l/4 = 75 ft.
    expectRel(r.distanceToInflectionPointFt!, 35, 1e-12);
    expectRel(r.nearestInflectionPointFt!, 75, 1e-12);
    // Hand: M(40) = 3wl/8 x 40 - w 40^2 / 2 = 37.5 x 40 - 800 = 700 kip-ft.
    expectRel(r.momentAtJointKipFt, 700, 1e-12);
  });

  it('gives the distances to the tabulated three-span inflection points', () => {
    // from memory: coefficient tables, three equal spans, inflection points at 0.8l and
    // l + 0.2764l (exactly (1 - sqrt(0.2))/2 l).
    const l = 100;
    const c = ((1 - Math.sqrt(0.2)) / 2) * l;
    const centre = checkConstructionJointLocation({ spansFt: [l, l, l], jointAtFt: 150 });
    expect(centre.acceptable).toBe(true);
    expectRel(centre.distanceToInflectionPointFt!, 50 - c, 1e-12);
    const nearPier = checkConstructionJointLocation({ spansFt: [l, l, l], jointAtFt: 90 });
    expect(nearPier.inNegativeMomentRegion).toBe(true);
    expect(nearPier.acceptable).toBe(false);
    expectRel(nearPier.distanceToInflectionPointFt!, 10, 1e-12);
    const justOutside = checkConstructionJointLocation({ spansFt: [l, l, l], jointAtFt: 79 });
    expect(justOutside.inNegativeMomentRegion).toBe(false);
    expect(justOutside.acceptable).toBe(true);
    expectRel(justOutside.distanceToInflectionPointFt!, 1, 1e-9);
    expect(justOutside.reasons.join(' ')).toMatch(/within 5% of the span/);
  });

  it('judges by the loads given, per span', () => {
    // from memory: AISC Table 3-23 case 30, one span loaded: inflection point at 7l/8 in the loaded span.
    const r = checkConstructionJointLocation({ spansFt: [80, 80], jointAtFt: 60, uniformLoadKipPerFt: [1, 0] });
    expect(r.acceptable).toBe(true);
    expectRel(r.distanceToInflectionPointFt!, 10, 1e-12);
    const beyond = checkConstructionJointLocation({ spansFt: [80, 80], jointAtFt: 120, uniformLoadKipPerFt: [1, 0] });
    expect(beyond.inNegativeMomentRegion).toBe(true);
  });

  it('a single span has no inflection point and no negative region', () => {
    const r = checkConstructionJointLocation({ spansFt: [90], jointAtFt: 30 });
    expect(r.inNegativeMomentRegion).toBe(false);
    expect(r.distanceToInflectionPointFt).toBeNull();
    expect(r.acceptable).toBe(true);
  });

  it('a joint on an inflection point is not in the negative region', () => {
    const r = checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: 75 });
    expect(r.inNegativeMomentRegion).toBe(false);
    expect(r.distanceToInflectionPointFt).toBe(0);
    expect(r.reasons.join(' ')).toMatch(/on an inflection point/);
  });

  it('never accepts a joint between diaphragm and deck (common practice)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 10, max: 250, noNaN: true }), { minLength: 1, maxLength: 20 }),
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        (spansFt, f) => {
          const length = spansFt.reduce((a, b) => a + b, 0);
          const r = checkConstructionJointLocation({ spansFt, jointAtFt: f * length, plane: 'between_diaphragm_and_deck' });
          expect(r.acceptable).toBe(false);
          expect(r.reasons[0]).toMatch(/between a diaphragm and the deck/);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('agrees with the sign of the moment everywhere', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (f) => {
        const r = checkConstructionJointLocation({ spansFt: [70, 120, 90], jointAtFt: f * 280 });
        if (Math.abs(r.momentAtJointKipFt) > 1e-6) expect(r.inNegativeMomentRegion).toBe(r.momentAtJointKipFt < 0);
        expect(r.acceptable).toBe(!r.inNegativeMomentRegion);
      }),
    );
  });

  it('refuses a joint off the girder', () => {
    expect(() => checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: 250 })).toThrow(EngineeringInputError);
    expect(() => checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: -5 })).toThrow(/jointAtFt.*off the girder/);
  });
});
