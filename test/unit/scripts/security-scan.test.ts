// `npm run scan`: Electronegativity 1.10.3 (Doyensec's Electron security scanner) over electron/
// and index.html, offline. It passes on Heed's shell with every accepted finding explained, and it
// fails on a copy of the shell with context isolation switched off (a HIGH finding, CONTEXT_ISOLATION_JS_CHECK).
import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { compareFindings, parseAccepted } from '../../../scripts/lib/scan-findings.mjs';

const scan = (args: string[] = []) => spawnSync(process.execPath, [path.resolve('scripts/scan.mjs'), ...args], { encoding: 'utf8', timeout: 60_000 });
const finding = (id: string, severity: string, file: string) => ({ id, severity, file });
const why = 'a reason long enough to explain';

describe('accepted findings', () => {
  it('needs an id, a file and a reason of a few words for every entry', () => {
    expect(parseAccepted({ accepted: [{ id: 'A', file: 'f', reason: why }] })).toEqual({ ok: true, accepted: [{ id: 'A', file: 'f', reason: why }] });
    expect(parseAccepted([])).toEqual({ ok: false, error: 'the accepted list must be an object with an "accepted" array' });
    expect(parseAccepted({ accepted: [{ id: 'A', file: 'f' }] })).toEqual({ ok: false, error: 'accepted[0].reason must be a non-empty text' });
    expect(parseAccepted({ accepted: [{ id: 'A', file: 'f', reason: 'fine' }] })).toEqual({ ok: false, error: 'accepted[0].reason is too short to say why the finding is accepted' });
    expect(parseAccepted({ accepted: [null] })).toEqual({ ok: false, error: 'accepted[0] is not an object' });
  });

  it('blocks a HIGH finding unless accepted for that file; other severities are only listed', () => {
    const accepted = [{ id: 'KNOWN', file: 'electron/window.ts', reason: why }, { id: 'GONE', file: 'x', reason: why }];
    const result = compareFindings([
      finding('KNOWN', 'HIGH', 'electron/window.ts'),
      finding('KNOWN', 'HIGH', 'electron/main.ts'),
      finding('OTHER', 'MEDIUM', 'index.html'),
    ], accepted);
    expect(result.known.map((f) => f.file)).toEqual(['electron/window.ts']);
    expect(result.blocking).toEqual([finding('KNOWN', 'HIGH', 'electron/main.ts')]);
    expect(result.notes).toEqual([finding('OTHER', 'MEDIUM', 'index.html')]);
    expect(result.unused).toEqual([accepted[1]]);
  });

  it('the committed list is valid', () => {
    expect(parseAccepted(JSON.parse(readFileSync('scripts/security-scan-accepted.json', 'utf8'))).ok).toBe(true);
  });
});

describe('npm run scan', () => {
  it('passes on Heed\'s shell: every finding is accepted with its reason, none left over', () => {
    const run = scan();
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('scan: no HIGH finding outside the accepted list');
    expect(run.stdout).not.toContain('to review');
    expect(run.stdout).not.toContain('no longer reported');
  });

  it('fails on a shell with context isolation switched off', () => {
    const root = mkdtempSync(path.join(tmpdir(), 'heed-scan-bad-'));
    cpSync('electron', path.join(root, 'electron'), { recursive: true });
    cpSync('index.html', path.join(root, 'index.html'));
    const window = path.join(root, 'electron', 'window.ts');
    const source = readFileSync(window, 'utf8');
    expect(source).toContain('contextIsolation: true,');
    writeFileSync(window, source.replace('contextIsolation: true,', 'contextIsolation: false,'));
    const run = scan(['--root', root]);
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/NEW HIGH {2}CONTEXT_ISOLATION_JS_CHECK \(HIGH, \w+\) electron\/window\.ts:\d+/);
    expect(run.stderr).toContain('scan: 1 HIGH finding(s) not accepted');
  });
});
