import { chmodSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import {
  appUrl, chooseMode, chromiumArgs, chromiumProfileDir, electronBinary, findChromium, hasDisplay, parsePort,
} from '../../../scripts/lib/launch-plan.mjs';

const facts = { electronUsable: false, chromium: '/usr/bin/chromium', hasDisplay: true };

describe('chooseMode', () => {
  it('prefers Electron, then Chromium, then serve, when nothing is requested', () => {
    expect(chooseMode({ ...facts, electronUsable: true })).toMatchObject({ ok: true, mode: 'electron' });
    expect(chooseMode(facts)).toMatchObject({ ok: true, mode: 'chromium' });
    expect(chooseMode({ ...facts, chromium: null })).toMatchObject({ ok: true, mode: 'serve' });
  });

  it('only serves when there is no display, even with Electron installed', () => {
    const choice = chooseMode({ ...facts, electronUsable: true, hasDisplay: false });
    expect(choice).toMatchObject({ ok: true, mode: 'serve' });
    expect(choice.ok && choice.reason).toMatch(/no display/);
  });

  it('honours HEED_MODE, case and spaces aside', () => {
    expect(chooseMode({ ...facts, electronUsable: true, requested: 'serve' })).toMatchObject({ mode: 'serve' });
    expect(chooseMode({ ...facts, electronUsable: true, requested: ' Chromium ' })).toMatchObject({ mode: 'chromium' });
    expect(chooseMode({ ...facts, electronUsable: true, requested: 'electron' })).toMatchObject({ mode: 'electron' });
  });

  it('refuses an explicit mode that cannot run, saying why', () => {
    expect(chooseMode({ ...facts, requested: 'electron' })).toEqual({ ok: false, error: expect.stringMatching(/Electron binary is not installed/) });
    expect(chooseMode({ ...facts, chromium: null, requested: 'chromium' })).toEqual({ ok: false, error: expect.stringMatching(/no Chromium/) });
    expect(chooseMode({ ...facts, hasDisplay: false, requested: 'chromium' })).toEqual({ ok: false, error: expect.stringMatching(/no display/) });
    expect(chooseMode({ ...facts, requested: 'firefox' })).toEqual({ ok: false, error: expect.stringMatching(/HEED_MODE="firefox" is not one of electron, chromium, serve/) });
  });
});

describe('hasDisplay', () => {
  it('needs DISPLAY or WAYLAND_DISPLAY', () => {
    expect(hasDisplay({})).toBe(false);
    expect(hasDisplay({ DISPLAY: '' })).toBe(false);
    expect(hasDisplay({ DISPLAY: ':99' })).toBe(true);
    expect(hasDisplay({ WAYLAND_DISPLAY: 'wayland-0' })).toBe(true);
  });
});

describe('parsePort', () => {
  it('reads ports and treats empty as not given', () => {
    expect(parsePort('HEED_PORT', undefined)).toEqual({ ok: true, port: null });
    expect(parsePort('HEED_PORT', ' ')).toEqual({ ok: true, port: null });
    expect(parsePort('HEED_PORT', '5178')).toEqual({ ok: true, port: 5178 });
    expect(parsePort('HEED_PORT', '65535')).toEqual({ ok: true, port: 65535 });
  });

  it.each(['0', '65536', '-1', '80a', '1e3', '12.5'])('refuses %s naming the variable', (v) => {
    expect(parsePort('HEED_DEBUG_PORT', v)).toEqual({ ok: false, error: `HEED_DEBUG_PORT="${v}" is not a port number (1-65535)` });
  });
});

describe('chromiumProfileDir', () => {
  it('uses an absolute XDG_CONFIG_HOME, else ~/.config', () => {
    expect(chromiumProfileDir({ XDG_CONFIG_HOME: '/x/cfg' }, '/home/u')).toBe('/x/cfg/heed/chromium-profile');
    expect(chromiumProfileDir({}, '/home/u')).toBe('/home/u/.config/heed/chromium-profile');
    // The XDG spec says a relative value is invalid and must be ignored.
    expect(chromiumProfileDir({ XDG_CONFIG_HOME: 'cfg' }, '/home/u')).toBe('/home/u/.config/heed/chromium-profile');
  });
});

describe('chromiumArgs', () => {
  const base = { url: 'http://127.0.0.1:5178/', profileDir: '/p/heed/chromium-profile', isRoot: false, debugPort: null, engine: 'sqlite' as const };

  it('opens an app window on the URL with the persistent profile and background services off', () => {
    const args = chromiumArgs(base);
    expect(args[0]).toBe('--app=http://127.0.0.1:5178/');
    expect(args).toContain('--user-data-dir=/p/heed/chromium-profile');
    for (const flag of ['--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--disable-quic']) {
      expect(args).toContain(flag);
    }
    expect(args).not.toContain('--no-sandbox');
    expect(args.some((a) => a.startsWith('--remote-debugging-port'))).toBe(false);
  });

  it('adds --no-sandbox only as root, and a debugging port only when asked', () => {
    expect(chromiumArgs({ ...base, isRoot: true })).toContain('--no-sandbox');
    expect(chromiumArgs({ ...base, debugPort: 9333 })).toContain('--remote-debugging-port=9333');
  });

  it('switches off background resource fetching (so scripts run from the code cache), in one --disable-features', () => {
    const disabled = chromiumArgs(base).filter((a) => a.startsWith('--disable-features='));
    expect(disabled).toEqual(['--disable-features=BackgroundResourceFetch']);
  });

  it('turns on Chromium\'s SQLite IndexedDB engine for a SQLite profile only', () => {
    expect(chromiumArgs(base)).toContain('--enable-features=IdbSqliteBackingStore');
    expect(chromiumArgs({ ...base, engine: 'leveldb' }).some((a) => a.startsWith('--enable-features'))).toBe(false);
  });
});

describe('electronBinary and findChromium', () => {
  let dir: string;
  beforeEach(() => { dir = mkdtempSync(path.join(tmpdir(), 'heed-launch-')); });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('finds Electron only when path.txt names an executable that exists', () => {
    const pkg = path.join(dir, 'node_modules', 'electron');
    mkdirSync(path.join(pkg, 'dist'), { recursive: true });
    expect(electronBinary(dir)).toBeNull();
    writeFileSync(path.join(pkg, 'path.txt'), 'electron');
    expect(electronBinary(dir)).toBeNull();
    writeFileSync(path.join(pkg, 'dist', 'electron'), '#!/bin/sh\n');
    chmodSync(path.join(pkg, 'dist', 'electron'), 0o644);
    expect(electronBinary(dir)).toBeNull();
    chmodSync(path.join(pkg, 'dist', 'electron'), 0o755);
    expect(electronBinary(dir)).toBe(path.join(pkg, 'dist', 'electron'));
  });

  it('finds Chromium on PATH, or at HEED_CHROMIUM', () => {
    expect(findChromium({ PATH: dir })).toBeNull();
    const bin = path.join(dir, 'chromium-browser');
    writeFileSync(bin, '#!/bin/sh\n');
    chmodSync(bin, 0o755);
    expect(findChromium({ PATH: `/nonexistent${path.delimiter}${dir}` })).toBe(bin);
    expect(findChromium({ PATH: '', HEED_CHROMIUM: bin })).toBe(bin);
    expect(findChromium({ PATH: dir, HEED_CHROMIUM: path.join(dir, 'nope') })).toBeNull();
  });
});

describe('appUrl', () => {
  it('puts the mode and the profile folder in the query, keeping the origin (and so the database)', () => {
    const url = appUrl('http://127.0.0.1:5178/', 'chromium', '/home/ana/.config/heed/chromium-profile');
    expect(new URL(url).origin).toBe('http://127.0.0.1:5178');
    expect(new URL(url).searchParams.get('mode')).toBe('chromium');
    expect(new URL(url).searchParams.get('profile')).toBe('/home/ana/.config/heed/chromium-profile');
    expect(new URL(appUrl('http://127.0.0.1:5178/', 'serve', null)).search).toBe('?mode=serve');
    expect(new URL(appUrl('http://127.0.0.1:5178/', 'chromium', '/p', null, 'leveldb')).searchParams.get('store')).toBe('leveldb');
  });
});
