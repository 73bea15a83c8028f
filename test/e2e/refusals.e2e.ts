/**
 * What a user meets when something is wrong or interrupted: a bad case set refused in the app with
 * file, row and column named and nothing stored; a zip that climbs out of its root refused; and a
 * pause that hides the image and stops the clock.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { zipSync } from 'fflate';
import Papa from 'papaparse';
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { homePage, readingPage, studyPage } from './support/pages';

describe('refusals and interruptions', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('refuses a bad folder and a climbing zip with the place named, storing nothing', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    await homePage(page).waitUntilReady();
    const setRows = () => page.getByRole('region', { name: 'Case sets' }).getByRole('row').count();
    const before = await setRows();

    const folder = writeCaseFolder(4, 0);
    const csvPath = join(folder.dir, 'cases.csv');
    const lines = readFileSync(csvPath, 'utf8').split('\n');
    lines[2] = (lines[2] ?? '').replace(/^([^,]*,[^,]*,)0,/, '$1yes,').replace(/^([^,]*,[^,]*,)1,/, '$1yes,');
    writeFileSync(csvPath, lines.join('\n'));
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await chooser.setFiles(folder.dir);
    const alert = page.getByRole('alert').filter({ hasText: 'was not imported' });
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/cases\.csv:3: column truth/);
    expect(await setRows()).toBe(before);

    const zipPath = join(mkdtempSync(join(tmpdir(), 'heed-e2e-zip-')), 'climb.zip');
    writeFileSync(zipPath, zipSync({ 'cases.csv': new TextEncoder().encode('case_id,finding,truth,image\nz1,mass,1,a.png\n'), '../a.png': new Uint8Array([0x89, 0x50, 0x4e, 0x47]) }));
    const [zipChooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a zip…' }).click()]);
    await zipChooser.setFiles(zipPath);
    await page.getByRole('alert').filter({ hasText: 'climb' }).waitFor();
    expect(await page.getByRole('alert').filter({ hasText: 'climb' }).textContent()).toMatch(/\.\.\//);
    expect(await setRows()).toBe(before);
  });

  it('hides the image and stops the clock while paused', async () => {
    const page = browser.current().page;
    await homePage(page).newStudy({ name: 'Pause check', aidedMode: 'concurrent' });
    await studyPage(page).enrol('P01');
    await studyPage(page).enrolled('P01');
    const painted = await studyPage(page).startPeriod('P01', 1);
    await readingPage(page).waitForCase(painted);
    const canvas = page.locator('canvas.viewport-canvas');
    expect(await canvas.evaluate((el) => getComputedStyle(el).visibility)).toBe('visible');
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor();
    expect(await canvas.evaluate((el) => getComputedStyle(el).visibility)).toBe('hidden');
    await page.keyboard.press('p'); // ignored while paused
    await page.waitForTimeout(2500); // the pause itself is the test's input: 2.5 s of paused time
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor({ state: 'detached' });
    expect(await page.getByRole('radio', { name: /Present/ }).getAttribute('aria-checked')).toBe('false');
    await readingPage(page).answerByKeys(1, 9);
    await page.getByRole('button', { name: /^Pause/ }).click();
    await page.getByRole('button', { name: /Leave the session/ }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    await page.getByRole('heading', { name: 'Pause check' }).waitFor();
    const rows = Papa.parse<Record<string, string>>(await studyPage(page).exportText(/Save read log/), { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(1);
    expect(Number(rows[0]?.total_ms)).toBeGreaterThan(0);
    expect(Number(rows[0]?.total_ms)).toBeLessThan(2500);
  });

  it('offers a rest break before the planned case, with the image hidden and the clock waiting', async () => {
    const page = browser.current().page;
    await page.getByRole('button', { name: '← Heed' }).click();
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: 'Break check', aidedMode: 'concurrent', breakEvery: 2 });
    await studyPage(page).enrol('B01');
    await studyPage(page).enrolled('B01');
    const painted = await studyPage(page).startPeriod('B01', 1);
    await readingPage(page).waitForCase(painted);
    const reading = readingPage(page);
    // 5 practice cases, then main cases; the first break comes before the 3rd main case (case 8),
    // whose image is already prefetched when it comes up
    for (let i = 0; i < 7; i++) {
      expect(await page.getByRole('dialog', { name: 'Break' }).count()).toBe(0);
      await reading.answerByKeys(1, 5);
    }
    await page.getByRole('dialog', { name: 'Break' }).waitFor();
    expect((await reading.state()).progress).toBe('Case 3 of 120'); // practice counted apart
    expect(await page.locator('canvas.viewport-canvas').evaluate((el) => getComputedStyle(el).visibility)).toBe('hidden');
    const before = await page.evaluate(() => Number(document.body.getAttribute('data-heed-case-painted') ?? 0));
    await page.keyboard.press('Enter');
    await page.getByRole('dialog', { name: 'Break' }).waitFor({ state: 'detached' });
    await reading.waitForCase(before);
    expect(await page.locator('canvas.viewport-canvas').evaluate((el) => getComputedStyle(el).visibility)).toBe('visible');
    await reading.answerByKeys(0, 7);
    expect((await reading.state()).progress).toBe('Case 4 of 120');
  });
});

