/**
 * The read-log CSV writer alone, in Node: 200,000 simulated reads (50 readers x 2,000 cases x 2
 * periods), with the case attributes shared per case as the store's join gives them.
 * `npx tsx bench/support/csv-writer.ts [module]` times readLogCsv from `module` (default: the current
 * src/io/read-log-export.ts), five rounds, and prints the milliseconds and the output's length.
 */
import type { readLogCsv as ReadLogCsv } from '../../src/io/read-log-export';
import { simulateReadRows } from '../simulate-log';

const modulePath = process.argv[2] ?? '../../src/io/read-log-export';
const { readLogCsv } = (await import(modulePath)) as { readLogCsv: typeof ReadLogCsv };
const rows = simulateReadRows({ seed: 7, readers: 50, cases: 2000 });
// the store's join hands every read of a case the case record's one attributes object
const shared = new Map<string, Record<string, string>>();
for (const row of rows) {
  const attributes = shared.get(row.case_id) ?? row.case_attributes;
  shared.set(row.case_id, attributes);
  row.case_attributes = attributes;
}
const times: number[] = [];
let length = 0;
for (let round = 0; round < 5; round++) {
  const start = performance.now();
  length = readLogCsv(rows, ['scanner']).length;
  times.push(Math.round(performance.now() - start));
}
console.log(JSON.stringify({ module: modulePath, ms: times, length }));
