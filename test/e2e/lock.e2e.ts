/**
 * The coordinator lock: once a passphrase is set, a reader cannot reach the coordinator's side
 * from the reading flow (Esc, Leave, "Coordinator: back to the study"; a reload during the
 * session) without it; the right passphrase opens it; a reset keeps every record and is logged.
 */
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { useChromiumProfile } from './support/chromium';
import { homePage, lockPage, readingPage, studyPage } from './support/pages';

const PHRASE = 'vesper valley halden';

const workstationEvents = (page: Page) => page.evaluate(() => new Promise<string[]>((resolve) => {
  const open = indexedDB.open('heed');
  open.onsuccess = () => {
    const all = open.result.transaction('events').objectStore('events').getAll();
    all.onsuccess = () => {
      open.result.close();
      resolve((all.result as { chain: string; type: string }[]).filter((e) => e.chain === '' && e.type.startsWith('lock-')).map((e) => e.type));
    };
  };
}));

describe('the coordinator lock', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('keeps a reader out of the coordinator side until the passphrase is given', async () => {
    const { page } = await browser.launch();
    const lock = lockPage(page);
    await homePage(page).waitUntilReady();
    await lock.setPassphrase(PHRASE);
    await homePage(page).newStudy({ name: 'Lock check', aidedMode: 'concurrent' });
    await studyPage(page).enrol('L01');
    await studyPage(page).enrolled('L01');
    const reading = readingPage(page);
    await reading.waitForCase(await studyPage(page).startPeriod('L01', 1));
    await reading.answerByKeys(1, 7);

    // F5 during the session comes back locked
    await page.reload();
    await lock.waitUntilLocked();
    expect(await page.getByRole('heading', { name: 'Heed', level: 1 }).count()).toBe(0);
    await lock.unlock('not the phrase');
    await page.getByRole('alert').filter({ hasText: 'not the coordinator passphrase' }).waitFor();
    expect(await lock.isLocked()).toBe(true);
    await lock.unlock(PHRASE);
    await homePage(page).waitUntilReady();

    // Esc, Leave, Coordinator: the lock, not the study page
    await homePage(page).openStudy('Lock check');
    await reading.waitForCase(await studyPage(page).startPeriod('L01', 1));
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: /Leave the session/ }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    await lock.waitUntilLocked();
    expect(await page.getByRole('heading', { name: 'Lock check' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /Save read log/ }).count()).toBe(0);
    await lock.unlock(PHRASE);
    await page.getByRole('heading', { name: 'Lock check', level: 1 }).waitFor();

    // a reload on the coordinator side after unlocking stays open
    await page.reload();
    await homePage(page).waitUntilReady();

    // a forgotten passphrase: the reset keeps the study and is logged
    await homePage(page).openStudy('Lock check');
    await reading.waitForCase(await studyPage(page).startPeriod('L01', 1));
    await page.reload();
    await lock.waitUntilLocked();
    await page.getByRole('button', { name: 'Forgotten the passphrase?' }).click();
    await page.getByLabel(/to confirm/).fill('reset the lock');
    await page.getByRole('button', { name: 'Reset the lock (logged)' }).click();
    await homePage(page).waitUntilReady();
    await page.getByRole('region', { name: 'Coordinator lock' }).waitFor(); // asks for a new passphrase
    await homePage(page).openStudy('Lock check');
    expect(await workstationEvents(page)).toEqual(['lock-set', 'lock-refused', 'lock-unlocked', 'lock-unlocked', 'lock-reset']);
  });
});
