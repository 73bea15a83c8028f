import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { SAMPLE_CSV, withCell } from '../io/read-log-sample';

// The real command, as a user runs it: node bin/heed.js analyze FILE ...
const dir = mkdtempSync(join(tmpdir(), 'heed-analyze-'));
const write = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
const heed = (...args: string[]) => {
  const r = spawnSync(process.execPath, ['bin/heed.js', 'analyze', ...args], { encoding: 'utf8', cwd: process.cwd() });
  return { code: r.status, out: r.stdout, err: r.stderr };
};

describe('heed analyze', () => {
  const good = write('reads.csv', SAMPLE_CSV);
  it('prints one JSON object with the documented keys (docs/formats.md) and numbers', () => {
    const r = heed(good, '--json', '--boot', '20', '--seed', '9');
    expect(r.code).toBe(0);
    const report = JSON.parse(r.out);
    expect(Object.keys(report)).toEqual(['readers', 'group']);
    const one = report.readers[0];
    expect(one).toMatchObject({ reader_id: 'R1', finding: 'target' });
    // by hand from the sample: unaided C1 (truth 1, call 1) and C2 (truth 0, call 0) are right
    expect(one.unaided.accuracy).toMatchObject({ k: 2, n: 2, estimate: 1 });
    expect(one.unaided.median_ms).toBe(2750);
    // aided: C2 suggestion 1 is wrong (truth 0) and was followed: over-reliance 1/1
    expect(one.aided.overreliance).toMatchObject({ k: 1, n: 1, estimate: 1 });
    expect(one.aided.agreement).toMatchObject({ k: 2, n: 2 });
    expect(one.sequential).toMatchObject({ n: 2, changed: { k: 2 }, toward_ai: { k: 2 }, beneficial: { k: 1 }, detrimental: { k: 1 } });
    expect(one.crossover).toMatchObject({ n: 2, accuracy_difference: -0.5, mcnemar: { b: 1, c: 0, p: 1 } });
    expect(report.group).toMatchObject({ seed: 9, boot: 20, reads: 4 });
    expect(report.group.findings[0].mrmc).toBeNull();
  });
  it('prints a readable table ending with the caution line', () => {
    const r = heed(good, '--boot', '0');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/reader R1 \(radiologist\), finding target/);
    expect(r.out).toMatch(/over-reliance \(of all wrong suggestions\)\s+1\.000 \[0\.207, 1\.000\] \(1\/1\)/);
    // sample, sequential reads of R1: C1 truth 1, first call 0, suggestion 1 (right): a first-wrong read;
    // C2 truth 0, first call 0 (right), suggestion 1 (wrong), final 1: followed it, 1 of 1 first-right reads
    expect(r.out).toMatch(/over-reliance if first right \(1 - RSR\)\s+1\.000 \[0\.207, 1\.000\] \(1\/1\)/);
    expect(r.out).toMatch(/weight of advice, signed\s+mean/);
    expect(r.out).toMatch(/weight of advice, absolute\s+mean/);
    expect(r.out.trim().split('\n').at(-1)).toBe('Heed is a research and training tool, not a medical device; results are for research and training, under local ethics, data-protection and licensed-practice rules.');
  });
  it.each([
    ['bad-bit.csv', withCell(1, 'truth', '2'), ':3: column truth: must be 0 or 1'],
    ['bad-number.csv', withCell(0, 'total_ms', 'abc'), ':2: column total_ms: must be a number'],
    ['bad-score.csv', withCell(2, 'ai_score', '-0.1'), ':4: column ai_score: must be a score in [0,1]'],
    ['bad-confidence.csv', withCell(3, 'initial_confidence', '150'), ':5: column initial_confidence: must be a confidence in 0..100'],
    ['bad-assistance.csv', withCell(0, 'assistance', 'ai'), ':2: column assistance: must be one of none, concurrent, sequential'],
    ['missing-column.csv', SAMPLE_CSV.replace('reader_role,', 'role,'), ':1: column reader_role: required column is missing'],
    ['ragged.csv', SAMPLE_CSV.replace(/,Veyra\n/, '\n'), ':3: column case_scanner: row has 23 fields'],
    ['empty.csv', '', ':1: the file is empty'],
  ])('exits 2 with file, line and column for %s', (name, text, expected) => {
    const path = write(name, text);
    const r = heed(path, '--json');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toContain(`heed: ${path}${expected}`);
  });
  it('names the covariance method of the multi-reader analysis and warns below 4 readers', () => {
    const log = 'test/reference/fixtures/log-noconf.csv'; // 3 readers, fully crossed
    const jk = heed(log, '--boot', '0');
    expect(jk.code).toBe(0);
    expect(jk.out).toMatch(/multi-reader analysis \(Obuchowski-Rockette, jackknife covariances, Hillis df\)/);
    expect(jk.out).toMatch(/warning\s+Only 3 readers:/);
    expect(jk.out).toMatch(/AUC aided, readers averaged\s+\d\.\d{3} \[/);
    const dl = heed(log, '--boot', '0', '--covariance', 'delong', '--json');
    expect(dl.code).toBe(0);
    const report = JSON.parse(dl.out);
    expect(report.group.covariance).toBe('delong');
    expect(report.group.findings[0].mrmc).toMatchObject({ covarianceMethod: 'delong', warning: expect.stringMatching(/^Only 3 readers/) });
    expect(report.group.findings[0].mrmc.treatments).toHaveLength(2);
    expect(heed(log, '--covariance', 'bootstrap').err).toMatch(/--covariance needs jackknife or delong, got "bootstrap"/);
  });
  it('exits 2 on a missing file and on bad arguments', () => {
    expect(heed(join(dir, 'absent.csv')).err).toMatch(/absent\.csv: cannot read the file \(no such file\)/);
    expect(heed(good, '--boot', 'many').code).toBe(2);
    expect(heed(good, '--seed').err).toMatch(/--seed needs a whole number/);
    expect(heed(good, '--colour').err).toMatch(/unknown option --colour/);
    expect(heed().code).toBe(2);
  });
});
