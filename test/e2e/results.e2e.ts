/**
 * The coordinator's results page (issue 7, part 2), as a new user meets it: three readers read a
 * sequential crossover with planted errors and a caution notice; the Results button sits in the
 * study's header; every figure on the page equals `heed analyze --json` on the exported log and
 * every number of that JSON is on the page; the too-small design is warned about; axe-core finds
 * no serious or critical violation; at 1280 px nothing scrolls sideways; a plot saves as SVG and
 * PNG; the seed applies while typing, without leaving the field.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { writeCaseFolder } from './support/case-folder';
import { useChromiumProfile, type RunningChromium } from './support/chromium';
import { homePage, readingPage, studyPage } from './support/pages';
import { compareWithCli, missingFromPage, shownFigures } from './support/results-check';
import { plotStyle, watchPolicyViolations } from './support/style-policy';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');
const READERS = ['R1', 'R2', 'R3'];

const readWholePeriod = async (chrome: RunningChromium, offset: number) => {
  const reading = readingPage(chrome.page);
  let steps = 0;
  while (!(await reading.isDone())) {
    const k = steps + offset;
    await reading.answerByKeys(((k * 7) % 3 === 0 ? 1 : 0), 1 + ((k * 5) % 9));
    steps++;
  }
  await chrome.page.getByRole('button', { name: 'Done: hand back the workstation' }).click();
  await chrome.page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
};

const cliJson = (logFile: string, seed: number): unknown =>
  JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'analyze', logFile, '--json', '--seed', String(seed), '--boot', '1000'], { encoding: 'utf8' }));

const noSideways = (page: Page) => page.evaluate(() => {
  const s = document.scrollingElement as Element;
  return { scrollWidth: s.scrollWidth, clientWidth: s.clientWidth };
});

const download = async (page: Page, button: string): Promise<Buffer> => {
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: button }).click()]);
  return readFileSync(await file.path());
};

describe('results page: pictures and plain words, the same numbers as heed analyze', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('shows every figure of the CLI, warns about the small design, passes axe, fits 1280 px, and saves plots', async () => {
    mkdirSync(SHOTS, { recursive: true });
    const folder = writeCaseFolder(12, 1);
    const chrome = await browser.launch();
    const { page } = chrome;
    const policy = watchPolicyViolations(page);
    await page.setViewportSize({ width: 1280, height: 900 });
    await homePage(page).waitUntilReady();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await chooser.setFiles(folder.dir);
    await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
    await homePage(page).newStudy({
      name: 'Quayside sequential', caseSet: folder.name, findings: ['mass'], aidedMode: 'sequential', washoutDays: 0,
      plantedFalsePositive: 2, plantedFalseNegative: 2, caution: 'with a random half of aided reads',
    });
    const study = studyPage(page);
    for (const code of READERS) { await study.enrol(code); await study.enrolled(code); }
    let offset = 0;
    for (const period of [1, 2]) {
      for (const code of READERS) {
        const painted = await study.startPeriod(code, period);
        await readingPage(page).waitForCase(painted);
        await readWholePeriod(chrome, offset);
        offset += 5;
      }
    }
    await page.getByRole('heading', { name: 'Readers', exact: true }).waitFor();
    const logFile = join(mkdtempSync(join(tmpdir(), 'heed-e2e-results-')), 'reads.csv');
    writeFileSync(logFile, await study.exportText(/Save read log/));

    // the Results button is in the study's header, not inside the Export panel
    expect(await page.locator('header.page-head').getByRole('button', { name: 'Results', exact: true }).count()).toBe(1);
    expect(await page.getByRole('region', { name: 'Export' }).getByRole('button', { name: 'Results', exact: true }).count()).toBe(0);
    await page.locator('header.page-head').getByRole('button', { name: 'Results', exact: true }).click();
    await page.getByRole('heading', { name: 'Finding: mass' }).waitFor({ timeout: 60_000 });
    await page.screenshot({ path: join(SHOTS, 'results-1280.png') });

    // plain words first, and the small design said in words
    expect(await page.getByLabel('In short, mass').textContent()).toMatch(/3 readers read 12 cases/);
    expect(await page.getByRole('note').filter({ hasText: 'Only 3 readers' }).count()).toBe(1);
    expect(await page.getByText('These readers, other cases:').count()).toBe(1);

    // nothing scrolls sideways at 1280 px, before and after every disclosure is opened
    let width = await noSideways(page);
    expect(width.scrollWidth).toBeLessThanOrEqual(width.clientWidth);
    const cli = cliJson(logFile, 1);
    const shown = await shownFigures(page);
    const { problems, compared } = compareWithCli(shown, cli);
    expect(problems).toEqual([]);
    expect(compared).toBeGreaterThan(300);
    expect(missingFromPage(cli, shown)).toEqual([]);
    expect(shown.some((f) => f.path.endsWith('.sequential.rair'))).toBe(true);
    width = await noSideways(page);
    expect(width.scrollWidth).toBeLessThanOrEqual(width.clientWidth);

    // accessibility: no serious or critical violation (axe-core 4.14.1 through @axe-core/playwright)
    // legacy mode runs axe in this page only: the default mode opens a second page, which a CDP-attached Chromium does not give
    const axe = await new AxeBuilder({ page }).setLegacyMode(true).analyze();
    const bad = axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.nodes.length} nodes`);
    expect(bad).toEqual([]);

    // a plot saves as SVG and as PNG (drawn through a canvas)
    const svg = (await download(page, 'Save “Reader-averaged ROC curves, mass” as SVG')).toString('utf8');
    expect(svg).toMatch(/^<\?xml[^>]*>\s*<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain('AUC');
    const png = await download(page, 'Save “Reader-averaged ROC curves, mass” as PNG');
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.readUInt32BE(16)).toBeGreaterThan(600); // width from the IHDR chunk: drawn at twice the plot's size

    // the seed applies while typing (no blur): the page recomputes with seed 7 and equals the CLI's seed 7
    await page.getByLabel('Bootstrap seed').fill('7');
    await page.locator('main[data-seed="7"]').waitFor({ timeout: 60_000 });
    expect(await page.getByLabel('Bootstrap seed').evaluate((el) => el === document.activeElement)).toBe(true);
    const seven = compareWithCli(await shownFigures(page), cliJson(logFile, 7));
    expect(seven.problems).toEqual([]);

    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.evaluate(() => { for (const d of document.querySelectorAll('details')) d.open = false; window.scrollTo(0, 0); });
    await page.screenshot({ path: join(SHOTS, 'results-1920.png') });

    // The page's policy allows no inline style (scripts/lib/web-policy.mjs): nothing was blocked,
    // and Plot's own CSS still reaches the plots (adopted as a style sheet, src/ui/adopted-styles.ts).
    expect(policy.violations()).toEqual([]);
    expect(await plotStyle(page, '.plot-card svg.heed-plot')).toMatchObject({ display: 'block', maxWidth: '100%', styleElements: 0 });
  }, 480_000);
});
