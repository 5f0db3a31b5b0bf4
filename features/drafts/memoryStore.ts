// A key-value store held in memory: what stands in for the device's storage where there is none,
// and what the tests use. Free of browser types, so server-side checks can read it.
import type { KeyValueStore } from './deviceDrafts';

export function memoryStore(): KeyValueStore {
  const map = new Map<string, string>();
  return {
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => void map.set(k, v),
    removeItem: (k) => void map.delete(k),
    keys: () => [...map.keys()],
  };
}
