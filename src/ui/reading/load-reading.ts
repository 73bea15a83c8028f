/**
 * The reading view's chunk, loaded on first use rather than with the start screen (relaunch time,
 * bench/cold-start.ts). A screen from which reading can start calls `preloadReading()` when it
 * shows, so the chunk is usually in by the time a reader clicks; the import is made once.
 */
import type * as ReadViewModule from './ReadView';

type Chunk = typeof ReadViewModule;

let loading: Promise<Chunk> | null = null;

export const loadReading = (): Promise<Chunk> => {
  loading ??= import('./ReadView');
  // a failed fetch (e.g. the server went away) is tried again on the next use
  loading.catch(() => { loading = null; });
  return loading;
};

/** Starts loading the reading view in the background; a failure is left to the real use. */
export const preloadReading = (): void => { loadReading().catch(() => undefined); };
