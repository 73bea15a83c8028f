// Electron entry (bundled to dist-electron/main.js): the renderer is dist/, the preload sits beside this file.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startApp } from './start-app';

const here = path.dirname(fileURLToPath(import.meta.url));
startApp({ distRoot: path.join(here, '..', 'dist'), preload: path.join(here, 'preload.cjs') });
