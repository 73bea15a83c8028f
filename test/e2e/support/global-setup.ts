// Builds the renderer once and serves it on 127.0.0.1 for every e2e test file.
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { startStaticServer } from '../../../scripts/lib/static-server.mjs';

declare module 'vitest' {
  // Vitest's provided context is extended by declaration merging, which needs an interface.
  // oxlint-disable-next-line typescript/consistent-type-definitions
  export interface ProvidedContext {
    appUrl: string;
  }
}

export default async function setup(project: TestProject) {
  const root = join(import.meta.dirname, '..', '..', '..');
  const outDir = join(root, 'test-results', 'e2e-app');
  execFileSync(process.execPath, [join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  const server = await startStaticServer({ root: outDir });
  project.provide('appUrl', server.url);
  return async () => { await server.close(); };
}
