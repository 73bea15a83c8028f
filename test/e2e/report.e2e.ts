/**
 * The reader's private report (issue 7, part 1), as a coordinator and readers do it: four
 * readers finish a small crossover study on an imported case set; the coordinator opens one
 * reader's report before and after that reader's last period. Checked: every figure equals
 * `heed analyze --json` on the exported reads.csv for that reader; no other reader's code
 * anywhere; the case review absent while a period is open and present after; the reader sees
 * their report at the end when the study allows it; the PDF has a page that is not blank
 * (rasterised with poppler's pdftoppm); axe-core finds no serious or critical violation.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { compareFigures, type ShownFigure } from '../support/report-figures';
import { useChromiumProfile, type RunningChromium } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { homePage, readingPage, studyPage } from './support/pages';
import { plotStyle, watchPolicyViolations } from './support/style-policy';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');
mkdirSync(SHOTS, { recursive: true });
const work = mkdtempSync(join(tmpdir(), 'heed-e2e-report-'));
const READERS = ['QA1', 'QB2', 'QC3', 'QD4'];
const ME = 'QA1';

/** Reads the open period to its end with a varied, reader-specific pattern. */
const readPeriod = async (chrome: RunningChromium, salt: number) => {
  const reading = readingPage(chrome.page);
  let steps = 0;
  while (!(await reading.isDone())) {
    await reading.answerByKeys((((steps * 5 + salt) % 7) < 3 ? 1 : 0) as 0 | 1, 1 + ((steps + salt) % 9));
    steps++;
  }
  await chrome.page.getByRole('button', { name: 'Done: hand back the workstation' }).click();
};

const shown = (page: Page): Promise<ShownFigure[]> =>
  page.locator('.heed-report [data-figure]').evaluateAll((els) => els.map((el) => {
    const d = (k: string) => el.getAttribute(`data-${k}`) ?? undefined;
    return { key: el.getAttribute('data-figure') ?? '', value: d('value'), lower: d('lower'), upper: d('upper'), k: d('k'), n: d('n') };
  }));

const openReport = async (page: Page, code: string) => {
  const before = await page.evaluate(() => Number(document.body.getAttribute('data-heed-ready') ?? 0));
  await page.getByRole('button', { name: `Report for ${code}` }).click();
  await page.waitForFunction((n) => Number(document.body.getAttribute('data-heed-ready') ?? 0) > n, before, { timeout: 60_000 });
  await page.getByRole('heading', { name: 'Your reading report', level: 1 }).waitFor();
};

const otherCodes = new RegExp(`\\b(${READERS.filter((r) => r !== ME).join('|')})\\b`);

