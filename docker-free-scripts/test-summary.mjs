// Totals the vitest JSON reports into the one closing line CI reads: "N passed, N failed".
// A suite whose report is missing counts as failed, so a crash cannot pass for green.
import { readFileSync } from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of process.argv.slice(2)) {
  try {
    const report = JSON.parse(readFileSync(file, 'utf8'));
    passed += report.numPassedTests;
    failed += report.numFailedTests;
    skipped += report.numPendingTests + (report.numTodoTests ?? 0);
    // A file whose setup failed has no failed test in it, only skipped ones, but it did fail.
    failed += report.testResults.filter((r) => r.status === 'failed' && !r.assertionResults.some((a) => a.status === 'failed')).length;
  } catch {
    console.error(`missing or unreadable test report: ${file}`);
    failed += 1;
  }
}
// The type check is not a vitest suite but a failed one must show in the total.
if (process.env.TYPECHECK_FAILED === '1') failed += 1;
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
