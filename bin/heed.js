#!/usr/bin/env node
// The `heed` command: loads the TypeScript CLI through tsx's loader, so `npx heed` works right
// after `npm ci` with no build step.
import { register } from 'tsx/esm/api';

register();
await import('../src/cli/main.ts');
