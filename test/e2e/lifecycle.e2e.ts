/**
 * A study's whole life as a coordinator lives it (issue 8, part 6): rename and delete case sets
 * (refused while a study uses one), edit a draft design (problems beside their fields, cleared when
 * fixed), correct and delete readers before they start, read, find the design locked, withdraw a
 * reader, see the study finished, read and filter the audit log, export it, delete the study.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { inject } from 'vitest';
import { useChromiumProfile, waitForSignal, signalCount } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { readWholePeriod } from './support/read-period';
import { homePage, readingPage, studyPage } from './support/pages';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');

describe('a study’s whole life', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('renames and deletes sets, edits a draft, corrects and withdraws readers, finishes, audits and deletes the study', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    const home = homePage(page);
    const study = studyPage(page);
    await home.waitUntilReady();
    // the page names its icon, and the icon is served (it was a 404 on every load)
    const icon = await page.evaluate(async () => {
      const link = document.querySelector<HTMLLinkElement>('link[rel=icon]');
      if (!link) return null;
      const response = await fetch(link.href);
      const bytes = new Uint8Array(await response.arrayBuffer());
      return { status: response.status, type: response.headers.get('content-type'), signature: [...bytes.subarray(0, 8)] };
    });
    // a PNG (an SVG icon is parsed as a whole document on the page's main thread at every launch)
    expect(icon).toEqual({ status: 200, type: 'image/png', signature: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] });
    // persistent storage was asked for and its answer is shown, with the space used
    const persistence = page.getByLabel('Persistent storage');
    await persistence.filter({ hasText: /Persistent storage: (granted|not granted)/ }).waitFor();
    expect(await persistence.textContent()).toMatch(/Heed uses [\d.]+ MB of the [\d.]+ MB the browser allows/);
    expect(await page.getByRole('region', { name: 'Where the data is' }).textContent()).toMatch(/Data of this window: this browser’s own profile, for the address http:\/\/127\.0\.0\.1:\d+ only/);
    const sets = page.getByRole('region', { name: 'Case sets' });
    const importFolder = async (dir: string) => {
      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
      await chooser.setFiles(dir);
      await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
    };
    const saved = async (act: () => Promise<void>) => { const n = await signalCount(page, 'saved'); await act(); await waitForSignal(page, 'saved', n); };

    // two sets: one to keep (renamed), one to delete
    const harbour = writeCaseFolder(4, 0);
    await importFolder(harbour.dir);
    // the same folder again is refused, pointing to the stored set
    const [again] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await again.setFiles(harbour.dir);
    await sets.getByRole('alert').filter({ hasText: 'was not imported' }).waitFor();
    expect(await sets.getByRole('alert').textContent()).toMatch(/same cases and images as the stored case set “harbour-clinic-set”/);
    expect(await sets.getByRole('cell', { name: 'harbour-clinic-set', exact: true }).count()).toBe(1);
    await saved(() => page.getByRole('button', { name: 'Rename case set harbour-clinic-set' }).click().then(async () => {
      await page.getByLabel('New name for harbour-clinic-set').fill('Harbour March');
      await page.getByRole('button', { name: 'Save name' }).click();
    }));
    await sets.getByRole('cell', { name: 'Harbour March', exact: true }).waitFor();
    await importFolder(writeCaseFolder(3, 0).dir);
    await page.getByRole('button', { name: 'Delete case set harbour-clinic-set' }).click();
    await saved(() => page.getByRole('button', { name: 'Delete case set', exact: true }).click());
    await sets.getByRole('cell', { name: 'harbour-clinic-set', exact: true }).waitFor({ state: 'detached' });

    // a draft study on the kept set, washout 14 days (edited to 0 below)
    await home.newStudy({ name: 'Lifecycle pilot', caseSet: 'Harbour March', findings: ['mass'], aidedMode: 'concurrent', washoutDays: 14 });
    await page.getByRole('button', { name: '← Heed' }).click();
    await home.waitUntilReady();
    await page.getByRole('button', { name: 'Delete case set Harbour March' }).click();
    await saved(() => page.getByRole('button', { name: 'Delete case set', exact: true }).click());
    expect(await sets.getByRole('alert').textContent()).toMatch(/used by the study “Lifecycle pilot”; it cannot be deleted/);
    await sets.getByRole('cell', { name: 'Harbour March', exact: true }).waitFor();
    await page.screenshot({ path: join(SHOTS, 'lifecycle-home-refused.png'), fullPage: true });
    await home.openStudy('Lifecycle pilot');
    expect(await page.getByLabel('Study status').textContent()).toMatch(/^draft/);

    // edit the draft: a bad field is named beside itself, and the note clears once fixed
    await page.getByRole('button', { name: 'Edit design' }).click();
    await page.getByRole('heading', { name: 'Edit the design of Lifecycle pilot' }).waitFor();
    await page.getByLabel('Washout days').fill('two weeks');
    await page.getByLabel('Break every N cases').fill('0');
    await page.getByRole('button', { name: 'Save design' }).click();
    await page.getByText('2 things to fix').waitFor();
    expect(await page.locator('[data-field=washoutDays]').textContent()).toBe('Washout days: "two weeks" is not a number.');
    expect(await page.locator('[data-field=breakEvery]').textContent()).toBe('The number of cases between breaks must be at least 1.');
    await page.screenshot({ path: join(SHOTS, 'lifecycle-design-problems.png'), fullPage: true });
    await page.getByLabel('Washout days').fill('0');
    expect(await page.locator('[data-field=washoutDays]').count()).toBe(0);
    await page.getByLabel('Break every N cases').fill('');
    expect(await page.locator('.field-problem').count()).toBe(0);
    await page.getByRole('button', { name: 'Save design' }).click();
    await page.getByRole('heading', { name: 'Lifecycle pilot', level: 1 }).waitFor();
    expect(await page.getByRole('region', { name: 'Design', exact: true }).textContent()).toContain('0 days between periods');

    // readers: a mistyped code corrected, a duplicate refused, one deleted before starting
    for (const code of ['R0l', 'R02', 'R03']) { await study.enrol(code); await study.enrolled(code); }
    await page.getByRole('button', { name: 'Correct code R0l' }).click();
    await page.getByLabel('Corrected code for R0l').fill('r02');
    await saved(() => page.getByRole('button', { name: 'Save code' }).click());
    expect(await page.getByRole('alert').filter({ hasText: 'already enrolled' }).textContent()).toMatch(/r02 is already enrolled/);
    await page.getByLabel('Corrected code for R0l').fill('R01');
    await saved(() => page.getByRole('button', { name: 'Save code' }).click());
    await study.enrolled('R01');
    await page.getByRole('button', { name: 'Delete reader R03' }).click();
    await saved(() => page.getByRole('button', { name: 'Delete R03' }).click());
    await page.getByRole('cell', { name: 'R03', exact: true }).waitFor({ state: 'detached' });

    // R01 reads both periods; the design is then locked and R01's code can no longer change
    for (const period of [1, 2]) {
      const painted = await study.startPeriod('R01', period);
      await readingPage(page).waitForCase(painted);
      await readWholePeriod(chrome);
      await page.getByRole('heading', { name: 'Readers', exact: true }).waitFor();
    }
    expect(await page.getByRole('button', { name: 'Edit design' }).isDisabled()).toBe(true);
    expect(await page.getByRole('region', { name: 'Study actions' }).textContent()).toContain('The design is locked');
    expect(await page.getByRole('button', { name: 'Correct code R01' }).count()).toBe(0);
    expect(await page.getByLabel('Study status').textContent()).toMatch(/^reading under way/);

    // R02 withdraws before reading: the study is finished
    await page.getByRole('button', { name: 'Withdraw R02' }).click();
    await page.getByLabel('Reason for withdrawing R02').fill('moved to another department');
    await page.getByLabel('Recorded by').fill('QO-1');
    await saved(() => page.getByRole('button', { name: 'Withdraw R02 (logged)' }).click());
    await page.getByText('withdrawn').first().waitFor();
    expect(await page.getByLabel('Study status').textContent()).toMatch(/^finished/);
    expect(await page.getByRole('button', { name: /^Start R02/ }).count()).toBe(0);
    await page.screenshot({ path: join(SHOTS, 'lifecycle-finished.png'), fullPage: true });

    // the audit log, filtered by type and by reader, exported
    await page.getByRole('button', { name: 'Audit log' }).click();
    await page.getByRole('heading', { name: 'Audit log of Lifecycle pilot' }).waitFor();
    const events = page.getByRole('region', { name: 'Events' });
    await page.getByLabel('Event type').selectOption('reader-withdrawn');
    expect(await events.getByRole('row').count()).toBe(2); // header and one event
    expect(await events.textContent()).toContain('moved to another department');
    await page.getByLabel('Event type').selectOption('');
    await page.getByLabel('Reader', { exact: true }).selectOption('R01');
    const r01Rows = await events.getByRole('row').count();
    expect(r01Rows).toBeGreaterThan(4);
    expect(await events.getByRole('cell', { name: 'R02', exact: true }).count()).toBe(0);
    await page.screenshot({ path: join(SHOTS, 'lifecycle-audit.png'), fullPage: true });
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save audit log (CSV)' }).click()]);
    const rows = Papa.parse<Record<string, string>>(readFileSync(await download.path(), 'utf8'), { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(r01Rows - 1);
    expect(new Set(rows.map((r) => r.reader))).toEqual(new Set(['R01']));
    expect(rows.map((r) => r.type)).toContain('reader-code-corrected');

    // rename the study, then delete it (no bundle saved: said so, and chosen explicitly)
    await page.getByRole('button', { name: '← Lifecycle pilot' }).click();
    await page.getByRole('button', { name: 'Rename study' }).click();
    await page.getByLabel('New study name').fill('Lifecycle pilot (closed)');
    await saved(() => page.getByRole('button', { name: 'Save name' }).click());
    await page.getByRole('heading', { name: 'Lifecycle pilot (closed)', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Delete study…' }).click();
    expect(await page.getByRole('group', { name: 'Confirm deleting the study' }).textContent()).toContain('No bundle of this study was saved');
    await saved(() => page.getByRole('button', { name: 'Delete without a bundle' }).click());
    await home.waitUntilReady();
    expect(await page.getByRole('button', { name: 'Lifecycle pilot (closed)' }).count()).toBe(0);
    // the notice sits in the page flow (it covered content when it stuck to the top) and fades by itself
    const notice = page.getByRole('status').filter({ hasText: 'deleted' });
    await notice.waitFor();
    expect(await notice.evaluate((el) => getComputedStyle(el).position)).toBe('static');
    await notice.waitFor({ state: 'detached', timeout: 20_000 });

    // the set is free now
    await page.getByRole('button', { name: 'Delete case set Harbour March' }).click();
    await saved(() => page.getByRole('button', { name: 'Delete case set', exact: true }).click());
    await sets.getByRole('cell', { name: 'Harbour March', exact: true }).waitFor({ state: 'detached' });
  });
});
