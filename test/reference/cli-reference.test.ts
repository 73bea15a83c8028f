// `heed analyze --json` on a reference log gives the reference values too (docs/methods.md: the app and the
// command-line tool give the same numbers from the same log). Reference values as in
// libraries-conditions.test.ts (R pROC 1.18.0 DeLong SE) and obuchowski-rockette-numpy.test.ts.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { FIXTURES, loadReference, near } from './support/fixtures';

type CliReport = {
  readers: { reader_id: string; finding: string; unaided: { auc: { estimate: number; se: number } } | null }[];
  group: { findings: { finding: string; mrmc: { random: { difference: number; se: number; ddf: number; p: number } } | null }[] };
};

describe('heed analyze --json on log-crossover.csv', () => {
  it('prints the pROC DeLong SEs and the numpy Obuchowski-Rockette result', () => {
    const res = spawnSync(process.execPath, ['bin/heed.js', 'analyze', join(FIXTURES, 'log-crossover.csv'), '--json', '--boot', '0'], { encoding: 'utf8' });
    expect(res.status, res.stderr).toBe(0);
    const out: CliReport = JSON.parse(res.stdout);
    const ref = loadReference('reference-crossover.json');
    for (const want of ref.readers) {
      const got = out.readers.find((r) => r.reader_id === want.reader_id && r.finding === want.finding);
      near(got?.unaided?.auc.se, want.unaided?.auc?.se, 1e-9, `${want.reader_id} unaided AUC se (pROC)`);
    }
    const mrmc = out.group.findings.find((f) => f.finding === 'target')?.mrmc;
    const or = ref.or.target;
    for (const key of ['difference', 'se', 'ddf', 'p'] as const) near(mrmc?.random[key], or?.random[key], 1e-9, `mrmc.random.${key} (numpy)`);
  });
});
