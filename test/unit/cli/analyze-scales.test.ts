// `heed analyze` on an external five-point rating log with no suggestion: the note in JSON and in
// the table, and --include-withdrawn. The command is run as a user runs it.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { READ_LOG_COLUMNS, READ_LOG_OPTIONAL_COLUMNS } from '../../../src/core/read-log';

const dir = mkdtempSync(join(tmpdir(), 'heed-analyze-scales-'));
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, ['bin/heed.js', 'analyze', ...args], { encoding: 'utf8', cwd: process.cwd() });
  return { code: r.status, out: r.stdout, err: r.stderr };
};

// Two readers rate four cases (two positive) on five points; R2 is withdrawn.
// R1 positives 5, 3; negatives 3, 1 → pairs: 5>3, 5>1, 3=3 (½), 3>1 → 3.5/4 = 0.875 (by hand)
const rows: [string, string, number, number, number][] = [
  ['R1', 'C1', 1, 5, 0], ['R1', 'C2', 1, 3, 0], ['R1', 'C3', 0, 3, 0], ['R1', 'C4', 0, 1, 0],
  ['R2', 'C1', 1, 2, 1], ['R2', 'C2', 1, 2, 1], ['R2', 'C3', 0, 4, 1], ['R2', 'C4', 0, 5, 1],
];
const csv = [
  [...READ_LOG_COLUMNS, ...READ_LOG_OPTIONAL_COLUMNS].join(','),
  ...rows.map(([reader, c, truth, rating, withdrawn], i) => [
    'EXT', reader, '', '', '', '1', 'none', c, 'lesion', '0', String(i % 4 + 1), String(truth), '', '', '0', '0', '', '', '',
    rating >= 4 ? '1' : '0', '', '1000', '2026-01-01T00:00:00Z', 'five-point', '', String(rating), '0', String(withdrawn),
  ].join(',')),
].join('\n');
const file = join(dir, 'external.csv');
writeFileSync(file, `${csv}\n`);

describe('heed analyze on an external rating log', () => {
  it('gives the AUC of the ratings, null reliance sections and a note; withdrawn reads left out', () => {
    const r = heed(file, '--json', '--boot', '0');
    expect(r.err).toBe('');
    const report = JSON.parse(r.out);
    expect(report.readers.map((x: { reader_id: string }) => x.reader_id)).toEqual(['R1']);
    expect(report.readers[0].unaided.auc.estimate).toBeCloseTo(0.875, 12);
    expect(report.readers[0].unaided.brier).toBeNull();
    expect(report.readers[0].aided).toBeNull();
    expect(report.group.withdrawn_excluded).toBe(4);
    expect(report.group.note).toMatch(/reliance sections are null/);
  });
  it('keeps withdrawn readers with --include-withdrawn and says so in the table', () => {
    const r = heed(file, '--boot', '0', '--include-withdrawn');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/reader R2/);
    expect(r.out).toMatch(/Reads of withdrawn readers are included/);
    expect(r.out).toMatch(/^Note: No suggestion was shown in this log/m);
  });
});
