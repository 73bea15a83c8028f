// The profile's IndexedDB engine: a new profile gets Chromium's SQLite engine, a profile that
// already holds LevelDB data keeps LevelDB (the SQLite engine would delete that data unmigrated,
// seen here with Chromium 156: the LevelDB folder was gone after one launch with the feature on),
// and the first decision is recorded and kept.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ENGINE_FILE, chooseStoreEngine, settleStoreEngine, storeEngineArgs, storeEngineNote } from '../../../scripts/lib/store-engine.mjs';

describe('chooseStoreEngine', () => {
  it('gives a new profile the SQLite engine and records it', () => {
    expect(chooseStoreEngine({ marker: null, levelDbStores: [] })).toEqual({ engine: 'sqlite', reason: 'a new profile', record: true });
  });

  it('keeps a profile with LevelDB data on LevelDB, saying why', () => {
    const choice = chooseStoreEngine({ marker: null, levelDbStores: ['Default/IndexedDB/http_127.0.0.1_5178.indexeddb.leveldb'] });
    expect(choice.engine).toBe('leveldb');
    expect(choice.reason).toContain('http_127.0.0.1_5178.indexeddb.leveldb');
    expect(choice.record).toBe(true);
  });

  it('keeps LevelDB data whatever was recorded: a Chromium without the SQLite engine may have written it', () => {
    const choice = chooseStoreEngine({ marker: 'sqlite', levelDbStores: ['IndexedDB/x.indexeddb.leveldb'] });
    expect(choice).toMatchObject({ engine: 'leveldb', record: true });
    expect(choice.reason).toMatch(/recorded as SQLite, so a Chromium without the SQLite engine has run on it/);
    expect(chooseStoreEngine({ marker: 'leveldb\n', levelDbStores: ['IndexedDB/x.indexeddb.leveldb'] })).toMatchObject({ engine: 'leveldb', record: false });
  });

  it('follows a recorded SQLite choice, and ignores a damaged or stale one', () => {
    expect(chooseStoreEngine({ marker: 'sqlite\n', levelDbStores: [] })).toMatchObject({ engine: 'sqlite', record: false });
    expect(chooseStoreEngine({ marker: 'ext4', levelDbStores: [] })).toMatchObject({ engine: 'sqlite', record: true });
    expect(chooseStoreEngine({ marker: 'leveldb', levelDbStores: [] })).toMatchObject({ engine: 'sqlite', record: true });
  });
});

describe('settleStoreEngine', () => {
  let dir = '';
  beforeEach(() => { dir = mkdtempSync(path.join(tmpdir(), 'heed-engine-')); });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('records the decision in the profile, and turns to LevelDB (recording it) when LevelDB folders appear', () => {
    expect(settleStoreEngine(dir).engine).toBe('sqlite');
    expect(readFileSync(path.join(dir, ENGINE_FILE), 'utf8')).toBe('sqlite\n');
    expect(settleStoreEngine(dir)).toMatchObject({ engine: 'sqlite', record: false });
    // a SQLite store's folder has no .leveldb suffix (seen with Chromium 156: Default/IndexedDB/http_127.0.0.1_5178)
    mkdirSync(path.join(dir, 'Default', 'IndexedDB', 'http_127.0.0.1_5178'), { recursive: true });
    expect(settleStoreEngine(dir).engine).toBe('sqlite');
    mkdirSync(path.join(dir, 'Default', 'IndexedDB', 'http_127.0.0.1_5178.indexeddb.leveldb'), { recursive: true });
    expect(settleStoreEngine(dir)).toMatchObject({ engine: 'leveldb', record: true });
    expect(readFileSync(path.join(dir, ENGINE_FILE), 'utf8')).toBe('leveldb\n');
  });

  it('looks in storage buckets too', () => {
    mkdirSync(path.join(dir, 'Default', 'WebStorage', '3', 'IndexedDB', 'indexeddb.leveldb'), { recursive: true });
    expect(settleStoreEngine(dir).engine).toBe('leveldb');
  });

  it('finds Chromium\'s and Electron\'s LevelDB folders', () => {
    mkdirSync(path.join(dir, 'IndexedDB', 'heed_app_0.indexeddb.leveldb'), { recursive: true });
    expect(settleStoreEngine(dir).engine).toBe('leveldb');
    expect(readFileSync(path.join(dir, ENGINE_FILE), 'utf8')).toBe('leveldb\n');
    const chromiumProfile = path.join(dir, 'c');
    mkdirSync(path.join(chromiumProfile, 'Default', 'IndexedDB', 'http_127.0.0.1_5178.indexeddb.leveldb'), { recursive: true });
    writeFileSync(path.join(chromiumProfile, 'Default', 'IndexedDB', 'not-a-store.txt'), '');
    expect(settleStoreEngine(chromiumProfile).engine).toBe('leveldb');
  });
});

describe('storeEngineArgs and storeEngineNote', () => {
  it('switch the feature on for SQLite only, and tell a LevelDB profile how to move', () => {
    expect(storeEngineArgs('sqlite')).toEqual(['--enable-features=IdbSqliteBackingStore']);
    expect(storeEngineArgs('leveldb')).toEqual([]);
    expect(storeEngineNote('leveldb', '/home/ana/.config/heed/chromium-profile')).toMatch(/save a study bundle.*move the folder \/home\/ana\/\.config\/heed\/chromium-profile aside/);
  });
});
