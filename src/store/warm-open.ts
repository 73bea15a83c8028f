/**
 * Opens Heed's database once, before the app's own code has loaded, and lets go at once: the browser
 * then has the database's files open by the time the app asks (relaunch time, bench/cold-start.ts;
 * Chromium keeps a closed database's store open a little while). It never creates or changes a
 * database: opening a missing one would create it, so that upgrade is aborted, and a version
 * change asked for meanwhile (the app's own upgrade) closes it. No import: this runs as a script
 * of its own (src/ui/warm-open.ts), ahead of the app's bundle.
 */
export const WARM_DB_NAME = 'heed';

/** What the early open found: the database (opened and let go), none yet (nothing made), or a refusal. */
export type WarmOpen = 'opened' | 'missing' | 'refused';

export const warmOpen = (factory: IDBFactory | undefined, name: string = WARM_DB_NAME): Promise<WarmOpen> => new Promise((resolve) => {
  if (factory === undefined) { resolve('refused'); return; }
  let missing = false;
  try {
    const request = factory.open(name);
    // no database yet: leave its creation to the app
    request.onupgradeneeded = () => { missing = true; request.transaction?.abort(); };
    request.onsuccess = () => {
      const db = request.result;
      db.onversionchange = () => { db.close(); };
      db.close();
      resolve('opened');
    };
    // the abort above (or a refusal) is not an error of the page
    request.onerror = (event) => { event.preventDefault(); resolve(missing ? 'missing' : 'refused'); };
  } catch {
    // a browser that refuses IndexedDB here: the app reports it when it opens the database
    resolve('refused');
  }
});
