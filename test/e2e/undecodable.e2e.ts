/**
 * A case whose image passed validation but cannot be decoded in the browser never blocks the
 * reader: they see a plain message, Pause stays usable, and "Skip this case" moves on to the next
 * case (logged as case-skipped with reason image-undecodable, and left out of the read log).
 */
import Papa from 'papaparse';
import { inject } from 'vitest';
import { signalCount, useChromiumProfile, waitForSignal } from './support/chromium';
import { breakCaseImages } from './support/break-image';
import { homePage, readingPage, studyPage } from './support/pages';

describe('an image that cannot be decoded', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('lets the reader skip the case or pause, and the reading goes on', async () => {
    const { page } = await browser.launch();
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: 'Broken image', aidedMode: 'concurrent' });
    await studyPage(page).enrol('U01');
    await studyPage(page).enrolled('U01');
    const reading = readingPage(page);
    await reading.waitForCase(await studyPage(page).startPeriod('U01', 1));
    await reading.answerByKeys(1, 6);
    const { caseId: broken, progress } = await reading.state();
    expect(progress).toMatch(/^Practice case 2 of|^Case 2 of|2 of/);
    // leave, break the image of the case that comes next, and come back to it
    await page.getByRole('button', { name: /^Pause Esc/ }).click();
    await page.getByRole('button', { name: /Leave the session/ }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    expect(await breakCaseImages(page, broken)).toBeGreaterThan(0);
    await studyPage(page).startPeriod('U01', 1);
    const dialog = page.getByRole('dialog', { name: 'Image cannot be shown' });
    await dialog.waitFor();
    expect((await reading.state()).caseId).toBe(broken);
    // Pause works although the clock never started; Continue brings the message back
    const pause = page.getByRole('button', { name: /^Pause Esc/ });
    expect(await pause.isEnabled()).toBe(true);
    await page.keyboard.press('Escape'); // the message covers the bar; Esc pauses as always
    await page.getByRole('dialog', { name: 'Paused' }).waitFor();
    await page.getByRole('button', { name: /^Continue/ }).click();
    await dialog.waitFor();

    const painted = await signalCount(page, 'case-painted');
    const saved = await signalCount(page, 'saved');
    await dialog.getByRole('button', { name: 'Skip this case' }).click();
    await waitForSignal(page, 'saved', saved);
    await reading.waitForCase(painted);
    const next = await reading.state();
    expect(next.caseId).not.toBe(broken);
    await reading.answerByKeys(0, 4);

    await page.getByRole('button', { name: /^Pause Esc/ }).click();
    await page.getByRole('button', { name: /Leave the session/ }).click();
    await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
    const rows = Papa.parse<Record<string, string>>(await studyPage(page).exportText(/Save read log/), { header: true, skipEmptyLines: true }).data;
    expect(rows.map((r) => r.case_id)).not.toContain(broken);
    expect(rows.map((r) => r.case_id)).toContain(next.caseId);
    expect(rows).toHaveLength(2);
    const events = await page.evaluate(() => new Promise<{ type: string; detail: Record<string, unknown> }[]>((resolve) => {
      const open = indexedDB.open('heed');
      open.onsuccess = () => {
        const all = open.result.transaction('events').objectStore('events').getAll();
        all.onsuccess = () => { open.result.close(); resolve(all.result as { type: string; detail: Record<string, unknown> }[]); };
      };
    }));
    expect(events.find((e) => e.type === 'case-skipped')?.detail).toMatchObject({ caseId: broken, reason: 'image-undecodable' });
  });
});
