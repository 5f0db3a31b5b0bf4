// The sizes of the benchmark agency and where the seed leaves what the load runs need.
// BENCH_SCALE shrinks everything (0.01 for a quick try of the whole script).
import { join } from 'node:path';

const scale = Math.min(1, Math.max(0.001, Number(process.env.BENCH_SCALE ?? 1) || 1));

export const benchScale = scale;
export const benchSizes = {
  projects: Math.max(4, Math.round(2000 * scale)),
  requests: Math.max(200, Math.round(100_000 * scale)),
  trailEvents: Math.max(2000, Math.round(1_000_000 * scale)),
  // Requests waiting at the transition desk, one forward each; more than one run can use up.
  transitionPool: Math.max(300, Math.round(3000 * scale)),
};

export const benchPassword = 'bench-password-2718';
// run.sh sets BENCH_DIR (a run on other ports keeps its own files).
export const benchDir = process.env.BENCH_DIR ?? join(__dirname, '..', '..', '.data', 'bench');
export const seedInfoPath = join(benchDir, 'seed.json');
export const resultsPath = join(benchDir, 'results.json');

// What the seed hands to the load runs.
export type SeedInfo = {
  scale: number;
  sizes: typeof benchSizes;
  seconds: number;
  people: Record<'deskEngineer' | 'transitionEngineer' | 'centralOffice' | 'auditor', string>;
  deskProjects: number;
  detailIds: string[];
  transitionPool: { id: string; version: number }[];
  searchTerms: string[];
  baselineIds: string[];
};
