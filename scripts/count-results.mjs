// Sums Vitest JSON reports into the one closing line CI reads: "N passed, N failed".
// A stage that failed before writing its report (typecheck, lint, a crash) counts as one failure,
// so a red `npm test` can never print "0 failed".
import { existsSync, readFileSync } from 'node:fs';

const args = process.argv.slice(2);
const status = Number(args.pop());
let passed = 0;
let failed = 0;
let skipped = 0;
let missing = 0;
for (const file of args) {
  if (!existsSync(file)) { missing += 1; continue; }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  passed += report.numPassedTests ?? 0;
  failed += (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0);
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
}
if (status !== 0 && failed === 0) failed = Math.max(1, missing);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
