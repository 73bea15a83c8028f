/**
 * Which stored form of a session's reads Chromium turns back into objects fastest (the read
 * packs' format, src/store/read-packs.ts): 100 records of 2,000 reads each (200,000 reads), five
 * ways, in the profile's IndexedDB (SQLite engine, as the app): an array of read objects, one JSON
 * text of read objects, an object of column arrays, one JSON text of columns, and that text as
 * UTF-8 bytes. One page load writes them; two fresh page loads each time getAll of each store and
 * the parse, twice. Run: npx tsx bench/support/pack-format.ts (a helper, not in npm run bench).
 */
import { join } from 'node:path';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';
import { newProfileDir, removeProfileDir, startChromium } from '../../test/e2e/support/chromium';

declare global {
  // oxlint-disable-next-line typescript/consistent-type-definitions
  interface Window { done?: unknown }
}

const server = await startStaticServer({ root: join(import.meta.dirname, 'pack-format') });
const profile = newProfileDir();
try {
  for (const phase of ['write', 'read', 'read']) {
    const chrome = await startChromium(profile, 'about:blank');
    try {
      await chrome.page.goto(new URL(`index.html?${phase}`, server.url).href);
      await chrome.page.waitForFunction(() => window.done, null, { timeout: 300_000 });
      console.log(phase, JSON.stringify(await chrome.page.evaluate(() => window.done)));
    } finally {
      await chrome.stop();
    }
  }
} finally {
  removeProfileDir(profile);
  await server.close();
}
