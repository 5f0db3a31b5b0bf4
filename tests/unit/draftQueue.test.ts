// Drafts kept on the device and the queue that sends them when the connection returns.
import { describe, expect, it } from 'vitest';
import { draftKey, keepDraft, listDrafts, patchDraft, queuedDrafts, readDraft, sendQueued, type DeviceDraft, type ServerDraftRef } from '../../features/drafts/deviceDrafts';
import { memoryStore } from '../../features/drafts/memoryStore';

type Values = { title: string };

function kept(userId: string, localId: string, change: Partial<DeviceDraft<Values>> = {}): DeviceDraft<Values> {
  return { localId, userId, server: null, values: { title: `Draft ${localId}` }, step: 'where', fileNames: [], queued: false, refused: null, updatedAt: '2026-12-02T10:00:00.000Z', ...change };
}

class Offline extends Error {}
const isOffline = (e: unknown) => e instanceof Offline;
const ref = (n: number): ServerDraftRef => ({ id: `id-${n}`, version: 1, number: `PC-0114-0${n}` });

describe('drafts kept on the device', () => {
  it('keeps each person’s drafts apart and lists the newest first', () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'a', { updatedAt: '2026-12-02T10:00:00.000Z' }));
    keepDraft(store, kept('u1', 'b', { updatedAt: '2026-12-02T11:00:00.000Z' }));
    keepDraft(store, kept('u2', 'c'));
    expect(listDrafts<Values>(store, 'u1').map((d) => d.localId)).toEqual(['b', 'a']);
    expect(listDrafts<Values>(store, 'u2').map((d) => d.localId)).toEqual(['c']);
    expect(readDraft(store, 'u2', 'a')).toBeNull();
    // A key that merely starts with another person's id is not theirs.
    keepDraft(store, kept('u10', 'd'));
    expect(listDrafts(store, 'u1').map((d) => d.localId)).toEqual(['b', 'a']);
  });

  it('ignores what it cannot read instead of failing the screen', () => {
    const store = memoryStore();
    store.setItem(draftKey('u1', 'broken'), '{not json');
    store.setItem(draftKey('u1', 'wrong'), JSON.stringify({ localId: 'wrong', userId: 'u2', values: {}, updatedAt: 'x' }));
    keepDraft(store, kept('u1', 'good'));
    expect(listDrafts(store, 'u1').map((d) => d.localId)).toEqual(['good']);
  });

  it('says so when the device refuses to keep it', () => {
    const store = { ...memoryStore(), setItem: () => { throw new Error('QuotaExceededError'); } };
    expect(keepDraft(store, kept('u1', 'a'))).toBe(false);
  });

  it('changes one draft in a single read and write', () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'a', { fileNames: ['S-6.pdf'] }));
    patchDraft<Values>(store, 'u1', 'a', (d) => (d ? { ...d, queued: true } : null));
    expect(readDraft<Values>(store, 'u1', 'a')).toMatchObject({ queued: true, fileNames: ['S-6.pdf'] });
    expect(patchDraft(store, 'u1', 'missing', () => null)).toBeNull();
    expect(store.keys()).toHaveLength(1);
  });
});

describe('the queue of drafts waiting for the connection', () => {
  it('sends only queued drafts, oldest first, and marks them saved', async () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'new', { queued: true, updatedAt: '2026-12-02T12:00:00.000Z' }));
    keepDraft(store, kept('u1', 'old', { queued: true, updatedAt: '2026-12-02T09:00:00.000Z' }));
    keepDraft(store, kept('u1', 'idle'));
    keepDraft(store, kept('u2', 'theirs', { queued: true }));
    const sent: string[] = [];
    const outcomes = await sendQueued<Values>(store, 'u1', async (d) => {
      sent.push(d.localId);
      return ref(sent.length);
    }, isOffline);
    expect(sent).toEqual(['old', 'new']);
    expect(outcomes).toEqual([{ localId: 'old', server: ref(1) }, { localId: 'new', server: ref(2) }]);
    expect(queuedDrafts(store, 'u1')).toEqual([]);
    expect(readDraft(store, 'u1', 'new')?.server).toEqual(ref(2));
    expect(queuedDrafts(store, 'u2').map((d) => d.localId)).toEqual(['theirs']);
  });

  it('stops at a lost connection and leaves the rest queued for next time', async () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'a', { queued: true, updatedAt: '2026-12-02T09:00:00.000Z' }));
    keepDraft(store, kept('u1', 'b', { queued: true, updatedAt: '2026-12-02T10:00:00.000Z' }));
    let calls = 0;
    const outcomes = await sendQueued<Values>(store, 'u1', async () => {
      calls++;
      throw new Offline('down');
    }, isOffline);
    expect(calls).toBe(1);
    expect(outcomes).toEqual([{ localId: 'a', offline: true }]);
    expect(queuedDrafts(store, 'u1').map((d) => d.localId).sort()).toEqual(['a', 'b']);
  });

  it('records a refusal on that draft, does not retry it, and still sends the others', async () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'a', { queued: true, updatedAt: '2026-12-02T09:00:00.000Z' }));
    keepDraft(store, kept('u1', 'b', { queued: true, updatedAt: '2026-12-02T10:00:00.000Z' }));
    const outcomes = await sendQueued<Values>(store, 'u1', async (d) => {
      if (d.localId === 'a') throw new Error('Someone changed this request since you opened it.');
      return ref(2);
    }, isOffline);
    expect(outcomes).toEqual([{ localId: 'a', refused: 'Someone changed this request since you opened it.' }, { localId: 'b', server: ref(2) }]);
    expect(readDraft(store, 'u1', 'a')).toMatchObject({ queued: false, refused: 'Someone changed this request since you opened it.', server: null });
    expect(queuedDrafts(store, 'u1')).toEqual([]);
  });

  it('keeps typing that arrived while the draft was on its way', async () => {
    const store = memoryStore();
    keepDraft(store, kept('u1', 'a', { queued: true }));
    await sendQueued<Values>(store, 'u1', async () => {
      patchDraft<Values>(store, 'u1', 'a', (d) => (d ? { ...d, values: { title: 'Typed meanwhile' } } : null));
      return ref(1);
    }, isOffline);
    expect(readDraft<Values>(store, 'u1', 'a')).toMatchObject({ values: { title: 'Typed meanwhile' }, server: ref(1), queued: false });
  });
});
