// Prints the reliability suite's table (tests/reliability/report.ts writes one JSON file per
// category): cases tried, failures, and what was lost, which must be 0.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const dir = join(process.argv[2] ?? 'tests/.artifacts', 'reliability');
if (!existsSync(dir)) {
  console.log('reliability: no tallies were written');
  process.exit(0);
}
const rows = readdirSync(dir)
  .filter((f) => f.endsWith('.json'))
  .map((f) => JSON.parse(readFileSync(join(dir, f), 'utf8')))
  .sort((a, b) => a.category.localeCompare(b.category));
const width = Math.max(8, ...rows.map((r) => r.category.length));
const line = (c, n, f, l, note = '') => `${String(c).padEnd(width)}  ${String(n).padStart(6)}  ${String(f).padStart(8)}  ${String(l).padStart(4)}  ${note}`;
console.log('\nReliability');
console.log(line('category', 'cases', 'failures', 'lost', 'note'));
for (const r of rows) console.log(line(r.category, r.cases, r.failures, r.lost, r.note ?? ''));
const total = rows.reduce((t, r) => ({ cases: t.cases + r.cases, failures: t.failures + r.failures, lost: t.lost + r.lost }), { cases: 0, failures: 0, lost: 0 });
console.log(line('total', total.cases, total.failures, total.lost));
