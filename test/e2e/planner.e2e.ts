/**
 * The dry run on a draft study (issue 11): the panel's figures are those `heed plan --design`
 * prints for the study's exported study.json with the same assumptions and seed (the panel shows
 * that command line).
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { homePage, studyPage } from './support/pages';
import { plotStyle, watchPolicyViolations } from './support/style-policy';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');
mkdirSync(SHOTS, { recursive: true });

type PlanJson = Record<string, Record<string, unknown>>;

const valueAt = (report: PlanJson, path: string): number | null => {
  const [section, key] = path.split('.') as [string, string];
  const v = report[section]?.[key];
  if (v === null || v === undefined) return null;
  if (typeof v === 'number') return v;
  return (v as { rate: number }).rate;
};

describe('planner: the dry-run panel on a draft study', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('shows the figures heed plan gives for the exported study.json', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    const policy = watchPolicyViolations(page);
    await homePage(page).waitUntilReady();
    await page.getByText('Vesper Valley Imaging (demo)').waitFor();
    await homePage(page).newStudy({ name: 'Dry run pilot', aidedMode: 'sequential', plantedFalsePositive: 3, plantedFalseNegative: 3, caution: 'with a random half of aided reads' });

    const panel = page.getByRole('region', { name: /Dry run/ });
    // a long run shows its progress and stops on Cancel, leaving no result
    await panel.getByLabel('Simulated studies').fill('5000');
    await panel.getByRole('button', { name: 'Run dry run' }).click();
    await panel.getByRole('progressbar', { name: 'Dry run progress' }).waitFor();
    await panel.getByRole('button', { name: 'Cancel' }).click();
    await panel.getByRole('progressbar', { name: 'Dry run progress' }).waitFor({ state: 'detached' });
    expect(await page.getByLabel('Dry-run result').count()).toBe(0);
    expect(await panel.getByRole('button', { name: 'Run dry run' }).isEnabled()).toBe(true);

    await panel.getByLabel('Readers', { exact: true }).fill('5');
    await panel.getByLabel('Simulated studies').fill('20');
    await panel.getByRole('button', { name: 'Run dry run' }).click();
    const result = page.getByLabel('Dry-run result');
    await result.waitFor({ timeout: 170_000 });
    await page.screenshot({ path: join(SHOTS, 'dry-run.png'), fullPage: true });
    expect(await result.textContent()).toMatch(/With 5 readers and \d+ wrong suggestions each/);

    const command = (await panel.getByTestId('plan-command').textContent()) ?? '';
    const studyText = await studyPage(page).exportText(/study\.json/);
    const file = join(mkdtempSync(join(tmpdir(), 'heed-e2e-plan-')), 'study.json');
    writeFileSync(file, studyText);
    const args = command.replace(/^heed plan --design \S+/, '').trim().split(/\s+/);
    const cli = JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'plan', '--design', file, ...args, '--json'], { encoding: 'utf8' })) as PlanJson;

    const figures = await page.locator('[data-figure]').evaluateAll((els) => els.map((e) => [e.getAttribute('data-figure') ?? '', e.getAttribute('data-value') ?? ''] as const));
    expect(figures.length).toBe(9);
    for (const [name, shown] of figures) {
      const expected = valueAt(cli, name);
      if (expected === null) expect(shown, name).toBe('');
      else expect(Math.abs(Number(shown) - expected), name).toBeLessThan(1e-12);
    }
    expect(valueAt(cli, 'notice.power')).not.toBeNull(); // the random-half notice is planned too

    // The power curves are drawn under the page's policy (no inline styles): nothing blocked, Plot's CSS applied.
    expect(await page.locator('figure.plot svg.heed-plot').count()).toBeGreaterThan(0);
    expect(await plotStyle(page, 'figure.plot svg.heed-plot')).toMatchObject({ display: 'block', maxWidth: '100%', styleElements: 0 });
    expect(policy.violations()).toEqual([]);
  });
});
