// `heed analyze` options are bounded: a huge --boot would keep the machine busy for days.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MAX_BOOT, parseAnalyzeArgs } from '../../../src/cli/analyze';
import { SAMPLE_CSV } from '../io/read-log-sample';

describe('heed analyze option bounds', () => {
  it('refuses --boot over 100,000 and a --seed that is not a safe whole number', () => {
    expect(MAX_BOOT).toBe(100_000);
    expect(() => parseAnalyzeArgs(['r.csv', '--boot', '1000000000'])).toThrow('--boot must be at most 100,000, got 1000000000');
    expect(() => parseAnalyzeArgs(['r.csv', '--seed', '99999999999999999999'])).toThrow(/--seed needs a whole number/);
    expect(parseAnalyzeArgs(['r.csv', '--boot', '100000']).boot).toBe(100_000);
  });
});

describe('heed analyze on a file that is not UTF-8', () => {
  it('exits 2 naming the file and the line of the first bad byte', () => {
    const path = join(mkdtempSync(join(tmpdir(), 'heed-latin1-')), 'reads.csv');
    const bytes = new TextEncoder().encode(SAMPLE_CSV.replace('Veyra', 'Veyr\u00e0'));
    const at = bytes.indexOf(0xc3);
    // U+00E0 is C3 A0 in UTF-8 and the single byte E0 in Latin-1
    const latin1 = new Uint8Array(bytes.length - 1);
    latin1.set(bytes.subarray(0, at));
    latin1[at] = 0xe0;
    latin1.set(bytes.subarray(at + 2), at + 1);
    writeFileSync(path, latin1);
    const r = spawnSync(process.execPath, ['bin/heed.js', 'analyze', path], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr.trim()).toBe(`heed: ${path}:3: the file is not UTF-8 text (first bad byte on this line); save it as UTF-8 CSV`);
  });
});
