#!/usr/bin/env node
// Bundles the Electron main process (ES module, dist-electron/main.js) and the sandboxed preload
// (CommonJS, dist-electron/preload.cjs: sandboxed preloads cannot load ES modules) with esbuild.
import { build } from 'esbuild';
import { rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const out = path.join(root, 'dist-electron');
rmSync(out, { recursive: true, force: true });

const common = {
  bundle: true,
  platform: 'node',
  target: 'node22',
  external: ['electron'],
  sourcemap: true,
  logLevel: 'warning',
  absWorkingDir: root,
};

await Promise.all([
  build({
    ...common,
    entryPoints: ['electron/main.ts'],
    outfile: path.join(out, 'main.js'),
    format: 'esm',
    // Bundled CommonJS dependencies may call require(); give ESM output one.
    banner: { js: "import { createRequire as __heedRequire } from 'node:module'; const require = __heedRequire(import.meta.url);" },
  }),
  build({
    ...common,
    entryPoints: ['electron/preload.ts'],
    outfile: path.join(out, 'preload.cjs'),
    format: 'cjs',
  }),
]);
console.log('heed: built dist-electron/main.js and dist-electron/preload.cjs');
