// What changed between two revisions of a request, field by field (dotted paths, arrays whole).
import type { RevisionChange } from './types';

function flatten(value: unknown, prefix: string, out: Map<string, unknown>) {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (value !== undefined) {
    out.set(prefix, value);
  }
}

export function revisionChanges(before: unknown, after: unknown): RevisionChange[] {
  const a = new Map<string, unknown>();
  const b = new Map<string, unknown>();
  flatten(before, '', a);
  flatten(after, '', b);
  const paths = [...new Set([...a.keys(), ...b.keys()])].sort();
  return paths
    .filter((p) => JSON.stringify(a.get(p)) !== JSON.stringify(b.get(p)))
    .map((path) => ({ path, before: a.get(path) ?? null, after: b.get(path) ?? null }));
}
