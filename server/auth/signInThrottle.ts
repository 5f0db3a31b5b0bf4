// Failed sign-ins are limited per account and per address, so a password cannot be guessed by
// trying many, from one machine or from many. Successful sign-ins are never slowed. Kept in
// memory: each server process counts its own, which bounds guessing well enough for an agency.
export type SignInThrottle = {
  retryAfterMs(email: string, address: string, now?: number): number;
  recordFailure(email: string, address: string, now?: number): void;
  recordSuccess(email: string): void;
};

export function createSignInThrottle(opts: { perAccount?: number; perAddress?: number; windowMs?: number } = {}): SignInThrottle {
  const perAccount = opts.perAccount ?? 5;
  const perAddress = opts.perAddress ?? 30;
  const windowMs = opts.windowMs ?? 15 * 60 * 1000;
  const failures = new Map<string, number[]>();

  const recent = (key: string, now: number) => {
    const kept = (failures.get(key) ?? []).filter((t) => now - t < windowMs);
    if (kept.length) failures.set(key, kept);
    else failures.delete(key);
    return kept;
  };
  const wait = (times: number[], limit: number, now: number) => (times.length >= limit ? windowMs - (now - times[times.length - limit]!) : 0);

  return {
    retryAfterMs(email, address, now = Date.now()) {
      return Math.max(wait(recent(`account:${email}`, now), perAccount, now), wait(recent(`address:${address}`, now), perAddress, now));
    },
    recordFailure(email, address, now = Date.now()) {
      for (const key of [`account:${email}`, `address:${address}`]) failures.set(key, [...recent(key, now), now]);
    },
    recordSuccess(email) {
      failures.delete(`account:${email}`);
    },
  };
}
