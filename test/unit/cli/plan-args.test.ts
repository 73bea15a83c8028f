import { PRESETS } from '../../../src/analysis/planner/assumptions';
import { parsePlanArgs } from '../../../src/cli/plan';

describe('heed plan arguments', () => {
  it('maps each option to its assumption', () => {
    const p = parsePlanArgs(['--readers', '8', '--cases', '120', '--prevalence', '0.3', '--wrong-rate', '0.1', '--overreliance', '0.3', '--overreliance-spread', '0.05',
      '--reference', '0.15', '--auc-unaided', '0.8', '--auc-difference', '0.04', '--sims', '50', '--seed', '9', '--json', '--no-curves']);
    expect(p.assumptions).toMatchObject({ readers: 8, cases: 120, prevalence: 0.3, wrong: { mode: 'rate', value: 0.1 }, overreliance: 0.3, overrelianceSpread: 0.05, reference: 0.15, aucUnaided: 0.8, aucDifference: 0.04, sims: 50, seed: 9 });
    expect(p.json).toBe(true);
    expect(p.curves).toBe(false);
  });

  it('a preset sets the unaided AUC unless --auc-unaided is given', () => {
    expect(parsePlanArgs(['--preset', 'roe-metz-low']).assumptions.aucUnaided).toBe(PRESETS['roe-metz-low'].auc);
    expect(parsePlanArgs(['--preset', 'roe-metz-low', '--auc-unaided', '0.9']).assumptions.aucUnaided).toBe(0.9);
  });

  it('refuses bad input with one message naming the option', () => {
    expect(() => parsePlanArgs(['--readers', 'many'])).toThrow(/--readers needs a number, got "many"/);
    expect(() => parsePlanArgs(['--wrong', '4', '--wrong-rate', '0.1'])).toThrow(/either --wrong K or --wrong-rate r/);
    expect(() => parsePlanArgs(['--preset', 'nope'])).toThrow(/--preset must be one of roe-metz-low/);
    expect(() => parsePlanArgs(['--frobnicate', '1'])).toThrow(/unknown option --frobnicate/);
  });
});

describe('heed plan --design', () => {
  it('names a study file it cannot read or parse', async () => {
    const { runPlanCommand } = await import('../../../src/cli/plan');
    await expect(runPlanCommand(['--design', '/nonexistent/study.json'])).rejects.toThrow(/cannot read \/nonexistent\/study.json/);
    const { mkdtempSync, writeFileSync } = await import('node:fs');
    const { join } = await import('node:path');
    const { tmpdir } = await import('node:os');
    const file = join(mkdtempSync(join(tmpdir(), 'heed-plan-')), 'study.json');
    writeFileSync(file, '{"format": "heed-study",\n "version": 1,,}');
    await expect(runPlanCommand(['--design', file])).rejects.toThrow(/study\.json is not valid JSON at line 2/);
  });
});