describe('reader report: private, same numbers as heed analyze, case review only after the last period', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('gives the coordinator and the reader the report, as a screen, HTML and PDF', async () => {
    const folder = writeCaseFolder(16, 1);
    const chrome = await browser.launch();
    const { page } = chrome;
    const policy = watchPolicyViolations(page);
    await homePage(page).waitUntilReady();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await chooser.setFiles(folder.dir);
    await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
    await homePage(page).newStudy({ name: 'Report study', caseSet: folder.name, findings: ['mass'], aidedMode: 'concurrent', washoutDays: 0, plantedFalsePositive: 2, plantedFalseNegative: 2 });
    const study = studyPage(page);
    for (const code of READERS) { await study.enrol(code); await study.enrolled(code); }

    // Everyone reads period 1; the others read period 2 as well.
    for (const [i, code] of READERS.entries()) {
      const painted = await study.startPeriod(code, 1);
      await readingPage(page).waitForCase(painted);
      await readPeriod(chrome, i);
      await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    }
    for (const [i, code] of READERS.entries()) {
      if (code === ME) continue;
      const painted = await study.startPeriod(code, 2);
      await readingPage(page).waitForCase(painted);
      await readPeriod(chrome, i + 10);
      await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    }

    // While ME's period 2 is open: an interim report, without the case review.
    await openReport(page, ME);
    expect(await page.locator('[data-review-case]').count()).toBe(0);
    await page.getByText('The case review appears once all of your periods are complete').waitFor();
    await page.getByText(/Interim report: 1 of 2 periods complete/).waitFor();
    expect(await page.content()).not.toMatch(otherCodes);
    await page.getByRole('button', { name: '← Study' }).click();

    // The study lets readers see their report at the end; ME reads the last period and sees it.
    await page.getByLabel(/Show each reader their own report/).check();
    const painted = await study.startPeriod(ME, 2);
    await readingPage(page).waitForCase(painted);
    const readyBefore = await page.evaluate(() => Number(document.body.getAttribute('data-heed-ready') ?? 0));
    await readPeriod(chrome, 3);
    await page.waitForFunction((n) => Number(document.body.getAttribute('data-heed-ready') ?? 0) > n, readyBefore, { timeout: 60_000 });
    await page.getByRole('region', { name: 'Your report' }).getByRole('heading', { name: 'Your reading report' }).waitFor();
    expect(await page.locator('[data-review-case]').count()).toBeGreaterThan(0);
    expect(await page.content()).not.toMatch(otherCodes);
    await page.screenshot({ path: join(SHOTS, 'report-handover.png') });
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();

    // The coordinator's report after the last period: the case review is there.
    const logFile = join(work, 'reads.csv');
    writeFileSync(logFile, await study.exportText(/Save read log/));
    await openReport(page, ME);
    const reviewed = await page.locator('[data-review-case]').count();
    expect(reviewed).toBeGreaterThan(0);
    expect(await page.content()).not.toMatch(otherCodes);

    // Every figure equals heed analyze --json on the exported log, for this reader.
    const cli = JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'analyze', logFile, '--json', '--boot', '0'], { encoding: 'utf8' })) as { readers: Record<string, unknown>[] };
    const entry = cli.readers.find((r) => r.reader_id === ME) as Record<string, unknown>;
    const { mismatches, compared } = compareFigures(await shown(page), entry, cli.readers.filter((r) => r.reader_id !== ME));
    expect(mismatches).toEqual([]);
    expect(compared).toBeGreaterThan(15);
    // the case review lists exactly the reads counted by over- and under-reliance
    const aided = entry.aided as { overreliance: { k: number }; underreliance: { k: number } };
    expect(reviewed).toBe(aided.overreliance.k + aided.underreliance.k);

    // axe-core on the report: no serious or critical violation.
    const axe = await new AxeBuilder({ page }).include('.heed-report').analyze();
    const bad = axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.help}`);
    expect(bad).toEqual([]);

    // The page's policy allows no inline style: the report's CSS and each plot's styles were
    // adopted as style sheets, so nothing was blocked and the plots keep their font and layout.
    expect(policy.violations()).toEqual([]);
    expect(await plotStyle(page, '.heed-report .plot svg.heed-plot')).toMatchObject({ display: 'block', maxWidth: '100%', styleElements: 0 });

    // Case images on request, as data: URLs inside the report.
    await page.getByLabel('Include case images in the report').check();
    await page.locator('.heed-report img[src^="data:image/png;base64,"]').first().waitFor();
    expect(await page.locator('.heed-report img').count()).toBe(new Set(await page.locator('[data-review-case]').evaluateAll((els) => els.map((e) => e.getAttribute('data-review-case')))).size);

    // Screens at 1280 and 1920 px.
    for (const width of [1280, 1920]) {
      await page.setViewportSize({ width, height: 1000 });
      await page.screenshot({ path: join(SHOTS, `report-${width}.png`) });
    }

    // The self-contained HTML download: no address, no other reader.
    const html = await study.exportText(/Save as HTML file/);
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).not.toMatch(otherCodes);
    expect(html).not.toMatch(/https?:|<script|<link/i);
    expect(html.replace(/data:image\/png;base64,[A-Za-z0-9+/=]+/g, '')).not.toContain('//');

    // PDF of the report view with the print stylesheet (the browser window's print path).
    const pdf = join(work, 'report.pdf');
    writeFileSync(pdf, await page.pdf({ format: 'A4', printBackground: true }));
    const info = spawnSync('pdfinfo', [pdf], { encoding: 'utf8' }).stdout;
    expect(Number(/Pages:\s+(\d+)/.exec(info)?.[1])).toBeGreaterThanOrEqual(1);
    spawnSync('pdftoppm', ['-gray', '-r', '30', '-f', '1', '-singlefile', pdf, join(work, 'page')]);
    const pgm = readFileSync(join(work, 'page.pgm'));
    const header = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(pgm.subarray(0, 40).toString('latin1'));
    const pixels = pgm.subarray(pgm.length - Number(header?.[1]) * Number(header?.[2]));
    let dark = 0;
    for (const p of pixels) if (p < 128) dark++;
    expect(dark / pixels.length).toBeGreaterThan(0.005);
    // the print stylesheet hides the app's own controls
    const pdfText = spawnSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }).stdout;
    expect(pdfText).toContain('Your reading report');
    expect(pdfText).not.toContain('Save as HTML file');
  }, 400_000); // four readers read two periods each by keyboard: long on a busy machine
});
