/**
 * Two tabs of one Chromium profile on the same reading session: the second is told at once that
 * the session is open elsewhere and offered to take over; after a take-over the first tab shows
 * no question, and when it takes back over it shows the current question, never one already
 * answered in the other tab.
 */
import { inject } from 'vitest';
import { signalCount, useChromiumProfile, waitForSignal } from './support/chromium';
import { homePage, readingPage, studyPage } from './support/pages';

describe('a second tab on one reading session', () => {
  const url = inject('appUrl');
  const browser = useChromiumProfile(url);

  it('is told at once, can take over, and neither tab stays on an answered question', async () => {
    const { page: first } = await browser.launch();
    await homePage(first).waitUntilReady();
    await homePage(first).newStudy({ name: 'Two tabs', aidedMode: 'concurrent' });
    await studyPage(first).enrol('T01');
    await studyPage(first).enrolled('T01');
    const a = readingPage(first);
    await a.waitForCase(await studyPage(first).startPeriod('T01', 1));
    await a.answerByKeys(1, 6);

    // while reading, the page cancels DevTools and Reload keys (whether the browser obeys is its own
    // matter: headless Chromium has no such accelerators, so this checks the page's part only)
    await first.evaluate(() => {
      const seen: string[] = [];
      Object.assign(window, { heedSeenKeys: seen });
      window.addEventListener('keydown', (e) => { if (!['Control', 'Shift'].includes(e.key)) seen.push(`${e.key}:${e.defaultPrevented}`); });
    });
    for (const k of ['F5', 'F12', 'Control+r', 'Control+Shift+I']) await first.keyboard.press(k);
    // cancelled and stopped at the window's capture phase: nothing reaches a later listener
    expect(await first.evaluate(() => (window as unknown as { heedSeenKeys: string[] }).heedSeenKeys)).toEqual([]);
    await first.keyboard.press('x'); // an ordinary key does reach it, so the listener is live
    expect(await first.evaluate(() => (window as unknown as { heedSeenKeys: string[] }).heedSeenKeys)).toEqual(['x:false']);

    const second = await first.context().newPage();
    await second.goto(url);
    await homePage(second).waitUntilReady();
    await homePage(second).openStudy('Two tabs');
    await studyPage(second).startPeriod('T01', 1);
    const elsewhere = (page: typeof first) => page.getByRole('dialog', { name: 'Open in another window' });
    await elsewhere(second).waitFor();
    expect(await second.locator('main.reading[data-case]').count()).toBe(0);

    const shared = (await a.state()).caseId;
    const painted = await signalCount(second, 'case-painted');
    await elsewhere(second).getByRole('button', { name: 'Take over here' }).click();
    await elsewhere(first).waitFor();
    expect(await first.locator('main.reading[data-case]').count()).toBe(0);
    const b = readingPage(second);
    await b.waitForCase(painted);
    expect((await b.state()).caseId).toBe(shared);
    await b.answerByKeys(0, 3);
    const now = (await b.state()).caseId;
    expect(now).not.toBe(shared);

    await first.bringToFront();
    const before = await signalCount(first, 'case-painted');
    await elsewhere(first).getByRole('button', { name: 'Take over here' }).click();
    await waitForSignal(first, 'case-painted', before);
    expect((await a.state()).caseId).toBe(now);
    await elsewhere(second).waitFor();
    await second.close();
  });
});
