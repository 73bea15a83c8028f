// Runs Doyensec's Electronegativity (the Electron security scanner) over the files that make up
// Heed's shell, offline. Two shims make it run here: its TypeScript parser must load the
// TypeScript 4.2 it ships with (the project's own TypeScript 7 has no JavaScript API), and its
// HTTP client is replaced so nothing is fetched (translations, Electron's release list).
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import Module, { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
/** What is scanned: the Electron main, preload and window code, and the page with its CSP. */
export const SCANNED = Object.freeze(['electron', 'index.html']);
// Needs the network (Electron's release list); the Electron version is pinned in package.json instead.
export const SKIPPED_CHECKS = Object.freeze(['AvailableSecurityFixesGlobalCheck']);

let shimmed = false;
const shim = (scannerRoot) => {
  if (shimmed) return;
  shimmed = true;
  const ownTypeScript = path.join(scannerRoot, 'node_modules', 'typescript');
  const offlineGot = path.join(here, 'offline-got.cjs');
  // Node's CommonJS resolver is internal, but it is the one place to redirect a require.
  // oxlint-disable-next-line no-underscore-dangle
  const original = Module._resolveFilename;
  // oxlint-disable-next-line no-underscore-dangle
  Module._resolveFilename = function resolve(request, parent, ...rest) {
    const from = parent?.filename ?? '';
    if (request === 'typescript' && from.includes(`${path.sep}@typescript-eslint${path.sep}`)) return original.call(this, ownTypeScript, parent, ...rest);
    if (request === 'got' && from.startsWith(scannerRoot)) return offlineGot;
    return original.call(this, request, parent, ...rest);
  };
};

/**
 * Scans copies of `files` (paths relative to `root`) in a fresh folder, so the scanner sees the
 * shell and its page together and nothing else. Returns the findings with paths relative to root.
 * The scanner itself is Heed's own (node_modules), whatever `root` is.
 * @param {{ root: string; files?: readonly string[]; electronVersion: string }} o
 */
export const scanShell = async ({ root, files = SCANNED, electronVersion }) => {
  const require = createRequire(path.join(here, '..', '..', 'package.json'));
  const scannerRoot = path.dirname(require.resolve('@doyensec/electronegativity/package.json'));
  shim(scannerRoot);
  const run = require(path.join(scannerRoot, 'dist', 'runner.js'));
  const work = mkdtempSync(path.join(tmpdir(), 'heed-scan-'));
  try {
    for (const file of files) cpSync(path.join(root, file), path.join(work, file), { recursive: true });
    // The scanner prints progress lines with console.log; keep them out of Heed's output.
    const log = console.log;
    console.log = () => undefined;
    let result;
    try {
      result = await run({
        input: work, electronVersionOverride: electronVersion, isRelative: true,
        customScan: [], excludeFromScan: SKIPPED_CHECKS.map((c) => c.toLowerCase()), parserPlugins: [],
      }, false);
    } finally {
      console.log = log;
    }
    const failedFiles = result.errors.filter((e) => !e.tolerable).map((e) => `${path.relative(work, e.file)}: ${e.message}`);
    const findings = result.issues.map((issue) => ({
      id: issue.id,
      severity: issue.severity.name,
      confidence: issue.confidence.name,
      file: issue.file === 'N/A' ? 'N/A' : path.relative(work, path.resolve(work, issue.file)).split(path.sep).join('/'),
      line: issue.location.line,
      column: issue.location.column,
      description: issue.description,
    }));
    return { findings, failedFiles };
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
};
