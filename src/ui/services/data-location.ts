/**
 * Where this window's data lives, and where the other launch modes keep theirs. Each mode has its
 * own database: IndexedDB lives in one browser profile, per address. The launcher passes the mode
 * (and the Chromium profile folder) in the query string (scripts/lib/launch-plan.mjs appUrl).
 */
export type DataLocation = { here: string; elsewhere: string[]; engine: string };

// Chromium's default IndexedDB engine can delete a whole database after a crash; the launcher
// starts new profiles on its SQLite engine instead (scripts/lib/store-engine.mjs).
const ENGINE_WORDS = {
  sqlite: 'Answers are written with Chromium’s SQLite storage engine, which kept every saved answer when the browser was killed in Heed’s tests.',
  leveldb: 'Warning: this workstation’s Heed data uses Chromium’s older LevelDB storage engine, which can delete the whole database after a crash. Save a study bundle of each study now. Then whoever looks after this workstation moves Heed’s data folder (named above) aside, so that Heed starts again on the safer engine, and you open the bundles there.',
  unknown: 'Heed cannot choose this browser’s storage engine: Chromium’s default one can delete the whole database after a crash. Save a study bundle after each session, or use Heed in its own window rather than a browser you opened yourself.',
} as const;

const engineWords = (store: string | null): string => (store === 'sqlite' || store === 'leveldb' ? ENGINE_WORDS[store] : ENGINE_WORDS.unknown);

const CHROMIUM_PROFILE = '~/.config/heed/chromium-profile (or $XDG_CONFIG_HOME/heed/chromium-profile)';
const ELECTRON_DATA = 'the Electron shell keeps its own database in its user-data folder (on Linux ~/.config/heed when started by npm start, ~/.config/Heed for a packaged build)';

export const dataLocation = (hostKind: 'electron' | 'browser', search: string, origin: string): DataLocation => {
  const store = new URLSearchParams(search).get('store');
  if (hostKind === 'electron') {
    return {
      here: 'Data of this window: the Electron shell’s own profile, in its user-data folder (on Linux ~/.config/heed when started by npm start, ~/.config/Heed for a packaged build).',
      elsewhere: [`the Chromium app window of npm start keeps its data in the profile ${CHROMIUM_PROFILE}`, 'a browser opened on the served address keeps it in that browser’s own profile'],
      engine: engineWords(store),
    };
  }
  const query = new URLSearchParams(search);
  const mode = query.get('mode');
  const profile = query.get('profile');
  if (mode === 'chromium') {
    return {
      here: `Data of this window: the Chromium profile at ${profile ?? CHROMIUM_PROFILE}, for the address ${origin}.`,
      elsewhere: [ELECTRON_DATA, `another browser, or another address or port, starts with an empty database of its own`],
      engine: engineWords(store),
    };
  }
  return {
    here: `Data of this window: this browser’s own profile, for the address ${origin} only${mode === 'serve' ? ' (npm start in serve mode)' : ''}.`,
    elsewhere: [`the Chromium app window of npm start keeps its data in the profile ${CHROMIUM_PROFILE}`, ELECTRON_DATA],
    engine: ENGINE_WORDS.unknown,
  };
};
