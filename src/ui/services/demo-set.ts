/**
 * The demo case set is generated on first launch (never shipped as images) and stored like any
 * other set. One fixed id, so two windows starting at once cannot store it twice.
 */
import type { CaseImage, CaseSetManifest } from '../../core/case-set';
import { saveCaseSet } from '../../store/case-sets';
import type { HeedDb } from '../../store/db';

export const DEMO_SET_ID = 'demo-vesper-valley';

const generateInWorker = (): Promise<{ manifest: CaseSetManifest; images: CaseImage[] }> =>
  new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./demo-worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<{ manifest: CaseSetManifest; images: CaseImage[] }>) => { worker.terminate(); resolve(event.data); };
    worker.onerror = (event) => { worker.terminate(); reject(new Error(`demo generator failed: ${event.message}`)); };
    worker.postMessage('generate');
  });

let pending: Promise<void> | null = null;

export const ensureDemoCaseSet = (db: HeedDb): Promise<void> => {
  pending ??= (async () => {
    if (await db.caseSets.get(DEMO_SET_ID)) return;
    const { manifest, images } = await generateInWorker();
    if (await db.caseSets.get(DEMO_SET_ID)) return;
    await saveCaseSet(db, { name: manifest.name, source: 'demo', manifest, images }, DEMO_SET_ID);
  })().finally(() => { pending = null; });
  return pending;
};
