/**
 * The renderer as the benchmarks see it: a fresh production build served on 127.0.0.1 by the
 * project's own static server, plus fresh Chromium profiles that are removed afterwards.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startStaticServer } from '../../scripts/lib/static-server.mjs';

export const ROOT = join(import.meta.dirname, '..', '..');
export const RESULTS_DIR = join(ROOT, 'bench-results');

export type ServedApp = { url: string; buildMs: number; close: () => Promise<void> };

export const buildAndServe = async (): Promise<ServedApp> => {
  const outDir = mkdtempSync(join(tmpdir(), 'heed-bench-app-'));
  const started = performance.now();
  execFileSync(process.execPath, [join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: ROOT, stdio: ['ignore', 'ignore', 'inherit'] });
  const buildMs = performance.now() - started;
  const server = await startStaticServer({ root: outDir });
  return {
    url: server.url, buildMs,
    close: async () => { await server.close(); rmSync(outDir, { recursive: true, force: true }); },
  };
};

export const benchProfileDir = (): string => mkdtempSync(join(tmpdir(), 'heed-bench-profile-'));

