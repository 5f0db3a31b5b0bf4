// What of the form a draft can keep on the server. A draft may be half filled but what it holds
// must still be right (the server judges it with `requestDraftSchema`), so a box that is empty or
// not yet right is left out of the saved draft; the whole form is kept on the device meanwhile.
import { requestDraftSchema, type RequestDraft } from '../../../shared/requests/requestBody';
import { filingBody } from './filingBody';
import type { FilingFormValues } from './formValues';

type Tree = Record<string, unknown>;

// Drops the value at `path` (stopping at an array: a list is kept or dropped whole). When that
// value is already gone the complaint is about the group holding it, so the group goes instead.
function keysOf(path: readonly PropertyKey[]): string[] {
  const keys: string[] = [];
  for (const p of path) {
    if (typeof p === 'number' || /^\d+$/.test(String(p))) break;
    keys.push(String(p));
  }
  return keys;
}

function drop(body: Tree, keys: string[]): boolean {
  while (keys.length > 0) {
    let holder: Tree | undefined = body;
    for (const k of keys.slice(0, -1)) holder = holder?.[k] !== null && typeof holder?.[k] === 'object' ? (holder[k] as Tree) : undefined;
    const last = keys[keys.length - 1]!;
    if (holder && holder[last] !== undefined) {
      delete holder[last];
      return true;
    }
    keys.pop();
  }
  return false;
}

function removeUndefined(value: unknown): unknown {
  if (Array.isArray(value)) return value;
  if (value === null || typeof value !== 'object') return value;
  const out: Tree = {};
  for (const [k, v] of Object.entries(value as Tree)) if (v !== undefined) out[k] = removeUndefined(v);
  return out;
}

/** The part of the form a server draft can hold, or null while there is no project to save it under. */
export function draftBodyFrom(values: FilingFormValues): RequestDraft | null {
  const body = removeUndefined(filingBody(values)) as Tree;
  // A bounded number of passes: each one removes at least one box or gives up.
  for (let pass = 0; pass < 100; pass++) {
    const parsed = requestDraftSchema.safeParse(body);
    if (parsed.success) return parsed.data;
    const issues = parsed.error.issues;
    if (issues.some((i) => i.path[0] === 'type' || i.path[0] === 'projectId' || i.path.length === 0)) return null;
    // Two complaints about one list (two bad spans) drop it once, not the group around it as well.
    const paths = new Set(issues.map((i) => keysOf(i.path).join('.')));
    let removed = false;
    for (const path of paths) removed = drop(body, path.split('.')) || removed;
    if (!removed) return null;
  }
  return null;
}
