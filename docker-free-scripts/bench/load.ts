// The HTTP load runs: autocannon on loopback, signed in as the bench people, against the baseline
// (one primary-key read) and the four routes a desk lives on. Every response time is kept, so the
// percentiles are exact (autocannon's own summary has no p95).
import autocannon from 'autocannon';
import type { SeedInfo } from './scale';
import { benchPassword } from './scale';

export type RouteFigures = {
  route: string;
  what: string;
  connections: number;
  requests: number;
  seconds: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  errors: number;
  ratioToBaseline?: number;
  // One connection: the time a request takes when it waits for nothing but itself.
  alone?: { requests: number; p50Ms: number; p95Ms: number };
};

type RouteSpec = {
  route: string;
  what: string;
  cookie: string;
  method?: 'GET' | 'POST';
  // A new path (and body) for each request sent.
  next: () => { path: string; body?: string };
  // A bounded number of requests instead of a duration (each transition uses up one request).
  amount?: number;
};

export async function signIn(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password: benchPassword }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

async function cannon(base: string, spec: RouteSpec, wantedConnections: number, seconds: number, amount?: number): Promise<RouteFigures> {
  // autocannon refuses more connections than requests (a small seed's transition pool).
  const connections = amount ? Math.min(wantedConnections, amount) : wantedConnections;
  const times: number[] = [];
  let non2xx = 0;
  const firstFailures: string[] = [];
  const started = performance.now();
  // Without a callback autocannon answers an event emitter that is also a promise of the result.
  const instance = autocannon({
    url: base,
    connections,
    ...(amount ? { amount } : { duration: seconds }),
    timeout: 10,
    headers: { cookie: spec.cookie, origin: base, 'content-type': 'application/json' },
    requests: [
      {
        method: spec.method ?? 'GET',
        setupRequest: (req) => {
          const { path, body } = spec.next();
          return { ...req, path, ...(body ? { body } : {}) };
        },
        onResponse: (status, body) => {
          if (status >= 300) {
            non2xx += 1;
            if (firstFailures.length < 3) firstFailures.push(`${status} ${body.slice(0, 200)}`);
          }
        },
      },
    ],
  }) as unknown as autocannon.Instance & Promise<autocannon.Result>;
  let lastAnswerAt = started;
  instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => {
    times.push(responseTime);
    lastAnswerAt = performance.now();
  });
  const result = await instance;
  // A bounded run is over at its last answer: autocannon notices it on its one-second tick, so the
  // time to the promise's end came in whole seconds (126 moves read as 62.6, 41.5 or 124.6 per s).
  const elapsed = amount ? (lastAnswerAt - started) / 1000 : result.duration;
  times.sort((a, b) => a - b);
  if (firstFailures.length) console.error(`  ${spec.route}: ${non2xx} answers were not 2xx, e.g. ${firstFailures.join(' | ')}`);
  return {
    route: spec.route,
    what: spec.what,
    connections,
    requests: times.length,
    seconds: Number(elapsed.toFixed(2)),
    requestsPerSecond: Number((times.length / elapsed).toFixed(1)),
    p50Ms: Number(percentile(times, 50).toFixed(1)),
    p95Ms: Number(percentile(times, 95).toFixed(1)),
    p99Ms: Number(percentile(times, 99).toFixed(1)),
    errors: result.errors + result.timeouts + non2xx,
  };
}

const cycle = <T,>(list: T[]) => {
  let i = 0;
  return () => list[i++ % list.length]!;
};

