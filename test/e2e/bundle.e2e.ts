/**
 * A study carried between workstations (issue 8): read part of a period on one profile, save the
 * study bundle from the study page, open it on a fresh profile from the start screen, and find
 * the same study with the same reads there. A tampered copy is refused, naming the place.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { unzipSync, zipSync } from 'fflate';
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { homePage, readingPage, studyPage } from './support/pages';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');

describe('study bundle: save on one workstation, open on another', () => {
  const url = inject('appUrl');
  const first = useChromiumProfile(url);
  const second = useChromiumProfile(url);
  const folder = mkdtempSync(join(tmpdir(), 'heed-e2e-bundle-'));
  afterAll(() => rmSync(folder, { recursive: true, force: true }));

  it('restores the study, its readers and its reads on a fresh profile', async () => {
    const a = await first.launch();
    let page = a.page;
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: 'Carried study', aidedMode: 'sequential' });
    const study = studyPage(page);
    for (const code of ['R01', 'R02']) { await study.enrol(code); await study.enrolled(code); }
    await readingPage(page).waitForCase(await study.startPeriod('R01', 1));
    for (let i = 0; i < 6; i++) await readingPage(page).answerByKeys((i % 2) as 0 | 1, 3 + i);
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: /Leave the session/ }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    await page.getByRole('heading', { name: 'Carried study', level: 1 }).waitFor();
    const log = await study.exportText(/Save read log/);
    expect(log.trim().split('\n')).toHaveLength(1 + 3); // three cases answered (initial and final each)

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save study bundle' }).click()]);
    const bundlePath = join(folder, 'carried-bundle.zip');
    await download.saveAs(bundlePath);
    await page.screenshot({ path: join(SHOTS, 'bundle-saved.png'), fullPage: true });
    await a.stop();

    const b = await second.launch();
    page = b.page;
    await homePage(page).waitUntilReady();
    // a copy with one edited answer is refused, naming the file and line, and stores nothing
    const files = unzipSync(readFileSync(bundlePath));
    const reads = new TextDecoder().decode(files['reads.csv']).split('\n');
    const row = reads[2] ?? '';
    reads[2] = row.replace(/,([\d.]+),([\d.]+),(\d{4}-\d\d-\d\dT)/, (_, c: string, ms: string, day: string) => `,${c},${Number(ms) + 1},${day}`);
    expect(reads[2]).not.toBe(row);
    const tamperedPath = `${bundlePath}.tampered.zip`;
    writeFileSync(tamperedPath, zipSync({ ...files, 'reads.csv': new TextEncoder().encode(reads.join('\n')) }));
    await page.getByLabel('Open a study bundle').setInputFiles(tamperedPath);
    await page.getByRole('alert').filter({ hasText: 'was not opened' }).waitFor();
    expect(await page.getByRole('alert').filter({ hasText: 'was not opened' }).textContent()).toMatch(/reads\.csv line 3: column total_ms/);

    await page.getByLabel('Open a study bundle').setInputFiles(bundlePath);
    await page.getByRole('heading', { name: 'Carried study', level: 1 }).waitFor();
    await studyPage(page).enrolled('R01');
    await studyPage(page).enrolled('R02');
    await page.screenshot({ path: join(SHOTS, 'bundle-opened.png'), fullPage: true });
    expect(await studyPage(page).exportText(/Save read log/)).toBe(log);
  });
});
