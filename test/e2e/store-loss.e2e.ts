/**
 * When the browser replaces Heed's database with an empty one (Chromium deletes a database it
 * finds damaged; docs/security.md), the next start says so at the top of the start screen and
 * points to the backups, instead of showing a quiet "No study yet". The deletion is done here by
 * the page itself (indexedDB.deleteDatabase), which leaves the browser in the same state.
 */
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { homePage, studyPage } from './support/pages';

describe('a database the browser lost', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('is reported at the next start until the coordinator has read the notice', async () => {
    const { page } = await browser.launch();
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: 'Soon gone', aidedMode: 'concurrent' });
    await studyPage(page).enrol('L01');
    await studyPage(page).enrolled('L01');
    const notice = page.getByRole('alert').filter({ has: page.getByRole('heading', { name: 'The browser lost Heed’s studies on this workstation' }) });

    // a plain restart of the same database says nothing
    await page.reload();
    await homePage(page).waitUntilReady();
    await page.getByRole('button', { name: 'Soon gone', exact: true }).waitFor();
    expect(await notice.count()).toBe(0);

    // Heed's connection closes when another asks to delete the database (Dexie's default)
    expect(await page.evaluate(() => new Promise<string>((resolve) => {
      const request = indexedDB.deleteDatabase('heed');
      request.onsuccess = () => resolve('deleted');
      request.onerror = () => resolve(`error: ${String(request.error)}`);
      request.onblocked = () => resolve('blocked');
    }))).toBe('deleted');
    await page.reload();
    await homePage(page).waitUntilReady();
    await notice.waitFor();
    expect(await notice.innerText()).toMatch(/created on .* and last opened on .*import each study’s case set again.*restore each study from its latest backup/s);
    await page.getByText('No study yet.').waitFor();

    // still there after a reload, gone once read
    await page.reload();
    await homePage(page).waitUntilReady();
    await notice.waitFor();
    await page.getByRole('button', { name: 'I have read this' }).click();
    await notice.waitFor({ state: 'detached' }); // once the read mark is stored
    await page.reload();
    await homePage(page).waitUntilReady();
    expect(await notice.count()).toBe(0);
  }, 120_000);
});
