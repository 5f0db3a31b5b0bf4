// JSON with object keys sorted at every level and no whitespace, so the same event always hashes
// the same way, whatever order its keys were written or stored in (jsonb reorders them).
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error('canonical JSON cannot hold NaN or Infinity');
    if (value === undefined) return 'null';
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map((v) => canonicalJson(v === undefined ? null : v)).join(',')}]`;
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export const genesisHash = '0'.repeat(64);

// The fields of a trail event that its hash covers, in the order they are documented.
export type HashedTrailEvent = {
  requestId: string;
  seq: number;
  eventType: string;
  stateBefore: string | null;
  stateAfter: string;
  actorId: string;
  actorRole: string;
  comment: string | null;
  payload: unknown;
  createdAt: string;
};
