// `heed demo --out DIR` end to end: writes cases.csv and images/, prints a summary, and the
// written folder passes `heed check-cases`.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

let root: string;
beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'heed-demo-'));
});
afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

const heed = (...args: string[]) => {
  const run = spawnSync(process.execPath, ['bin/heed.js', ...args], { encoding: 'utf8', timeout: 120_000 });
  return { code: run.status, out: run.stdout, err: run.stderr };
};

describe('heed demo', () => {
  it('writes the set and prints cases, prevalence and detector accuracy per scanner', () => {
    const out = join(root, 'set');
    const run = heed('demo', '--out', out, '--cases', '20');
    expect(run.err).toBe('');
    expect(run.code).toBe(0);
    expect(readFileSync(join(out, 'cases.csv'), 'utf8').split('\n')[0]).toBe(
      'case_id,finding,truth,image,model_score,model_call,practice,case_scanner,case_contrast_band',
    );
    expect(readdirSync(join(out, 'images'))).toHaveLength(25);
    expect(run.out).toMatch(/20 cases and 5 practice cases, 25 images/);
    expect(run.out).toMatch(/present in 9 of 20 \(45.0%\)/);
    expect(run.out).toMatch(/Halden: 10 cases; suggestion right in \d+ of 10/);
    expect(run.out).toMatch(/Korvik: 10 cases; suggestion right in \d+ of 10/);
    expect(run.out).toMatch(/not patient data/);
    const check = heed('check-cases', out);
    expect(check.code).toBe(0);
  }, 120_000);

  it('exits 2 on a bad option, writing nothing', () => {
    const out = join(root, 'never');
    const run = heed('demo', '--out', out, '--cases', 'many');
    expect(run.code).toBe(2);
    expect(run.err.trim()).toBe('heed: --cases must be a whole number, got "many"');
    expect(existsSync(out)).toBe(false);
    expect(heed('demo', '--colour', 'red').err).toMatch(/unknown option --colour/);
  });
});
