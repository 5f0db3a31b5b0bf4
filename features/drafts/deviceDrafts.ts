// Drafts kept on this device, so what was typed survives a lost connection or a closed tab.
// One entry per person and per draft; the functions here only read and write a key-value store
// (localStorage on the web, a map in tests), so they can be tested without a browser.

export type KeyValueStore = {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
  keys(): string[];
};

export type ServerDraftRef = { id: string; version: number; number: string };

export type DeviceDraft<V = unknown> = {
  localId: string;
  userId: string;
  // The draft on Spanrelay this copy belongs to, once one has been saved.
  server: ServerDraftRef | null;
  values: V;
  step: string;
  // Files picked but not yet stored. The files themselves cannot be kept on the device, so after
  // a reload the person is asked to pick these again by name.
  fileNames: string[];
  // Saving was asked for while the connection was down: send it as soon as it returns.
  queued: boolean;
  // Why the last send was refused by the server (not a lost connection); it is not retried.
  refused: string | null;
  updatedAt: string;
};

const prefix = 'spanrelay.draft.v1.';

export const draftKey = (userId: string, localId: string) => `${prefix}${userId}.${localId}`;

export function newLocalId(now: number = Date.now(), random: () => number = Math.random): string {
  return `${now.toString(36)}-${Math.floor(random() * 36 ** 6).toString(36).padStart(6, '0')}`;
}

function parse(raw: string | null, userId: string): DeviceDraft | null {
  if (!raw) return null;
  try {
    const d = JSON.parse(raw) as Partial<DeviceDraft>;
    if (typeof d.localId !== 'string' || d.userId !== userId || typeof d.updatedAt !== 'string' || d.values === null || typeof d.values !== 'object') return null;
    return {
      localId: d.localId,
      userId,
      server: d.server && typeof d.server.id === 'string' && typeof d.server.version === 'number' ? d.server : null,
      values: d.values,
      step: typeof d.step === 'string' ? d.step : '',
      fileNames: Array.isArray(d.fileNames) ? d.fileNames.filter((n): n is string => typeof n === 'string') : [],
      queued: d.queued === true,
      refused: typeof d.refused === 'string' ? d.refused : null,
      updatedAt: d.updatedAt,
    };
  } catch {
    return null;
  }
}

export function readDraft<V>(store: KeyValueStore, userId: string, localId: string): DeviceDraft<V> | null {
  return parse(store.getItem(draftKey(userId, localId)), userId) as DeviceDraft<V> | null;
}

/** This person's drafts on the device, the most recently changed first. Another person's are never listed. */
export function listDrafts<V>(store: KeyValueStore, userId: string): DeviceDraft<V>[] {
  const own = `${prefix}${userId}.`;
  return store
    .keys()
    .filter((k) => k.startsWith(own))
    .map((k) => parse(store.getItem(k), userId))
    .filter((d): d is DeviceDraft => d !== null)
    .sort((a, b) => b.updatedAt.localeCompare(a.updatedAt)) as DeviceDraft<V>[];
}

/** False when the device refused to keep it (storage full or switched off). */
export function keepDraft(store: KeyValueStore, draft: DeviceDraft): boolean {
  try {
    store.setItem(draftKey(draft.userId, draft.localId), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

export function removeDraft(store: KeyValueStore, userId: string, localId: string) {
  store.removeItem(draftKey(userId, localId));
}

/**
 * Changes one kept draft in a single read and write, so a change made elsewhere in between (the
 * queue being sent while the person types) is not overwritten by an older copy.
 */
export function patchDraft<V>(
  store: KeyValueStore,
  userId: string,
  localId: string,
  change: (current: DeviceDraft<V> | null) => DeviceDraft<V> | null,
): DeviceDraft<V> | null {
  const next = change(readDraft<V>(store, userId, localId));
  if (next) keepDraft(store, next);
  return next;
}

export function queuedDrafts<V>(store: KeyValueStore, userId: string): DeviceDraft<V>[] {
  return listDrafts<V>(store, userId).filter((d) => d.queued);
}

export type SendOutcome = { localId: string; server: ServerDraftRef } | { localId: string; refused: string } | { localId: string; offline: true };

/**
 * Sends every queued draft of this person, oldest first. A lost connection stops the round and
 * leaves the rest queued; a refusal is recorded on that draft and the others still go.
 * `isOffline` tells a lost connection from a refusal.
 */
export async function sendQueued<V>(
  store: KeyValueStore,
  userId: string,
  send: (draft: DeviceDraft<V>) => Promise<ServerDraftRef>,
  isOffline: (err: unknown) => boolean,
  now: () => string = () => new Date().toISOString(),
): Promise<SendOutcome[]> {
  const outcomes: SendOutcome[] = [];
  for (const draft of queuedDrafts<V>(store, userId).reverse()) {
    try {
      const server = await send(draft);
      patchDraft<V>(store, userId, draft.localId, (current) => (current ? { ...current, server, queued: false, refused: null, updatedAt: now() } : null));
      outcomes.push({ localId: draft.localId, server });
    } catch (err) {
      if (isOffline(err)) {
        outcomes.push({ localId: draft.localId, offline: true });
        break;
      }
      const refused = err instanceof Error ? err.message : String(err);
      patchDraft<V>(store, userId, draft.localId, (current) => (current ? { ...current, queued: false, refused } : null));
      outcomes.push({ localId: draft.localId, refused });
    }
  }
  return outcomes;
}
