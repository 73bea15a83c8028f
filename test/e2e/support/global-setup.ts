// Builds the renderer once and serves it on 127.0.0.1 for every e2e test file. The server takes
// backups (as `npm start`'s does) into a temporary folder, for pages opened with the secret
// (`?backup=SECRET`); pages opened without it have no backup folder, as in a plain static server.
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { createBackupFolder } from '../../../scripts/lib/backup-folder.mjs';
import { startStaticServer } from '../../../scripts/lib/static-server.mjs';

declare module 'vitest' {
  // Vitest's provided context is extended by declaration merging, which needs an interface.
  // oxlint-disable-next-line typescript/consistent-type-definitions
  export interface ProvidedContext {
    appUrl: string;
    backupDir: string;
    backupSecret: string;
  }
}

export default async function setup(project: TestProject) {
  const root = join(import.meta.dirname, '..', '..', '..');
  const outDir = join(root, 'test-results', 'e2e-app');
  execFileSync(process.execPath, [join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  const backupDir = mkdtempSync(join(tmpdir(), 'heed-e2e-backups-'));
  const backupSecret = randomBytes(32).toString('hex');
  const server = await startStaticServer({ root: outDir, backups: { folder: createBackupFolder({ root: backupDir }), secret: backupSecret } });
  project.provide('appUrl', server.url);
  project.provide('backupDir', backupDir);
  project.provide('backupSecret', backupSecret);
  return async () => { await server.close(); rmSync(backupDir, { recursive: true, force: true }); };
}
