// Whether a build output is stale: compare the newest modification time of the inputs with the
// newest of the output. Missing output is always stale.
import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';

const SKIP = new Set(['node_modules', '.git']);

/** Newest mtime (ms) of the files under the given paths, or null when none exists. */
export const newestMtime = (paths) => {
  let newest = null;
  const visit = (p) => {
    let info;
    try {
      info = statSync(p);
    } catch {
      return;
    }
    if (info.isDirectory()) {
      for (const name of readdirSync(p)) if (!SKIP.has(name)) visit(path.join(p, name));
    } else if (info.isFile() && (newest === null || info.mtimeMs > newest)) {
      newest = info.mtimeMs;
    }
  };
  for (const p of paths) visit(p);
  return newest;
};

/**
 * True when the output must be rebuilt: no output at all, or some input newer than the newest
 * output file. No inputs (an odd checkout) with an output present means nothing to do.
 * @param {{ inputs: number | null; output: number | null }} mtimes
 */
export const needsRebuild = ({ inputs, output }) => output === null || (inputs !== null && inputs > output);

/** The renderer's inputs and output, relative to the project root. */
export const RENDERER = Object.freeze({
  inputs: ['src', 'demo-cases/generator', 'index.html', 'vite.config.ts', 'assets', 'package.json'],
  output: ['dist'],
});

/** The Electron main/preload bundle's inputs and output. */
export const ELECTRON = Object.freeze({
  inputs: ['electron', 'scripts/lib/web-policy.mjs', 'scripts/build-electron.mjs'],
  output: ['dist-electron'],
});

/** needsRebuild for one of the targets above, under `root`. */
export const targetIsStale = (root, target) =>
  needsRebuild({
    inputs: newestMtime(target.inputs.map((p) => path.join(root, p))),
    output: newestMtime(target.output.map((p) => path.join(root, p))),
  });
