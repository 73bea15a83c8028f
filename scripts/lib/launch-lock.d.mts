export type LockHolder = { pid: number; startedAt: number; mode: string; url: string | null };
export type HeldLock = { ok: true; took: string | null; setUrl(url: string): void; release(): void };
export declare const LOCK_FILE: string;
export declare const UNSERVED_LIMIT_MS: number;
export declare const processIsAlive: (pid: number) => boolean;
export declare const parseLock: (text: string) => LockHolder | null;
export declare const judgeLock: (facts: { holder: LockHolder | null; alive: boolean; proves: boolean | null; now: number }) => { state: 'running' } | { state: 'stale'; reason: string };
export declare const acquireLaunchLock: (options: {
  dir: string;
  mode: string;
  pid?: number;
  now?: () => number;
  isAlive?: (pid: number) => boolean;
  proves?: (url: string) => Promise<boolean>;
}) => Promise<HeldLock | { ok: false; holder: LockHolder }>;
