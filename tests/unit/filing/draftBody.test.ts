// A draft on the server keeps only what is right so far; the form's boxes come back from it.
import { describe, expect, it } from 'vitest';
import { draftBodyFrom } from '../../../features/requests/filing/draftBody';
import { emptyFiling, type FilingFormValues } from '../../../features/requests/filing/formValues';
import { filingValuesFrom } from '../../../features/requests/filing/valuesFromDraft';
import { requestBodySchema, requestDraftSchema } from '../../../shared/requests/requestBody';

const projectId = '0b6f3c8e-4a8e-4f3b-9a0e-5b1d2c3e4f5a';

function deckValues(): FilingFormValues {
  const v = emptyFiling('deck_placement_change', projectId);
  return {
    ...v,
    title: 'Place the Pellam Creek deck in one pour',
    location: { description: 'Full deck, abutment 1 to abutment 2', span: '', station: '12+40' },
    planSheets: 'S-6, S-7',
    reason: 'Two pumps are on hand for the whole day.',
    proposedChange: 'One placement with Type D retarded concrete.',
    neededBy: '2027-05-10',
    costImpact: { kind: 'credit', amountUsd: '1,850' },
    contractTimeImpactDays: '-5',
    deck: { spansFt: '95, 120, 95', deckWidthFt: '46', slabThicknessIn: '8.5', haunchCyPerFt: '0.12' },
    plannedSequence: 'Five stages, sheet S-6',
    proposedSequence: { kind: 'single_placement', description: 'From abutment 1 toward abutment 2' },
    placement: { rateCyPerHr: '55', equipment: 'Two boom pumps' },
    useRetarder: true,
    retarder: { astmC494Type: 'D', product: 'Trial batch TB-7', initialSetHr: '11.5' },
    emergencyJointAtFt: '150',
  };
}

describe('the draft kept on the server', () => {
  it('is not made before there is a project to keep it under', () => {
    expect(draftBodyFrom(emptyFiling('other_deviation', ''))).toBeNull();
  });

  it('keeps what is right so far and leaves out empty or mistyped boxes', () => {
    const v = emptyFiling('deck_placement_change', projectId);
    v.title = 'Deck pour';
    v.reason = 'short';
    v.deck = { spansFt: '95, x, 95', deckWidthFt: '46', slabThicknessIn: '', haunchCyPerFt: '' };
    v.costImpact = { kind: 'added_cost', amountUsd: '' };
    v.neededBy = '2027-13-40';
    const body = draftBodyFrom(v)!;
    expect(requestDraftSchema.safeParse(body).success).toBe(true);
    expect(body).toMatchObject({ type: 'deck_placement_change', projectId, title: 'Deck pour', deck: { deckWidthFt: 46 } });
    // The bad span drops the list only, not the width beside it.
    expect((body.deck as Record<string, unknown>).spansFt).toBeUndefined();
    expect(body.reason).toBeUndefined();
    expect(body.costImpact).toBeUndefined();
    expect(body.neededBy).toBeUndefined();
    expect(body.preparation).toBeUndefined();
  });

  it('is the whole request once everything is filled in, and reads back into the same boxes', () => {
    const values = deckValues();
    const body = draftBodyFrom(values)!;
    expect(requestBodySchema.safeParse(body).success).toBe(true);
    const back = filingValuesFrom(body);
    expect(back).toEqual({ ...values, costImpact: { kind: 'credit', amountUsd: '1850' } });
    expect(draftBodyFrom(back)).toEqual(body);
  });

  it('reads a half-filled draft back with the missing boxes empty', () => {
    const back = filingValuesFrom({ type: 'joint_seal_substitution', projectId, title: 'Seal at abutment 2', specified: { kind: 'strip_seal', movementCapacityIn: 4 } });
    expect(back.title).toBe('Seal at abutment 2');
    expect(back.specified).toEqual({ kind: 'strip_seal', product: '', movementCapacityIn: '4', minOpeningIn: '', maxOpeningIn: '' });
    expect(back.substitute.kind).toBe('');
    expect(back.useRetarder).toBe(false);
  });
});
