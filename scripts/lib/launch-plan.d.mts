import type { StoreEngine } from './store-engine.mjs';
export type Mode = 'electron' | 'chromium' | 'serve';
export type ModeChoice = { ok: true; mode: Mode; reason: string } | { ok: false; error: string };
export type Env = Record<string, string | undefined>;
export declare const MODES: readonly Mode[];
export declare const DEFAULT_PORT: number;
export declare const chooseMode: (facts: { requested?: string; electronUsable: boolean; chromium: string | null; hasDisplay: boolean }) => ModeChoice;
export declare const hasDisplay: (env: Env) => boolean;
export declare const parsePort: (name: string, value: string | undefined) => { ok: true; port: number | null } | { ok: false; error: string };
export declare const chromiumProfileDir: (env: Env, home: string) => string;
export declare const appUrl: (url: string, mode: 'chromium' | 'serve', profileDir: string | null, backupSecret?: string | null, engine?: StoreEngine | null) => string;
/** Chromium features the app window switches off (one --disable-features switch). */
export declare const DISABLED_FEATURES: readonly string[];
export declare const chromiumArgs: (o: { url: string; profileDir: string; isRoot: boolean; debugPort: number | null; engine: StoreEngine }) => string[];
export declare const electronBinary: (root: string) => string | null;
export declare const findChromium: (env: Env) => string | null;
