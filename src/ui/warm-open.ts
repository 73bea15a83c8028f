/** The page's first script: starts opening the database while the app's bundle loads (store/warm-open.ts). */
import { warmOpen } from '../store/warm-open';

void warmOpen(typeof indexedDB === 'undefined' ? undefined : indexedDB);
