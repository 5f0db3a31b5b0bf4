// Who a session cookie belongs to, remembered for a few seconds. Asking better-auth costs two
// queries and a signature check on every API call, which at agency load was most of what a list
// or a detail read cost; with this, a person clicking through the app is looked up about once per
// `sessionCacheMs` instead.
//
// What keeps it correct in one server process:
// - The key is the session cookie's whole signed value, so only a value better-auth has verified
//   can ever be answered from here.
// - An entry never outlives the session's own expiry, nor `sessionCacheMs`.
// - Everything in this process that ends a session or changes a person (sign-out, password reset
//   and every other better-auth call that can, an administrator's change of role or organization,
//   an account brought up to date) calls `forgetSessionsOf` or `forgetAllSessions` once its change
//   is written, so the very next request asks the database again.
// - A lookup that was already running when something was forgotten is not stored: it may have read
//   the row as it was before the change.
// What it does not cover: a change written by another process (a second server, SQL by hand) is
// seen only after `sessionCacheMs`. A deployment of several server processes would need either
// that delay accepted for sign-out and role changes, or the forgetting broadcast to every process
// (PostgreSQL LISTEN/NOTIFY on the pool would do).

export type SessionPerson = { id: string; name: string; email: string; role: unknown; organization: string | null };
export type FoundSession = { person: SessionPerson; expiresAt: Date };

export const sessionCacheMs = 5_000;
const maxSessions = 5_000;

export type SessionCache = {
  // The person behind `key`, from memory when fresh, otherwise from `lookUp` (one lookup per key
  // at a time; callers arriving meanwhile share it). Null when there is no live session.
  resolve(key: string, lookUp: () => Promise<FoundSession | null>): Promise<SessionPerson | null>;
  forgetPerson(userId: string): void;
  forgetAll(): void;
  size(): number;
};

export function createSessionCache(opts: { ttlMs?: number; maxEntries?: number; now?: () => number } = {}): SessionCache {
  const ttlMs = opts.ttlMs ?? sessionCacheMs;
  const maxEntries = opts.maxEntries ?? maxSessions;
  const now = opts.now ?? Date.now;
  const entries = new Map<string, { person: SessionPerson; until: number }>();
  const running = new Map<string, Promise<SessionPerson | null>>();
  // Bumped by every forgetting; a lookup stores its answer only if none happened while it ran.
  let generation = 0;

  const store = (key: string, found: FoundSession) => {
    const until = Math.min(now() + ttlMs, found.expiresAt.getTime());
    if (!(until > now())) return;
    entries.delete(key);
    // Oldest first out: a Map iterates in insertion order.
    while (entries.size >= maxEntries) entries.delete(entries.keys().next().value!);
    entries.set(key, { person: found.person, until });
  };

  const forget = (which: (person: SessionPerson) => boolean) => {
    generation += 1;
    running.clear();
    for (const [key, entry] of entries) if (which(entry.person)) entries.delete(key);
  };

  return {
    resolve(key, lookUp) {
      const hit = entries.get(key);
      if (hit && hit.until > now()) return Promise.resolve(hit.person);
      if (hit) entries.delete(key);
      const pending = running.get(key);
      if (pending) return pending;
      const startedIn = generation;
      const lookup: Promise<SessionPerson | null> = lookUp()
        .then((found) => {
          if (found && generation === startedIn) store(key, found);
          return found?.person ?? null;
        })
        .finally(() => {
          if (running.get(key) === lookup) running.delete(key);
        });
      running.set(key, lookup);
      return lookup;
    },
    forgetPerson(userId) {
      forget((person) => person.id === userId);
    },
    forgetAll() {
      forget(() => true);
    },
    size: () => entries.size,
  };
}

// The process's own cache, shared by every app this process builds (tests build several; their
// session tokens never collide, and forgetting too much only costs a lookup).
export const sessionCache = createSessionCache();

// Call after the change is written (after commit when inside a transaction).
export function forgetSessionsOf(userId: string): void {
  sessionCache.forgetPerson(userId);
}

export function forgetAllSessions(): void {
  sessionCache.forgetAll();
}
