/**
 * The full design (issue 4), as a coordinator does it: import a folder case set with two
 * findings, plant errors and a random-half caution notice, run a two-period crossover with two
 * readers (washout overridden with a reason), export, and check the log and study.json.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { readWholePeriod } from './support/read-period';
import { homePage, readingPage, studyPage } from './support/pages';
import { compareWithCli, shownFigures } from './support/results-check';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');
const CASES = 24;
const PRACTICE = 2;

describe('design: own case set, planted errors, caution notice, crossover with washout', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('imports, designs, reads two periods with an override, and logs exactly what each reader saw', async () => {
    const folder = writeCaseFolder(CASES, PRACTICE);
    const chrome = await browser.launch();
    const { page } = chrome;
    await homePage(page).waitUntilReady();

    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await chooser.setFiles(folder.dir);
    await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
    expect(await page.getByRole('status').filter({ hasText: 'Imported' }).textContent()).toContain(`${CASES} cases, ${PRACTICE} practice`);
    await page.screenshot({ path: join(SHOTS, 'import.png'), fullPage: true });

    await homePage(page).newStudy({
      name: 'Harbour crossover', caseSet: folder.name, findings: ['mass', 'calcification'], aidedMode: 'concurrent', washoutDays: 14,
      plantedFalsePositive: 3, plantedFalseNegative: 2, caution: 'with a random half of aided reads',
    });
    const study = studyPage(page);
    for (const code of ['H1', 'H2']) { await study.enrol(code); await study.enrolled(code); }
    expect([await study.sequenceOf('H1'), await study.sequenceOf('H2')].sort()).toEqual(['AU', 'UA']);

    const steps: number[] = [];
    for (const code of ['H1', 'H2']) {
      const painted = await study.startPeriod(code, 1);
      await readingPage(page).waitForCase(painted);
      steps.push(await readWholePeriod(chrome));
    }
    // period 2 is behind the 14-day washout: refused, then opened early with a logged reason
    for (const code of ['H1', 'H2']) {
      // Start is disabled with the reason; the coordinator opens the period early instead
      expect(await page.getByRole('button', { name: `Start ${code} period 2` }).isDisabled()).toBe(true);
      const row = page.getByRole('row').filter({ has: page.getByRole('cell', { name: code, exact: true }) });
      expect(await row.textContent()).toMatch(/opens \d{4}-\d\d-\d\d \d\d:\d\d UTC \(washout\)/);
      await page.getByRole('button', { name: `Open ${code} period 2 early` }).click();
      await page.getByRole('group', { name: 'Washout not over' }).waitFor();
      expect(await page.getByRole('group', { name: 'Washout not over' }).textContent()).toMatch(new RegExp(`Period 2 of ${code} is not open yet.*14-day washout`));
      const before = await page.evaluate(() => Number(document.body.getAttribute('data-heed-case-painted') ?? 0));
      await study.openEarly('training block ends this week', 'QO-1');
      await readingPage(page).waitForCase(before);
      steps.push(await readWholePeriod(chrome));
    }
    expect(steps).toEqual(Array(4).fill((CASES + PRACTICE) * 2));
    await page.getByRole('heading', { name: 'Readers', exact: true }).waitFor();
    await page.screenshot({ path: join(SHOTS, 'study-done.png'), fullPage: true });
    expect(await page.getByText('opened early by QO-1: training block ends this week').count()).toBe(2);
    await page.screenshot({ path: join(SHOTS, 'study-done.png'), fullPage: true });

    const log = await study.exportText(/Save read log/);
    const rows = Papa.parse<Record<string, string>>(log, { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(2 * 2 * (CASES + PRACTICE) * 2);
    for (const r of rows) {
      expect(r.sequence).toMatch(/^(UA|AU)$/);
      expect(r.period).toMatch(/^[12]$/);
      expect(r.assistance).toMatch(/^(none|concurrent)$/);
      expect(Number(r.order)).toBeGreaterThan(0);
      expect(r.case_site).toMatch(/^(Quayside|Lighthouse)$/);
      if (r.assistance === 'none') expect([r.ai_call, r.ai_planted, r.caution_shown]).toEqual(['', '0', '0']);
    }
    const aidedMain = rows.filter((r) => r.assistance === 'concurrent' && r.practice === '0');
    for (const reader of ['H1', 'H2']) {
      for (const finding of ['mass', 'calcification']) {
        const mine = aidedMain.filter((r) => r.reader_id === reader && r.finding === finding);
        expect(mine).toHaveLength(CASES);
        const planted = mine.filter((r) => r.ai_planted === '1');
        expect(planted).toHaveLength(5); // 3 false-positive + 2 false-negative, per finding
        expect(planted.filter((r) => r.ai_call === '1' && r.truth === '0')).toHaveLength(3);
        expect(planted.filter((r) => r.ai_call === '0' && r.truth === '1')).toHaveLength(2);
        expect(mine.filter((r) => r.caution_shown === '1')).toHaveLength(CASES / 2); // a random half of the aided main cases
      }
      // each case's notice is the same for both findings: it belongs to the case on screen
      const byCase = new Map<string, Set<string>>();
      for (const r of aidedMain.filter((x) => x.reader_id === reader)) byCase.set(r.case_id ?? '', (byCase.get(r.case_id ?? '') ?? new Set()).add(r.caution_shown ?? ''));
      expect([...byCase.values()].every((s) => s.size === 1)).toBe(true);
    }
    expect(rows.filter((r) => r.practice === '1' && r.ai_planted === '1')).toHaveLength(0);

    // The results screen gives the same numbers as `heed analyze --json` on the exported log.
    const logFile = join(mkdtempSync(join(tmpdir(), 'heed-e2e-log-')), 'reads.csv');
    writeFileSync(logFile, log);
    const cli = JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'analyze', logFile, '--json', '--seed', '1', '--boot', '1000'], { encoding: 'utf8' })) as unknown;
    await page.getByRole('button', { name: 'Results' }).click();
    await page.getByRole('heading', { name: 'Finding: mass' }).waitFor({ timeout: 60_000 });
    await page.screenshot({ path: join(SHOTS, 'results.png'), fullPage: true });
    const { problems, compared } = compareWithCli(await shownFigures(page), cli);
    expect(problems).toEqual([]);
    expect(compared).toBeGreaterThan(400);
    await page.getByRole('button', { name: '← Study' }).click();
    await page.getByRole('heading', { name: 'Readers', exact: true }).waitFor();

    const studyFile = JSON.parse(await study.exportText(/Save design record/)) as { design: { seed: number; planted: unknown }; planted: unknown[] };
    expect(studyFile.planted).toHaveLength(10);
    expect(typeof studyFile.design.seed).toBe('number');
  });
});
