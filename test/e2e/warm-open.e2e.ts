/**
 * The page opens Heed's database ahead of the app's bundle (src/store/warm-open.ts, loaded by a
 * script vite.config.ts places before the entry's), so the browser has the database's files open
 * when the app asks. On a fresh profile that early open must create nothing (the app then makes
 * the database and the demo set as before); on a relaunch it comes first and the app finds its data.
 */
import { inject } from 'vitest';
import { SCHEMA_VERSION } from '../../src/store/db';
import { newProfileDir, removeProfileDir, startChromium, type RunningChromium } from './support/chromium';
import { homePage } from './support/pages';

// Records each indexedDB.open (name, version asked for, page time) before any of the page's scripts
// run; whether an "Opening…" placeholder was ever in the page before the start screen was ready;
// and whether the first render came after the launch's queries had answered (the mounted signal).
const RECORD_OPENS = `(() => {
  const opens = [];
  Reflect.set(window, '__heedOpens', opens);
  const drawn = { placeholder: false, answered: null };
  Reflect.set(window, '__heedDrawn', drawn);
  new MutationObserver(() => {
    if (!document.body.hasAttribute('data-heed-ready') && /Opening/.test(document.body.textContent ?? '')) drawn.placeholder = true;
  }).observe(document, { childList: true, subtree: true, characterData: true });
  window.addEventListener('heed:mounted', (e) => { drawn.answered = e.detail.answered ?? null; });
  const nativeOpen = IDBFactory.prototype.open;
  IDBFactory.prototype.open = function (...args) {
    opens.push({ name: args[0], version: args[1] ?? null, at: performance.now() });
    return nativeOpen.apply(this, args);
  };
})();`;

type Opened = { name: string; version: number | null; at: number };

type Drawn = { placeholder: boolean; answered: boolean | null };

const launchRecorded = async (profile: string, url: string): Promise<{ chrome: RunningChromium; opens: Opened[]; mountedAt: number; drawn: Drawn }> => {
  const chrome = await startChromium(profile, 'about:blank');
  await chrome.page.addInitScript({ content: RECORD_OPENS });
  await chrome.page.goto(url);
  await homePage(chrome.page).waitUntilReady();
  const seen = await chrome.page.evaluate(() => ({
    opens: Reflect.get(window, '__heedOpens') as Opened[],
    drawn: Reflect.get(window, '__heedDrawn') as Drawn,
    mountedAt: performance.getEntriesByName('heed-mounted')[0]?.startTime ?? Number.NaN,
  }));
  return { chrome, ...seen };
};

describe('the early open of the database', () => {
  const url = inject('appUrl');
  let profile = '';
  let running: RunningChromium | null = null;
  beforeAll(() => { profile = newProfileDir(); });
  afterAll(async () => { await running?.stop(); removeProfileDir(profile); });

  it('comes before the app runs; the app makes its database on a fresh profile and finds its data at the next start, drawn once', async () => {
    const first = await launchRecorded(profile, url);
    running = first.chrome;
    // first the early open (no version: it never upgrades), then the app's own (Dexie asks for its version)
    expect(first.opens.map((o) => [o.name, o.version === null ? 'current' : 'versioned'])).toEqual([['heed', 'current'], ['heed', 'versioned']]);
    expect(first.opens[0]?.at).toBeLessThan(first.mountedAt);
    await first.chrome.page.getByText('Vesper Valley Imaging (demo)').waitFor();
    await first.chrome.stop();
    running = null;

    const again = await launchRecorded(profile, url);
    running = again.chrome;
    expect(again.opens.map((o) => o.name)).toEqual(['heed', 'heed']);
    expect(again.opens[0]?.version).toBeNull();
    expect(again.opens[0]?.at).toBeLessThan(again.mountedAt);
    // the stored demo set is found, not made again
    await again.chrome.page.getByText('Vesper Valley Imaging (demo)').waitFor();
    // drawn once when the launch's queries had answered before the first render (src/ui/startup.ts):
    // no "Opening…" placeholder first (on a slow start the render does not wait longer for them)
    expect(typeof again.drawn.answered).toBe('boolean');
    if (again.drawn.answered === true) expect(again.drawn.placeholder).toBe(false);
    expect(await again.chrome.page.evaluate(async () => (await indexedDB.databases()).map((d) => [d.name, d.version]))).toEqual([['heed', SCHEMA_VERSION * 10]]);
  });
});
