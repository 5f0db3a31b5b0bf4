// Each reliability file adds its tally here; the test command prints them as one table at the end
// (docker-free-scripts/reliability-report.mjs). "Lost" counts what the product lost or doubled:
// a step, an e-mail, a file, a trail entry. It must be 0.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { artifactsDir } from '../support/testSettings';

export type ReliabilityTally = { category: string; cases: number; failures: number; lost: number; note?: string };

export function recordReliability(tally: ReliabilityTally): void {
  const dir = join(artifactsDir(), 'reliability');
  mkdirSync(dir, { recursive: true });
  const file = tally.category.toLowerCase().replace(/[^a-z0-9]+/g, '-');
  writeFileSync(join(dir, `${file}.json`), JSON.stringify(tally, null, 2));
}
