/**
 * Replaces the stored image bytes of one case with bytes that pass Heed's structure check in name
 * only (a PNG signature, then junk), straight in IndexedDB: what a damaged or hostile image that
 * slipped past validation looks like to the reading view.
 */
import type { Page } from 'playwright-core';

export const breakCaseImages = (page: Page, caseId: string): Promise<number> =>
  page.evaluate((target) => new Promise<number>((resolve, reject) => {
    const open = indexedDB.open('heed');
    open.onerror = () => reject(open.error);
    open.onsuccess = () => {
      const idb = open.result;
      const tx = idb.transaction(['caseSets', 'images'], 'readwrite');
      let broken = 0;
      const sets = tx.objectStore('caseSets').getAll();
      sets.onsuccess = () => {
        for (const set of sets.result as { id: string; manifest: { cases: { caseId: string; images: string[] }[] } }[]) {
          for (const c of set.manifest.cases) {
            if (c.caseId !== target) continue;
            for (const path of c.images) {
              const junk = new Uint8Array(64);
              junk.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
              tx.objectStore('images').put({ setId: set.id, path, mime: 'image/png', bytes: junk });
              broken += 1;
            }
          }
        }
      };
      tx.oncomplete = () => { idb.close(); resolve(broken); };
      tx.onerror = () => reject(tx.error);
    };
  }), caseId);
