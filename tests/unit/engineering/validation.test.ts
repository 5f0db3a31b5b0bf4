// Bad inputs are refused with an EngineeringInputError whose message names the input in plain
// words; nothing is computed from them.
import { describe, expect, it } from 'vitest';
import {
  analyzeContinuousBeam,
  checkConstructionJointLocation,
  continuousBeamInputSchema,
  EngineeringInputError,
  installationGap,
  planDeckPlacement,
  thermalMovementRange,
  type ContinuousBeamInput,
} from '../../../shared/engineering';

function refusal(call: () => unknown): EngineeringInputError {
  try {
    call();
  } catch (e) {
    expect(e).toBeInstanceOf(EngineeringInputError);
    return e as EngineeringInputError;
  }
  throw new Error('expected the input to be refused');
}

const beam = (input: unknown) => () => analyzeContinuousBeam(input as ContinuousBeamInput);

describe('continuous beam input', () => {
  it.each([
    ['no spans', { spansFt: [], uniformLoadKipPerFt: 1 }, /spansFt is empty/, 'spansFt'],
    ['missing spans', { uniformLoadKipPerFt: 1 }, /spansFt is missing/, 'spansFt'],
    ['21 spans', { spansFt: Array<number>(21).fill(50), uniformLoadKipPerFt: 1 }, /spansFt has 21 spans; these checks take 1 to 20/, 'spansFt'],
    ['a zero span', { spansFt: [100, 0], uniformLoadKipPerFt: 1 }, /spansFt\[1\]: A span length must be greater than zero \(got 0 ft\)/, 'spansFt[1]'],
    ['a negative span', { spansFt: [-40], uniformLoadKipPerFt: 1 }, /spansFt\[0\].*greater than zero \(got -40 ft\)/, 'spansFt[0]'],
    ['a NaN span', { spansFt: [100, Number.NaN], uniformLoadKipPerFt: 1 }, /spansFt\[1\].*finite number, not NaN/, 'spansFt[1]'],
    ['an infinite span', { spansFt: [Infinity], uniformLoadKipPerFt: 1 }, /spansFt\[0\].*finite number, not Infinity/, 'spansFt[0]'],
    ['a span typed as text', { spansFt: ['100'], uniformLoadKipPerFt: 1 }, /finite number, not the text "100"/, 'spansFt[0]'],
    ['a negative load', { spansFt: [100], uniformLoadKipPerFt: -2 }, /uniform load cannot be negative \(got -2 kip\/ft\)/, 'uniformLoadKipPerFt'],
    ['a NaN load', { spansFt: [100], uniformLoadKipPerFt: Number.NaN }, /uniformLoadKipPerFt must be a finite number of kip\/ft, not NaN/, 'uniformLoadKipPerFt'],
    ['a negative span load', { spansFt: [100, 100], uniformLoadKipPerFt: [1, -1] }, /uniformLoadKipPerFt\[1\].*cannot be negative/, 'uniformLoadKipPerFt[1]'],
    ['too few span loads', { spansFt: [100, 100, 100], uniformLoadKipPerFt: [1, 1] }, /one load per span: 3 spans but 2 loads/, 'uniformLoadKipPerFt'],
    [
      'a patch off the girder',
      { spansFt: [100, 100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: 150, toFt: 230, kipPerFt: 1 }] },
      /patchLoads\[0\]\.toFt: the patch load runs off the girder: toFt 230 ft is beyond the far end at 200 ft/,
      'patchLoads[0].toFt',
    ],
    [
      'a patch before the girder',
      { spansFt: [100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: -10, toFt: 20, kipPerFt: 1 }] },
      /patchLoads\[0\]\.fromFt.*cannot be negative/,
      'patchLoads[0].fromFt',
    ],
    [
      'a patch that ends where it starts',
      { spansFt: [100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: 40, toFt: 40, kipPerFt: 1 }] },
      /must start before it ends: fromFt 40 ft is not less than toFt 40 ft/,
      'patchLoads[0].toFt',
    ],
    [
      'a patch with fromFt after toFt',
      { spansFt: [100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: 60, toFt: 20, kipPerFt: 1 }] },
      /must start before it ends/,
      'patchLoads[0].toFt',
    ],
    [
      'a negative patch load',
      { spansFt: [100], uniformLoadKipPerFt: 1, patchLoads: [{ fromFt: 10, toFt: 20, kipPerFt: -1 }] },
      /patch load intensity.*cannot be negative/,
      'patchLoads[0].kipPerFt',
    ],
    ['fractional stations', { spansFt: [100], uniformLoadKipPerFt: 1, stationsPerSpan: 2.5 }, /stationsPerSpan must be a whole number/, 'stationsPerSpan'],
    ['a misspelt field', { spansFt: [100], uniformLoadKipPerFt: 1, patchLoad: [] }, /field these checks do not know: patchLoad/, ''],
    ['not an object', null, /must be an object/, ''],
  ])('refuses %s', (_label, input, message, where) => {
    const e = refusal(beam(input));
    expect(e.message).toMatch(message);
    expect(e.input).toBe(where);
    expect(e.name).toBe('EngineeringInputError');
  });

  it('shares its schema for the forms', () => {
    expect(continuousBeamInputSchema.safeParse({ spansFt: [100], uniformLoadKipPerFt: 1 }).success).toBe(true);
    expect(continuousBeamInputSchema.safeParse({ spansFt: [0], uniformLoadKipPerFt: 1 }).success).toBe(false);
  });
});

