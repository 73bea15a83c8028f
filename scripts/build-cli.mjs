#!/usr/bin/env node
// Bundles the `heed` command (src/cli/main.ts and everything it imports) into the ES module
// dist-cli/heed.mjs and the chunks it loads per verb (dist-cli/chunks/), so a run skips
// transpiling TypeScript on the fly and compiles only the code of its verb. bin/heed.js calls
// ensureCliBundle() on every run: it rebuilds only when the bundle is missing or one of the
// files that went into it (esbuild's own list, kept in dist-cli/heed.inputs.json) is newer.
// Run by hand: node scripts/build-cli.mjs
import { mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const SCRIPT = fileURLToPath(import.meta.url);
const ROOT = path.resolve(path.dirname(SCRIPT), '..');

/** Where the bundle and its list of inputs live, under `root`. */
export const cliPaths = (root = ROOT) => ({
  bundle: path.join(root, 'dist-cli', 'heed.mjs'),
  inputs: path.join(root, 'dist-cli', 'heed.inputs.json'),
});

const NPM_TREE = 'node_modules/.package-lock.json';
const WORKER = 'src/cli/boot-worker.ts';

const mtimeOf = (file) => {
  try {
    return statSync(file).mtimeMs;
  } catch {
    return null;
  }
};

/**
 * True when the bundle exists and no file that went into it (nor this script) changed since it
 * was built; a missing input also makes it stale. Reads only the small inputs list.
 */
export const cliBundleIsFresh = (root = ROOT) => {
  const { bundle, inputs } = cliPaths(root);
  const built = mtimeOf(bundle);
  if (built === null) return false;
  let list;
  try {
    list = JSON.parse(readFileSync(inputs, 'utf8'));
  } catch {
    return false;
  }
  if (!Array.isArray(list) || list.length === 0) return false;
  for (const rel of list) {
    const t = mtimeOf(path.join(root, rel));
    if (t === null || t > built) return false;
  }
  return true;
};

/**
 * Builds dist-cli/heed.mjs with esbuild. Several runs may build at once (parallel tests): each
 * writes its own temporary files and renames them into place, so a reader never sees half a
 * bundle. The bundle's mtime is set to the moment the build started, so a source saved during
 * the build still counts as newer and triggers the next rebuild.
 */
export const buildCli = async (root = ROOT) => {
  const { build } = await import('esbuild');
  const { bundle, inputs } = cliPaths(root);
  const started = Date.now() / 1000;
  const result = await build({
    absWorkingDir: root,
    // the CLI, and the bootstrap's second thread (src/cli/boot-threads.ts), which shares its chunks
    entryPoints: {
      [path.basename(bundle, '.mjs')]: 'src/cli/main.ts',
      ...(mtimeOf(path.join(root, WORKER)) === null ? {} : { 'boot-worker': WORKER }),
    },
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'esm',
    write: false,
    metafile: true,
    // Each verb's code in its own chunks, loaded when the verb runs: `heed analyze` does not
    // compile the bundle reader, the demo generator or the planner (a third of its start-up).
    splitting: true,
    outdir: path.dirname(bundle),
    entryNames: '[name]',
    chunkNames: 'chunks/[name]-[hash]',
    outExtension: { '.js': '.mjs' },
    logLevel: 'silent',
    legalComments: 'none',
    // Bundled CommonJS dependencies (papaparse, pngjs) call require(); give ESM output one.
    banner: { js: "import { createRequire as __heedRequire } from 'node:module'; const require = __heedRequire(import.meta.url);" },
  });
  const code = result.outputFiles.find((f) => f.path === bundle);
  if (code === undefined) throw new Error('esbuild produced no bundle');
  // Dependencies are covered by npm's own record of the installed tree (rewritten by every
  // install), which saves checking hundreds of files under node_modules on each run.
  const own = Object.keys(result.metafile.inputs).filter((f) => !f.startsWith('node_modules/'));
  const deps = mtimeOf(path.join(root, NPM_TREE)) === null ? Object.keys(result.metafile.inputs).filter((f) => f.startsWith('node_modules/')) : [NPM_TREE];
  const list = [...own, ...deps, path.relative(root, SCRIPT)];
  mkdirSync(path.dirname(bundle), { recursive: true });
  const tag = `${process.pid}-${Math.random().toString(36).slice(2)}`;
  // Chunks are named by their content, so one already there holds these very bytes; new ones
  // are written (and dated like the bundle) before the entry that imports them is renamed in.
  // Entries other than the bundle (the worker) are not named by content: always written anew.
  const chunks = result.outputFiles.filter((f) => f !== code);
  const entries = new Set(chunks.filter((f) => path.dirname(f.path) === path.dirname(bundle)).map((f) => f.path));
  for (const chunk of chunks) {
    if (!entries.has(chunk.path) && mtimeOf(chunk.path) !== null) continue;
    mkdirSync(path.dirname(chunk.path), { recursive: true });
    writeFileSync(`${chunk.path}.${tag}`, chunk.contents);
    utimesSync(`${chunk.path}.${tag}`, started, started);
    renameSync(`${chunk.path}.${tag}`, chunk.path);
  }
  // the chunks count as inputs: one missing makes the bundle stale
  for (const chunk of chunks) list.push(path.relative(root, chunk.path));
  try {
    writeFileSync(`${inputs}.${tag}`, JSON.stringify(list));
    writeFileSync(`${bundle}.${tag}`, code.contents);
    utimesSync(`${bundle}.${tag}`, started, started);
    renameSync(`${inputs}.${tag}`, inputs);
    renameSync(`${bundle}.${tag}`, bundle);
  } finally {
    rmSync(`${inputs}.${tag}`, { force: true });
    rmSync(`${bundle}.${tag}`, { force: true });
  }
  pruneChunks(path.join(path.dirname(bundle), 'chunks'), new Set(chunks.map((c) => c.path)));
  return { bundle, inputs: list.length };
};

// Chunks of earlier builds, once an hour old (a command started before this build may still be
// loading them), are removed so the folder does not grow with every rebuild.
const pruneChunks = (dir, keep) => {
  let names;
  try {
    names = readdirSync(dir);
  } catch {
    return;
  }
  for (const name of names) {
    const file = path.join(dir, name);
    const t = mtimeOf(file);
    if (!keep.has(file) && t !== null && t < Date.now() - 3_600_000) rmSync(file, { force: true });
  }
};

/**
 * The bundle's path when it is fresh or could be (re)built now, else null (no esbuild, a
 * read-only checkout...): the caller then falls back to the TypeScript loader.
 */
export const ensureCliBundle = async (root = ROOT) => {
  if (cliBundleIsFresh(root)) return cliPaths(root).bundle;
  try {
    return (await buildCli(root)).bundle;
  } catch {
    return null;
  }
};

if (process.argv[1] !== undefined && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  const t = performance.now();
  const { bundle, inputs } = await buildCli();
  console.log(`heed: built ${path.relative(ROOT, bundle)} from ${inputs} inputs in ${(performance.now() - t).toFixed(0)} ms`);
}
