/**
 * A profile that already holds data in Chromium's older LevelDB IndexedDB engine keeps that engine
 * (switching would delete its data; scripts/lib/store-engine.mjs), so Heed must keep working on it.
 * The rest of the e2e suite runs on the SQLite engine, as new profiles do; this file covers the
 * older path end to end: answers survive a normal restart, the launcher's detection recognises the
 * folder Chromium really wrote (its unit tests use made-up folders), a new profile is not taken for
 * a LevelDB one, and the start screen warns with the way to move.
 */
import Papa from 'papaparse';
import { inject } from 'vitest';
import { readStoreEngineFacts, settleStoreEngine } from '../../scripts/lib/store-engine.mjs';
import { newProfileDir, removeProfileDir, startChromium, type RunningChromium } from './support/chromium';
import { homePage, readingPage, studyPage } from './support/pages';

const STUDY = 'Older profile';
const ANSWERS = 4;

describe('a profile on the LevelDB engine', () => {
  const url = `${inject('appUrl')}?mode=chromium&store=leveldb`;
  const profile = newProfileDir();
  let chrome: RunningChromium | null = null;
  afterAll(async () => { await chrome?.stop(); removeProfileDir(profile); });

  it('keeps its answers across a restart, is recognised by the launcher, and is warned about', async () => {
    // before Chromium has written anything, the launcher would give the profile the SQLite engine
    expect(readStoreEngineFacts(profile).levelDbStores).toEqual([]);

    chrome = await startChromium(profile, url, 'leveldb');
    let page = chrome.page;
    await homePage(page).waitUntilReady();
    await homePage(page).newStudy({ name: STUDY, aidedMode: 'concurrent', washoutDays: 0 });
    await studyPage(page).enrol('Q1');
    await studyPage(page).enrolled('Q1');
    await readingPage(page).waitForCase(await studyPage(page).startPeriod('Q1', 1));
    const reading = readingPage(page);
    const answered: string[] = [];
    while (answered.length < ANSWERS) {
      const { caseId } = await reading.state();
      await reading.answerByKeys((answered.length % 2) as 0 | 1, 3 + answered.length);
      answered.push(caseId);
    }
    await chrome.stop(); // a normal close: LevelDB is only unsafe under a crash
    chrome = null;

    // the folder Chromium wrote is the one the launcher looks for, so this profile stays on LevelDB
    const facts = readStoreEngineFacts(profile);
    expect(facts.levelDbStores.length).toBeGreaterThan(0);
    expect(settleStoreEngine(profile).engine).toBe('leveldb');
    expect(readStoreEngineFacts(profile).marker).toMatch(/leveldb/);

    chrome = await startChromium(profile, url, 'leveldb');
    page = chrome.page;
    await homePage(page).waitUntilReady();
    const warning = page.getByText(/older LevelDB storage engine, which can delete the whole database after a crash\. Save a study bundle/);
    await warning.waitFor();
    await homePage(page).openStudy(STUDY);
    // the four answers are stored, in the order given
    const log = await studyPage(page).exportText(/Save read log/);
    const rows = Papa.parse<Record<string, string>>(log, { header: true, skipEmptyLines: true }).data;
    expect(rows.map((row) => row.case_id)).toEqual(answered);
  }, 180_000);
});