describe('other inputs', () => {
  it('refuses a joint off the girder or a load of nothing', () => {
    expect(refusal(() => checkConstructionJointLocation({ spansFt: [100], jointAtFt: 100 })).message).toMatch(/off the girder/);
    expect(refusal(() => checkConstructionJointLocation({ spansFt: [100], jointAtFt: Number.NaN })).message).toMatch(/jointAtFt.*not NaN/);
    expect(refusal(() => checkConstructionJointLocation({ spansFt: [100, 100], jointAtFt: 50, uniformLoadKipPerFt: 0 })).message).toMatch(
      /no moment regions to judge by/,
    );
  });

  it('wants exactly one placement rate', () => {
    const base = { spansFt: [100], deckWidthFt: 40, slabThicknessIn: 8 };
    expect(refusal(() => planDeckPlacement({ ...base } as never)).message).toMatch(/give the placement rate/);
    expect(refusal(() => planDeckPlacement({ ...base, placementRateCyPerHr: 40, placementRateFtPerHr: 20 } as never)).message).toMatch(/not both/);
    expect(refusal(() => planDeckPlacement({ ...base, deckWidthFt: 0, placementRateCyPerHr: 40 })).message).toMatch(/deckWidthFt.*greater than zero/);
    expect(refusal(() => planDeckPlacement({ ...base, placementRateCyPerHr: -40 })).message).toMatch(/placementRateCyPerHr.*greater than zero/);
  });

  it('refuses design temperatures the wrong way round and unknown materials', () => {
    expect(
      refusal(() => thermalMovementRange({ contributingLengthFt: 100, material: 'concrete', climate: 'moderate', tMinF: 90 })).message,
    ).toMatch(/design minimum temperature \(90 °F\) must be below the design maximum \(80 °F\)/);
    expect(refusal(() => thermalMovementRange({ contributingLengthFt: 100, material: 'timber' as never, climate: 'moderate' })).message).toMatch(
      /material must be one of: concrete, steel/,
    );
    expect(refusal(() => thermalMovementRange({ contributingLengthFt: 0, material: 'steel', climate: 'cold' })).message).toMatch(
      /contributingLengthFt.*greater than zero/,
    );
    expect(
      refusal(() => installationGap({ gapAtReferenceIn: 1, installTempF: 350, contributingLengthFt: 100, material: 'steel' })).message,
    ).toMatch(/installTempF.*350 °F is above any bridge site; check the unit/);
  });
});
