// Writes the golden reports (one JSON file per log of golden-logs.ts) from the engine as it is.
// Run only when a change of numbers is intended and explained:
//   npx tsx test/unit/analysis/golden/make-goldens.ts
// The committed goldens were written by the engine before the column-wise rewrite (issue 10).
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyzeReads } from '../../../../src/analysis/engine';
import { goldenLogs } from './golden-logs';

for (const log of goldenLogs()) {
  const report = analyzeReads(log.rows, log.options);
  writeFileSync(join(import.meta.dirname, `${log.name}.json`), `${JSON.stringify(report)}\n`);
  console.log(`${log.name}: ${log.rows.length} rows, ${report.readers.length} reader entries`);
}
