import { describe, expect, it } from 'vitest';
import { requestBodySchema, requestDraftSchema } from '../../shared/requests/requestBody';
import { validationError } from '../../server/http/errors';
import { conditionListQuerySchema } from '../../shared/conditions/listQuery';
import { deckPlacementBody, otherDeviationBody } from '../support/requestFixtures';

const projectId = '0b6f3c8e-4a8e-4f3b-9a0e-5b1d2c3e4f5a';

describe('request body schemas (shared by the form and the server)', () => {
  it('accepts a complete request of each kind', () => {
    expect(requestBodySchema.safeParse(otherDeviationBody(projectId)).success).toBe(true);
    expect(requestBodySchema.safeParse(deckPlacementBody(projectId)).success).toBe(true);
  });

  it('names each missing field with a message a contractor understands', () => {
    const result = requestBodySchema.safeParse({ type: 'other_deviation', projectId, title: 'abc' });
    const fields = validationError(result.error!).fields!;
    expect(fields.title).toBe('Enter a title (at least 5 characters).');
    expect(fields.reason).toBe('Enter the reason for the change.');
    expect(fields.neededBy).toBeDefined();
  });

  it('refuses fields it does not know, so a client cannot set state or numbers itself', () => {
    const result = requestBodySchema.safeParse({ ...otherDeviationBody(projectId), state: 'closed' });
    expect(validationError(result.error!).fields).toEqual({ state: 'This field is not accepted here.' });
  });

  it('names a refused key "__proto__" like any other, in the JSON the client reads', () => {
    const result = conditionListQuerySchema.safeParse(JSON.parse('{"__proto__": "x"}'));
    const fields = validationError(result.error!).fields!;
    expect(Object.keys(fields)).toEqual(['__proto__']);
    expect(JSON.parse(JSON.stringify({ fields })).fields).toEqual(JSON.parse('{"__proto__": "This field is not accepted here."}'));
  });

  it('needs an amount for a credit or an added cost, and none for no cost', () => {
    expect(requestBodySchema.safeParse({ ...otherDeviationBody(projectId), costImpact: { kind: 'credit' } }).success).toBe(false);
    expect(requestBodySchema.safeParse({ ...otherDeviationBody(projectId), costImpact: { kind: 'none', amountUsd: 5 } }).success).toBe(false);
  });

  it('accepts a half-filled draft but still refuses wrong values in what is filled', () => {
    expect(requestDraftSchema.safeParse({ type: 'deck_placement_change', projectId, deck: { spansFt: [90] } }).success).toBe(true);
    expect(requestDraftSchema.safeParse({ type: 'deck_placement_change', projectId, deck: { spansFt: [-90] } }).success).toBe(false);
    expect(requestDraftSchema.safeParse({ type: 'deck_placement_change' }).success).toBe(false);
  });

  it('knows ASTM C494 retarders are Type B or D', () => {
    const body = deckPlacementBody(projectId) as Extract<ReturnType<typeof deckPlacementBody>, { type: 'deck_placement_change' }>;
    expect(requestBodySchema.safeParse({ ...body, retarder: { ...body.retarder!, astmC494Type: 'A' } }).success).toBe(false);
  });
});
