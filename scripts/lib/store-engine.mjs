// Which IndexedDB engine a Heed profile runs on. Chromium's default engine (LevelDB) deletes an
// origin's whole database when it finds a checksum mismatch on open, and a SIGKILL while a
// transaction is being written can leave one: measured here with bench/store-kill.ts. Chromium's
// SQLite engine (feature IdbSqliteBackingStore, write-ahead log) kept every committed write over
// the same kills. Switching an existing profile to it deletes the LevelDB data without migrating
// it, so a profile that holds LevelDB data stays on LevelDB until its studies are moved (save
// bundles, open them in a new profile), whatever was recorded before: a Chromium that ignored the
// switch may have written LevelDB data into a profile recorded as SQLite. The choice is written
// into the profile so a person can see it.
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const SQLITE_FEATURE = 'IdbSqliteBackingStore';
export const ENGINE_FILE = 'heed-store-engine';
export const ENGINES = Object.freeze(['sqlite', 'leveldb']);

/**
 * The pure decision. `marker` is the engine file's text (null when absent); `levelDbStores` the
 * LevelDB IndexedDB folders already in the profile.
 * @param {{ marker: string | null; levelDbStores: string[] }} facts
 * @returns {{ engine: 'sqlite' | 'leveldb'; reason: string; record: boolean }}
 */
export const chooseStoreEngine = ({ marker, levelDbStores }) => {
  const recorded = (marker ?? '').trim();
  if (levelDbStores.length > 0) {
    const held = `the profile holds LevelDB data (${levelDbStores.join(', ')}), which the SQLite engine would delete`;
    if (recorded === 'leveldb') return { engine: 'leveldb', reason: held, record: false };
    return {
      engine: 'leveldb',
      reason: recorded === 'sqlite' ? `${held}; it was recorded as SQLite, so a Chromium without the SQLite engine has run on it` : held,
      record: true,
    };
  }
  if (recorded === 'sqlite') return { engine: 'sqlite', reason: `recorded in the profile's ${ENGINE_FILE}`, record: false };
  return { engine: 'sqlite', reason: recorded === 'leveldb' ? 'recorded as LevelDB, but it holds no LevelDB data now' : 'a new profile', record: true };
};

// Chromium keeps IndexedDB in <profile>/Default/IndexedDB, Electron in <userData>/IndexedDB; other
// storage buckets under WebStorage/<n>/IndexedDB (from memory of Chromium's layout; Heed makes none).
const bucketDirs = (base) => {
  const full = path.join(base, 'WebStorage');
  if (!existsSync(full)) return [];
  return readdirSync(full).filter((n) => /^\d+$/.test(n)).map((n) => path.join(base, 'WebStorage', n, 'IndexedDB'));
};
const indexedDbDirs = (profileDir) => [path.join('Default', 'IndexedDB'), 'IndexedDB',
  ...bucketDirs(path.join(profileDir, 'Default')).map((d) => path.relative(profileDir, d)),
  ...bucketDirs(profileDir).map((d) => path.relative(profileDir, d))];

/** @param {string} profileDir */
export const readStoreEngineFacts = (profileDir) => {
  const file = path.join(profileDir, ENGINE_FILE);
  const marker = existsSync(file) ? readFileSync(file, 'utf8') : null;
  const levelDbStores = indexedDbDirs(profileDir).flatMap((dir) => {
    const full = path.join(profileDir, dir);
    if (!existsSync(full)) return [];
    return readdirSync(full).filter((name) => name.endsWith('indexeddb.leveldb')).map((name) => path.join(dir, name));
  });
  return { marker, levelDbStores };
};

/**
 * Decides the engine of the profile at `profileDir` and records a first decision in it (the folder
 * must exist). @param {string} profileDir
 */
export const settleStoreEngine = (profileDir) => {
  const decision = chooseStoreEngine(readStoreEngineFacts(profileDir));
  if (decision.record) writeFileSync(path.join(profileDir, ENGINE_FILE), `${decision.engine}\n`);
  return decision;
};

/** Chromium switches for an engine. @param {'sqlite' | 'leveldb'} engine */
export const storeEngineArgs = (engine) => (engine === 'sqlite' ? [`--enable-features=${SQLITE_FEATURE}`] : []);

/** What the launcher says about an engine, plainly. @param {'sqlite' | 'leveldb'} engine @param {string} profileDir */
export const storeEngineNote = (engine, profileDir) => engine === 'sqlite'
  ? 'answers are stored with Chromium\'s SQLite IndexedDB engine (it kept every saved answer when Chromium was killed)'
  : `WARNING: this profile stores answers with Chromium's LevelDB IndexedDB engine, which can delete the whole database after a crash. To move: save a study bundle of each study, close Heed, move the folder ${profileDir} aside, start Heed again (a new profile uses the SQLite engine) and open the bundles there.`;
