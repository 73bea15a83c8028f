import { dataLocation } from '../../../src/ui/services/data-location';

describe('where the data of each launch mode lives', () => {
  it('the Chromium window names its profile folder and the other modes', () => {
    const where = dataLocation('browser', '?mode=chromium&profile=%2Fhome%2Fana%2F.config%2Fheed%2Fchromium-profile', 'http://127.0.0.1:5178');
    expect(where.here).toBe('Data of this window: the Chromium profile at /home/ana/.config/heed/chromium-profile, for the address http://127.0.0.1:5178.');
    expect(where.elsewhere.join(' ')).toMatch(/Electron shell keeps its own database/);
  });

  it('a plain browser (serve mode, or no launcher) says the data is in that browser, per address', () => {
    expect(dataLocation('browser', '?mode=serve', 'http://127.0.0.1:5178').here).toMatch(/this browser’s own profile, for the address http:\/\/127.0.0.1:5178 only \(npm start in serve mode\)/);
    expect(dataLocation('browser', '', 'http://127.0.0.1:5178').elsewhere.join(' ')).toMatch(/chromium-profile.*Electron/);
  });

  it('says which storage engine holds the answers, and warns where it may lose them', () => {
    expect(dataLocation('browser', '?mode=chromium&store=sqlite', 'http://127.0.0.1:5178').engine).toMatch(/SQLite storage engine/);
    expect(dataLocation('browser', '?mode=chromium&store=leveldb', 'http://127.0.0.1:5178').engine).toMatch(/^Warning: .*LevelDB.*Save a study bundle/);
    expect(dataLocation('browser', '?mode=serve', 'http://127.0.0.1:5178').engine).toMatch(/cannot choose this browser’s storage engine/);
    expect(dataLocation('electron', '?store=leveldb', 'heed://app').engine).toMatch(/^Warning: .*LevelDB/);
    expect(dataLocation('electron', '?store=sqlite', 'heed://app').engine).toMatch(/SQLite storage engine/);
  });

  it('Electron says it keeps its own', () => {
    expect(dataLocation('electron', '', 'heed://app').here).toMatch(/Electron shell’s own profile/);
  });
});
