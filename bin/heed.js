#!/usr/bin/env node
// The `heed` command. Runs the pre-built bundle dist-cli/heed.mjs, building it first (esbuild,
// about a tenth of a second) when it is missing or older than any file that went into it; when
// it cannot be built, loads the TypeScript CLI through tsx's loader instead. Either way `npx heed`
// works right after `npm ci` with no build step. HEED_CLI_LOADER=tsx forces the loader.
import { pathToFileURL } from 'node:url';
import { ensureCliBundle } from '../scripts/build-cli.mjs';

const bundle = process.env.HEED_CLI_LOADER === 'tsx' ? null : await ensureCliBundle();
if (bundle !== null) {
  await import(pathToFileURL(bundle).href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  await import('../src/cli/main.ts');
}
