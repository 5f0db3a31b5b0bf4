// Counts a reliability file's cases, failures and losses per category, and records the tally
// (tests/reliability/report.ts) when the file ends, failed cases included.
import { recordReliability } from '../reliability/report';

export function faultTally(category: string) {
  const tally = { category, cases: 0, failures: 0, lost: 0 };
  return {
    // Runs one case; a thrown assertion counts as a failure and is thrown on.
    async attempt(body: () => Promise<void>) {
      tally.cases += 1;
      try {
        await body();
      } catch (err) {
        tally.failures += 1;
        throw err;
      }
    },
    // What the product lost or doubled in a case (mail, files, trail events, answered moves).
    lose(n: number) {
      tally.lost += n;
    },
    record(note?: string) {
      recordReliability({ ...tally, note });
    },
  };
}
