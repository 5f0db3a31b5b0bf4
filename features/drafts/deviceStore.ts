// The device's store for kept drafts: localStorage on the web. Where there is none (private
// modes that refuse it, or native) a map stands in, so the form still works for this visit.
import type { KeyValueStore } from './deviceDrafts';
import { memoryStore } from './memoryStore';

function browserStore(): KeyValueStore | null {
  try {
    const ls = typeof window !== 'undefined' ? window.localStorage : undefined;
    if (!ls) return null;
    const probe = 'spanrelay.probe';
    ls.setItem(probe, '1');
    ls.removeItem(probe);
    return {
      getItem: (k) => ls.getItem(k),
      setItem: (k, v) => ls.setItem(k, v),
      removeItem: (k) => ls.removeItem(k),
      keys: () => Array.from({ length: ls.length }, (_, i) => ls.key(i)).filter((k): k is string => k !== null),
    };
  } catch {
    return null;
  }
}

let store: KeyValueStore | null = null;

export function deviceStore(): KeyValueStore {
  store ??= browserStore() ?? memoryStore();
  return store;
}