export async function runLoad(base: string, seed: SeedInfo, opts: { connections: number; seconds: number; warmSeconds: number; aloneSeconds: number }): Promise<RouteFigures[]> {
  const [desk, transition, central] = await Promise.all([
    signIn(base, seed.people.deskEngineer),
    signIn(base, seed.people.transitionEngineer),
    signIn(base, seed.people.centralOffice),
  ]);
  const baselineId = cycle(seed.baselineIds);
  const detailId = cycle(seed.detailIds);
  const term = cycle(seed.searchTerms);
  const pool = [...seed.transitionPool];
  const nextMove = () => {
    const r = pool.shift();
    // Past the pool's end a stale move answers 409 and counts as an error: the pool was too small.
    const target = r ?? seed.transitionPool[0]!;
    return { path: `/api/requests/${target.id}/events`, body: JSON.stringify({ type: 'forward', version: target.version, comment: 'Forwarded for routing.' }) };
  };

  const baseline: RouteSpec = { route: 'baseline', what: 'one primary-key read, signed in', cookie: desk, next: () => ({ path: `/api/bench/baseline/${baselineId()}` }) };
  const specs: RouteSpec[] = [
    { route: 'desk list', what: `GET /api/requests?desk=mine&sort=due (section engineer on ${seed.deskProjects} projects)`, cookie: desk, next: () => ({ path: '/api/requests?desk=mine&sort=due' }) },
    { route: 'register search', what: `GET /api/requests?q=… (central office on all ${seed.sizes.projects} projects, ${seed.searchTerms.length} search terms in turn)`, cookie: central, next: () => ({ path: `/api/requests?q=${encodeURIComponent(term())}` }) },
    { route: 'request detail', what: 'GET /api/requests/:id (50 trail events)', cookie: desk, next: () => ({ path: `/api/requests/${detailId()}` }) },
  ];
  const transitionSpec: RouteSpec = { route: 'transition', what: 'POST /api/requests/:id/events forward', cookie: transition, method: 'POST', next: nextMove };

  const { connections, seconds, warmSeconds, aloneSeconds } = opts;
  const figures: RouteFigures[] = [];
  const measure = async (spec: RouteSpec, amount?: number) => {
    process.stderr.write(`  ${spec.route}: warming up … `);
    // A bounded run (transitions) shares its requests out: a warm-up of at most four moves a
    // connection, a hundred alone, the rest under load; each connection builds one more than it sends.
    const warm = amount ? Math.max(1, Math.min(connections * 4, Math.floor(amount / 4))) : undefined;
    const single = amount ? Math.max(1, Math.min(100, Math.floor(amount / 10))) : undefined;
    const loaded = amount ? Math.max(1, amount - warm! - single! - 2 * connections - 2) : undefined;
    await cannon(base, spec, connections, warmSeconds, warm);
    process.stderr.write('measuring … ');
    const f = await cannon(base, spec, connections, seconds, loaded);
    process.stderr.write(`${f.requestsPerSecond} req/s, p95 ${f.p95Ms} ms; alone … `);
    const one = await cannon(base, spec, 1, aloneSeconds, single);
    process.stderr.write(`p95 ${one.p95Ms} ms\n`);
    return { ...f, errors: f.errors + one.errors, alone: { requests: one.requests, p50Ms: one.p50Ms, p95Ms: one.p95Ms } };
  };

  // The baseline before and after the routes: the machine is shared, so the ratio is taken to
  // the mean of both runs.
  const before = await measure(baseline);
  for (const spec of specs) figures.push(await measure(spec));
  figures.push(await measure(transitionSpec, pool.length));
  const after = await measure(baseline);
  const baselineRate = (before.requestsPerSecond + after.requestsPerSecond) / 2;
  const merged: RouteFigures = {
    ...before,
    requests: before.requests + after.requests,
    requestsPerSecond: Number(baselineRate.toFixed(1)),
    p50Ms: Math.max(before.p50Ms, after.p50Ms),
    p95Ms: Math.max(before.p95Ms, after.p95Ms),
    p99Ms: Math.max(before.p99Ms, after.p99Ms),
    errors: before.errors + after.errors,
    alone: after.alone,
    what: `${before.what} (mean of a run before and after the routes: ${before.requestsPerSecond} and ${after.requestsPerSecond} req/s; worst latencies)`,
  };
  return [merged, ...figures].map((f) => ({ ...f, ratioToBaseline: Number((f.requestsPerSecond / baselineRate).toFixed(2)) }));
}
