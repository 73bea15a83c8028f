/**
 * Automatic backups (issue 8, part 5) in the Chromium mode: the e2e server takes backups as
 * `npm start`'s does. A completed period writes the study bundle to the backup folder on disk,
 * where the bundle verifier passes it; "Back up now" adds another; on a fresh profile the start
 * screen names the folder, lists the backups and restores the study from one, and refuses a
 * second restore of a study already there.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { readBundle } from '../../src/io/bundle/read';
import { useChromiumProfile, signalCount, waitForSignal } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { homePage, readingPage, studyPage } from './support/pages';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');

describe('automatic backups', () => {
  const url = new URL(inject('appUrl'));
  url.searchParams.set('backup', inject('backupSecret'));
  const backupDir = inject('backupDir');
  const first = useChromiumProfile(url.href);
  const second = useChromiumProfile(url.href);
  const folder = writeCaseFolder(4, 0);

  const importSet = async (page: Page) => {
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
    await chooser.setFiles(folder.dir);
    await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
  };

  it('writes a verified bundle when a period completes, and restores it on a fresh profile', async () => {
    const a = await first.launch();
    let page = a.page;
    await homePage(page).waitUntilReady();
    await page.getByLabel('Backup folder').filter({ hasText: backupDir }).waitFor();
    await importSet(page);
    await homePage(page).newStudy({ name: 'Backed-up study', caseSet: folder.name, findings: ['mass'], aidedMode: 'concurrent', washoutDays: 0 });
    const study = studyPage(page);
    await study.enrol('R01');
    await study.enrolled('R01');

    const backupsBefore = await signalCount(page, 'backup');
    await readingPage(page).waitForCase(await study.startPeriod('R01', 1));
    const reading = readingPage(page);
    for (let i = 0; !(await reading.isDone()); i++) await reading.answerByKeys((i % 2) as 0 | 1, 2 + i);
    await waitForSignal(page, 'backup', backupsBefore);

    // the bundle is on disk, in the study's folder, and the verifier passes it with every read
    const studies = readdirSync(backupDir);
    expect(studies).toHaveLength(1);
    const studyDir = join(backupDir, studies[0] ?? '');
    const [written] = readdirSync(studyDir);
    expect(written).toMatch(/^\d{4}-\d\d-\d\dT\d\d-\d\d-\d\d-\d{3}Z-Backed-up-study\.zip$/);
    const verified = readBundle(new Uint8Array(readFileSync(join(studyDir, written ?? ''))));
    if (!verified.ok) throw new Error(`the backup does not verify: ${JSON.stringify(verified.fault)}`);
    expect(verified.snapshot.study.name).toBe('Backed-up study');
    expect(verified.manifest.chain.reads).toBe(4);
    expect(verified.manifest.images_included).toBe(false);
    expect(verified.snapshot.events.map((e) => e.type)).toContain('session-completed');

    await page.getByRole('button', { name: 'Done: hand back the workstation' }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    await page.getByRole('heading', { name: 'Backed-up study', level: 1 }).waitFor();
    const log = await study.exportText(/Save read log/);
    // on demand: a second backup, and the page says where it went
    const n = await signalCount(page, 'backup');
    await page.getByRole('button', { name: 'Back up now' }).click();
    await waitForSignal(page, 'backup', n);
    await page.getByText(`Backed up to ${studyDir}/`, { exact: false }).waitFor();
    expect(readdirSync(studyDir)).toHaveLength(2);
    await a.stop();

    const b = await second.launch();
    page = b.page;
    await homePage(page).waitUntilReady();
    await importSet(page);
    const panel = page.getByRole('region', { name: 'Backups' });
    await panel.getByText('Backed-up-study (not on this workstation)').waitFor();
    await page.screenshot({ path: join(SHOTS, 'backups-start-screen.png'), fullPage: true });
    await panel.getByRole('button', { name: `Restore ${written}` }).click();
    await page.getByRole('heading', { name: 'Backed-up study', level: 1 }).waitFor();
    await studyPage(page).enrolled('R01');
    expect(await studyPage(page).exportText(/Save read log/)).toBe(log);

    // the study is here now: a second restore is refused, naming why, and changes nothing
    await page.getByRole('button', { name: '← Heed' }).click();
    await homePage(page).waitUntilReady();
    await page.getByRole('region', { name: 'Backups' }).getByRole('button', { name: `Restore ${written}` }).click();
    await page.getByRole('alert').filter({ hasText: 'is already on this workstation' }).waitFor();
    expect(await page.getByRole('button', { name: 'Backed-up study', exact: true }).count()).toBe(1);
  });
});
