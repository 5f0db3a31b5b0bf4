// The measuring half of `npm run bench` (run.sh starts the services and seeds first): HTTP load,
// the web app, the engineering core; the figures go to .data/bench/results.json (git-ignored) and a
// table on the terminal. It reports; it never fails on a missed target.
import { execFileSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { runLoad, signIn, type RouteFigures } from './load';
import { resultsPath, seedInfoPath, type SeedInfo } from './scale';
import { bundleFigures, firstDeskFigures, type WebFigures } from './web';

const root = join(__dirname, '..', '..');
const base = process.env.BENCH_URL ?? 'http://127.0.0.1:56636';
const connections = Number(process.env.BENCH_CONNECTIONS ?? 32);
const seconds = Number(process.env.BENCH_SECONDS ?? 10);

// The targets, at 32 connections on the 2-core machine.
const targets: Record<string, { p95Ms?: number; ratio?: number; errors?: number }> = {
  'desk list': { p95Ms: 30, ratio: 0.4 },
  'register search': { p95Ms: 60 },
  'request detail': { p95Ms: 40 },
  transition: { p95Ms: 80, errors: 0 },
};
const webTargets = { initialGzipKb: 600, firstDeskMs: 1500 };

type EngineeringFigure = { name: string; medianMs: number; p95Ms: number };

function engineering(): { figures: EngineeringFigure[]; output: string } {
  const output = execFileSync(join(root, 'node_modules', '.bin', 'tsx'), [join(root, 'docker-free-scripts', 'bench-engineering.ts')], { cwd: root, encoding: 'utf8' });
  const figures = [...output.matchAll(/^(.+?): median ([\d.]+) ms, p95 ([\d.]+) ms/gm)].map((m) => ({ name: m[1]!, medianMs: Number(m[2]), p95Ms: Number(m[3]) }));
  return { figures, output };
}

const pad = (s: string | number, n: number) => String(s).padEnd(n);
const lpad = (s: string | number, n: number) => String(s).padStart(n);

function verdict(f: RouteFigures): string {
  const t = targets[f.route];
  if (!t) return '';
  const missed: string[] = [];
  if (t.p95Ms !== undefined && f.p95Ms > t.p95Ms) missed.push(`p95>${t.p95Ms}`);
  if (t.ratio !== undefined && (f.ratioToBaseline ?? 0) < t.ratio) missed.push(`ratio<${t.ratio}`);
  if (t.errors !== undefined && f.errors > t.errors) missed.push('errors');
  return missed.length ? `MISSED ${missed.join(', ')}` : 'met';
}

function printTable(seed: SeedInfo, routes: RouteFigures[], web: WebFigures, eng: EngineeringFigure[], load: number[]) {
  const lines: string[] = [];
  lines.push('');
  lines.push(`Spanrelay benchmark: ${seed.sizes.requests.toLocaleString('en-US')} requests, ${seed.sizes.projects.toLocaleString('en-US')} projects, ${seed.sizes.trailEvents.toLocaleString('en-US')} trail events (seeded in ${seed.seconds.toFixed(1)} s); ${connections} connections; load average ${load.map((l) => l.toFixed(2)).join(' ')}`);
  lines.push(`${pad('route', 16)}${lpad('req/s', 9)}${lpad('p50 ms', 9)}${lpad('p95 ms', 9)}${lpad('p99 ms', 9)}${lpad('errors', 8)}${lpad('x base', 8)}${lpad('alone p50/p95', 15)}  target (at ${connections} connections)`);
  for (const f of routes) {
    const alone = f.alone ? `${f.alone.p50Ms}/${f.alone.p95Ms}` : '';
    lines.push(`${pad(f.route, 16)}${lpad(f.requestsPerSecond, 9)}${lpad(f.p50Ms, 9)}${lpad(f.p95Ms, 9)}${lpad(f.p99Ms, 9)}${lpad(f.errors, 8)}${lpad(f.ratioToBaseline?.toFixed(2) ?? '', 8)}${lpad(alone, 15)}  ${verdict(f)}`);
  }
  lines.push('"alone": the same route at one connection, the time a request takes when it queues behind no other.');
  // A closed loop: each connection sends its next request when the last is answered, so the mean
  // latency is connections ÷ throughput (Little's law) and a p95 target is a throughput target.
  const needs = Object.entries(targets)
    .filter(([, t]) => t.p95Ms !== undefined)
    .map(([route, t]) => `${route} p95 ≤ ${t.p95Ms} ms needs more than ${Math.round((connections * 1000) / t.p95Ms!)} req/s`);
  lines.push(`at ${connections} connections the mean latency is ${connections} ÷ throughput, so: ${needs.join('; ')}`);
  const js = web.initialJs;
  lines.push(`web: initial JS ${js.rawKb} KB raw, ${js.gzipKb} KB gzip (${js.gzipKb <= webTargets.initialGzipKb ? 'met' : 'MISSED'} ≤ ${webTargets.initialGzipKb}); all JS ${web.allJs.rawKb} KB raw, ${web.allJs.gzipKb} KB gzip in ${web.allJs.files} files`);
  lines.push(`web: first desk list rendered, median of ${web.firstDesk.loadsMs.length} cold loads ${web.firstDesk.medianMs} ms (${web.firstDesk.loadsMs.join(', ')}) (${web.firstDesk.medianMs <= webTargets.firstDeskMs ? 'met' : 'MISSED'} ≤ ${webTargets.firstDeskMs})`);
  for (const e of eng) lines.push(`engineering: ${e.name}: median ${e.medianMs} ms, p95 ${e.p95Ms} ms`);
  lines.push(`figures written to ${resultsPath}`);
  console.log(lines.join('\n'));
}

async function main() {
  const seed = JSON.parse(readFileSync(seedInfoPath, 'utf8')) as SeedInfo;
  console.log(`load: ${connections} connections, ${seconds} s a route after a warm-up, on ${base}`);
  const routes = await runLoad(base, seed, { connections, seconds, warmSeconds: Math.min(3, seconds), aloneSeconds: Math.min(4, seconds) });

  console.log('web: weighing the export and timing five cold loads in Chromium');
  const dist = process.env.WEB_DIST ?? join(root, 'dist');
  const web: WebFigures = { ...bundleFigures(dist), firstDesk: await firstDeskFigures(base, await signIn(base, seed.people.deskEngineer)) };

  console.log('engineering: docker-free-scripts/bench-engineering.ts');
  const eng = engineering();

  const load = loadavg();
  const results = {
    at: new Date().toISOString(),
    machine: { cores: (await import('node:os')).cpus().length, loadAverage: load },
    seed: { scale: seed.scale, sizes: seed.sizes, seconds: Number(seed.seconds.toFixed(1)) },
    targets: { routes: targets, web: webTargets },
    routes,
    web,
    engineering: eng.figures,
  };
  writeFileSync(resultsPath, `${JSON.stringify(results, null, 2)}\n`);
  printTable(seed, routes, web, eng.figures, load);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
