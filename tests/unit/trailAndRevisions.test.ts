import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { revisionChanges } from '../../shared/requests/revisionDiff';
import { canonicalJson, genesisHash } from '../../shared/trail/canonicalJson';
import { trailHash } from '../../server/trail/trailChain';

describe('canonical JSON of trail events', () => {
  it('sorts keys at every level and drops whitespace, so storage order cannot change a hash', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { f: true, e: null }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"e":null,"f":true}]},"b":1}');
    expect(canonicalJson({ a: 1, b: 2 })).toBe(canonicalJson({ b: 2, a: 1 }));
  });

  it('refuses numbers JSON cannot carry', () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(/NaN/);
  });

  // FIPS 180-4: SHA-256 chained as hash = SHA-256(previous hash ‖ canonical JSON of the event).
  it('chains each hash to the previous one', () => {
    const event = { requestId: 'r', seq: 1, eventType: 'created', stateBefore: null, stateAfter: 'drafting', actorId: 'u', actorRole: 'contractor', comment: null, payload: {}, createdAt: '2027-01-04T15:00:00.000Z' };
    const expected = createHash('sha256').update(genesisHash + canonicalJson(event)).digest('hex');
    expect(trailHash(genesisHash, event)).toBe(expected);
    expect(trailHash(genesisHash, { ...event, comment: 'changed' })).not.toBe(expected);
  });
});

describe('what changed between revisions', () => {
  it('lists changed, added and removed fields by path', () => {
    expect(
      revisionChanges({ title: 'A', deck: { spansFt: [90, 110], deckWidthFt: 44 }, gone: 1 }, { title: 'A', deck: { spansFt: [90, 120], deckWidthFt: 44 }, added: 'x' }),
    ).toEqual([
      { path: 'added', before: null, after: 'x' },
      { path: 'deck.spansFt', before: [90, 110], after: [90, 120] },
      { path: 'gone', before: 1, after: null },
    ]);
  });
});
