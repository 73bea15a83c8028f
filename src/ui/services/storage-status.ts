/**
 * Persistent storage: Heed asks the browser once per launch not to evict its database under disk
 * pressure (navigator.storage.persist()), and reports the answer with the space used.
 */
export type StorageStatus = { persisted: boolean | null; usage: number | null; quota: number | null };

let asked: Promise<StorageStatus> | null = null;

export const persistentStorage = (): Promise<StorageStatus> => {
  asked ??= (async () => {
    const storage = typeof navigator === 'undefined' ? undefined : navigator.storage;
    if (!storage) return { persisted: null, usage: null, quota: null };
    let persisted = await storage.persisted().catch(() => false);
    if (!persisted) persisted = await storage.persist().catch(() => false);
    const estimate = await storage.estimate().catch(() => ({ usage: undefined, quota: undefined }));
    return { persisted, usage: estimate.usage ?? null, quota: estimate.quota ?? null };
  })();
  return asked;
};

export const megabytes = (bytes: number): string => `${(bytes / 1_000_000).toFixed(bytes < 10_000_000 ? 1 : 0)} MB`;
