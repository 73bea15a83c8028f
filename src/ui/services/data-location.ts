/**
 * Where this window's data lives, and where the other launch modes keep theirs. Each mode has its
 * own database: IndexedDB lives in one browser profile, per address. The launcher passes the mode
 * (and the Chromium profile folder) in the query string (scripts/lib/launch-plan.mjs appUrl).
 */
export type DataLocation = { here: string; elsewhere: string[] };

const CHROMIUM_PROFILE = '~/.config/heed/chromium-profile (or $XDG_CONFIG_HOME/heed/chromium-profile)';
const ELECTRON_DATA = 'the Electron shell keeps its own database in its user-data folder (on Linux ~/.config/heed when started by npm start, ~/.config/Heed for a packaged build)';

export const dataLocation = (hostKind: 'electron' | 'browser', search: string, origin: string): DataLocation => {
  if (hostKind === 'electron') {
    return {
      here: 'Data of this window: the Electron shell’s own profile, in its user-data folder (on Linux ~/.config/heed when started by npm start, ~/.config/Heed for a packaged build).',
      elsewhere: [`the Chromium app window of npm start keeps its data in the profile ${CHROMIUM_PROFILE}`, 'a browser opened on the served address keeps it in that browser’s own profile'],
    };
  }
  const query = new URLSearchParams(search);
  const mode = query.get('mode');
  const profile = query.get('profile');
  if (mode === 'chromium') {
    return {
      here: `Data of this window: the Chromium profile at ${profile ?? CHROMIUM_PROFILE}, for the address ${origin}.`,
      elsewhere: [ELECTRON_DATA, `another browser, or another address or port, starts with an empty database of its own`],
    };
  }
  return {
    here: `Data of this window: this browser’s own profile, for the address ${origin} only${mode === 'serve' ? ' (npm start in serve mode)' : ''}.`,
    elsewhere: [`the Chromium app window of npm start keeps its data in the profile ${CHROMIUM_PROFILE}`, ELECTRON_DATA],
  };
};
