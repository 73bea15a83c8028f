#!/usr/bin/env node
// `npm run scan`: the Electron security scanner over Heed's shell (electron/ and index.html).
// Fails (exit 1) on a HIGH finding that scripts/security-scan-accepted.json does not accept with
// a reason; lists the accepted ones and the rest. `--root DIR` scans another copy (used by tests).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { compareFindings, parseAccepted } from './lib/scan-findings.mjs';
import { scanShell } from './lib/security-scan.mjs';

const repo = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const args = process.argv.slice(2);
const rootAt = args.indexOf('--root');
const root = rootAt >= 0 && args[rootAt + 1] ? path.resolve(args[rootAt + 1]) : repo;
const fail = (line) => {
  console.error(`scan: ${line}`);
  process.exit(1);
};

const acceptedFile = path.join(repo, 'scripts', 'security-scan-accepted.json');
let parsed;
try {
  parsed = parseAccepted(JSON.parse(readFileSync(acceptedFile, 'utf8')));
} catch (error) {
  fail(`cannot read ${path.relative(repo, acceptedFile)}: ${error.message}`);
}
if (!parsed.ok) fail(`${path.relative(repo, acceptedFile)}: ${parsed.error}`);

const electronVersion = JSON.parse(readFileSync(path.join(repo, 'package.json'), 'utf8')).devDependencies.electron;
const started = Date.now();
const { findings, failedFiles } = await scanShell({ root, electronVersion });
if (failedFiles.length > 0) fail(`the scanner could not read ${failedFiles.join('; ')}`);
const { blocking, known, notes, unused } = compareFindings(findings, parsed.accepted);
const where = (f) => `${f.id} (${f.severity}, ${f.confidence}) ${f.file}:${f.line}`;

console.log(`scan: Electronegativity over electron/ and index.html (Electron ${electronVersion}), ${findings.length} findings in ${Date.now() - started} ms`);
for (const f of known) console.log(`  accepted  ${where(f)}: ${f.reason}`);
for (const f of notes) console.log(`  to review ${where(f)}: ${f.description}`);
for (const a of unused) console.log(`  no longer reported, remove from the accepted list: ${a.id} ${a.file}`);
if (blocking.length > 0) {
  for (const f of blocking) console.error(`  NEW HIGH  ${where(f)}: ${f.description}`);
  fail(`${blocking.length} HIGH finding(s) not accepted; fix them, or accept each in ${path.relative(repo, acceptedFile)} with the reason`);
}
console.log('scan: no HIGH finding outside the accepted list');
