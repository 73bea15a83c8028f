/**
 * Answer scales, training sessions and the reading-view defects (issues 7 and 9), as a coordinator
 * and a reader do it: a five-point study read with keys 1-5 whose export `heed analyze` turns into
 * the AUC a Mann-Whitney count by hand gives; a training study that shows the truth after each
 * commit and marks its reads; practice that shows the truth and then announces the study cases;
 * pausing on leaving full screen; the unset slider; dark sliders.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { decode } from 'fast-png';
import Papa from 'papaparse';
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { signalCount, useChromiumProfile, waitForSignal } from './support/chromium';
import { writeCaseFolder } from './support/case-folder';
import { homePage, readingPage, studyPage, type DesignChoices } from './support/pages';

const SHOTS = join(import.meta.dirname, '..', '..', 'test-results', 'screens');
mkdirSync(SHOTS, { recursive: true });
const CASES = 12;
const PRACTICE = 2;

/** Imports a fresh invented case folder, makes the study, enrols the readers; returns the set name. */
const setUp = async (page: Page, design: Omit<DesignChoices, 'caseSet'>, readers: string[]) => {
  const folder = writeCaseFolder(CASES, PRACTICE);
  await homePage(page).waitUntilReady();
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Import a folder…' }).click()]);
  await chooser.setFiles(folder.dir);
  await page.getByRole('status').filter({ hasText: 'Imported' }).waitFor();
  await homePage(page).newStudy({ ...design, caseSet: folder.name, findings: ['mass'] });
  for (const code of readers) { await studyPage(page).enrol(code); await studyPage(page).enrolled(code); }
};

const backToStudy = async (page: Page) => {
  await page.getByRole('button', { name: 'Done: hand back the workstation' }).click();
  await page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
};

// AUC as P(positive rated above negative) + ½ P(tie): the Mann-Whitney count (Hanley & McNeil
// 1982, Radiology 143:29, eq. 1), done here by hand over every pair, independent of Heed's code.
const mannWhitney = (pos: number[], neg: number[]): number => {
  let s = 0;
  for (const p of pos) for (const n of neg) s += p > n ? 1 : p === n ? 0.5 : 0;
  return s / (pos.length * neg.length);
};

describe('five-point scale: keys 1-5 to the export and heed analyze', () => {
  const browser = useChromiumProfile(inject('appUrl'));
  it('exports the ratings pressed, calls from the threshold, and AUCs equal to a count by hand', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    await setUp(page, { name: 'Five-point harbour', aidedMode: 'concurrent', scale: 'five-point' }, ['F1', 'F2']);
    const pressed = new Map<string, number>();
    for (const code of ['F1', 'F2']) {
      const painted = await studyPage(page).startPeriod(code, 1);
      const reading = readingPage(page);
      await reading.waitForCase(painted);
      await page.getByRole('radiogroup', { name: 'Rating' }).waitFor();
      for (let i = 0; !(await reading.isDone()); i++) {
        const s = await reading.state();
        const rating = 1 + ((i * 3 + code.length + (code === 'F2' ? 2 : 0)) % 5);
        if (i === PRACTICE + 1) await page.screenshot({ path: join(SHOTS, 'five-point.png') });
        await reading.commitWithKeys([String(rating)]);
        pressed.set(`${code}/${s.caseId}`, rating);
      }
      await backToStudy(page);
    }
    const log = await studyPage(page).exportText(/Save read log/);
    const rows = Papa.parse<Record<string, string>>(log, { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(2 * (CASES + PRACTICE));
    for (const r of rows) {
      expect(r.scale).toBe('five-point');
      expect(Number(r.final_rating)).toBe(pressed.get(`${r.reader_id}/${r.case_id}`));
      expect(r.final_call).toBe(Number(r.final_rating) >= 4 ? '1' : '0'); // the default threshold: 4 or more is present
      expect(r.final_confidence).toBe('');
      expect([r.training, r.withdrawn]).toEqual(['0', '0']);
    }
    const dir = mkdtempSync(join(tmpdir(), 'heed-five-'));
    writeFileSync(join(dir, 'reads.csv'), log);
    const report = JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'analyze', join(dir, 'reads.csv'), '--json', '--boot', '0'], { encoding: 'utf8' }));
    for (const code of ['F1', 'F2']) {
      const main = rows.filter((r) => r.reader_id === code && r.practice === '0');
      const ratings = (truth: string) => main.filter((r) => r.truth === truth).map((r) => Number(r.final_rating));
      const entry = report.readers.find((x: { reader_id: string }) => x.reader_id === code);
      const section = entry.unaided ?? entry.aided;
      expect(section.auc.estimate).toBeCloseTo(mannWhitney(ratings('1'), ratings('0')), 12);
      expect(section.brier).toBeNull(); // five-point states no probability
    }
  });
});

describe('training study: the truth after each commit, reads marked', () => {
  const browser = useChromiumProfile(inject('appUrl'));
  it('shows truth, suggestion right or wrong and followed or not; resumes after a crash at the next case; exports training = 1', async () => {
    let chrome = await browser.launch();
    let page = chrome.page;
    await setUp(page, { name: 'Harbour training', aidedMode: 'concurrent', training: true }, ['T1', 'T2']);
    const aidedFirst = (await studyPage(page).sequenceOf('T1')) === 'AU' ? 'T1' : 'T2';
    const painted = await studyPage(page).startPeriod(aidedFirst, 1);
    const reading = readingPage(page);
    await reading.waitForCase(painted);
    const truths: string[] = [];
    for (let i = 0; i < PRACTICE + 3; i++) truths.push(...await reading.commitWithKeys([i % 2 === 0 ? 'p' : 'a', '7']));
    expect(truths).toHaveLength(PRACTICE + 3); // one after every case: practice and training alike
    for (const t of truths) {
      expect(t).toMatch(/Finding “mass” was (present|absent)/);
      expect(t).toMatch(/Your answer: (present|absent): (right|not right)/);
      expect(t).toMatch(/The suggestion \((present|absent)\) was (right|wrong); you (followed it|did not follow it)/);
    }
    expect(truths[PRACTICE]).toMatch(/^Training: the truth/);

    // commit one more, then crash while its truth is on screen: the answer is already saved
    const before = await reading.state();
    await page.keyboard.press('p');
    await page.keyboard.press('8');
    await page.keyboard.press('Enter');
    await page.getByRole('dialog', { name: 'The truth' }).waitFor();
    await page.screenshot({ path: join(SHOTS, 'training-truth.png') });
    await chrome.kill();
    chrome = await browser.launch();
    page = chrome.page;
    await homePage(page).waitUntilReady();
    await homePage(page).resume(new RegExp(`Resume ${aidedFirst}, period 1`));
    await readingPage(page).waitForCase(0);
    const resumed = await readingPage(page).state();
    expect(resumed.caseId).not.toBe(before.caseId);
    expect(resumed.progress).toBe('Case 5 of 12'); // the crashed case (4) was committed
    while (!(await readingPage(page).isDone())) await readingPage(page).commitWithKeys(['a', '5']);
    await backToStudy(page);
    const rows = Papa.parse<Record<string, string>>(await studyPage(page).exportText(/Save read log/), { header: true, skipEmptyLines: true }).data;
    expect(rows).toHaveLength(CASES + PRACTICE);
    expect(rows.every((r) => r.training === '1')).toBe(true);
    expect(rows.find((r) => r.case_id === before.caseId)?.final_confidence).toBe('80');
  });
});

// The "after" column of a slider's screenshot against its midpoint column: with no thumb the
// track is the same across; a thumb at the midpoint makes the middle differ.
const columnsDiffer = (png: Buffer): { middleDiffers: boolean; brightest: number } => {
  const img = decode(png);
  const channels = img.channels;
  const at = (x: number, y: number) => Array.from({ length: 3 }, (_, c) => Number(img.data[(y * img.width + x) * channels + c]));
  let differ = false;
  let brightest = 0;
  for (let y = 0; y < img.height; y++) {
    const mid = at(Math.floor(img.width / 2), y);
    const quarter = at(Math.floor(img.width / 4), y);
    if (mid.some((v, c) => Math.abs(v - (quarter[c] as number)) > 24)) differ = true;
    for (let x = 0; x < img.width; x++) brightest = Math.max(brightest, Math.min(...at(x, y)));
  }
  return { middleDiffers: differ, brightest };
};

describe('reading view: counter, practice truth, unset slider, dark sliders, pause on leaving full screen', () => {
  const browser = useChromiumProfile(inject('appUrl'));
  it('behaves as a reader expects', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    await setUp(page, { name: 'Harbour measurement', aidedMode: 'concurrent' }, ['M1']);
    const painted = await studyPage(page).startPeriod('M1', 1);
    const reading = readingPage(page);
    await reading.waitForCase(painted);
    expect((await reading.state()).progress).toBe('Practice 1 of 2');

    // an unset confidence shows no thumb (the track looks the same across) and cannot be committed
    const slider = page.getByRole('slider', { name: 'Confidence' });
    expect(await slider.getAttribute('aria-valuetext')).toBe('not set');
    const unset = columnsDiffer(await slider.screenshot());
    await page.screenshot({ path: join(SHOTS, 'unset-slider.png') });
    expect(unset.middleDiffers).toBe(false);
    await page.keyboard.press('p');
    expect(await page.getByRole('button', { name: /^Commit/ }).isDisabled()).toBe(true);
    await page.keyboard.press('5');
    expect(columnsDiffer(await slider.screenshot()).middleDiffers).toBe(true); // a set value shows its thumb
    // no slider of the reading view glares: no near-white pixel (the default light track is ~#efefef)
    for (const name of ['Confidence', 'Level', 'Width']) {
      const box = page.getByRole('slider', { name });
      expect(columnsDiffer(await box.screenshot()).brightest).toBeLessThan(200);
    }

    // practice shows the truth after each answer, then the change to the study cases is announced
    const first = await reading.commitWithKeys([]); // p and 5 already pressed
    expect(first[0]).toMatch(/^Practice case: the truth/);
    expect((await reading.state()).progress).toBe('Practice 2 of 2');
    await page.keyboard.press('a');
    await page.keyboard.press('6');
    await page.keyboard.press('Enter');
    await page.getByRole('dialog', { name: 'The truth' }).waitFor();
    await page.keyboard.press('Enter');
    await page.getByRole('dialog', { name: 'Practice over' }).waitFor();
    expect(await page.getByRole('dialog', { name: 'Practice over' }).textContent()).toMatch(/Practice over: the study cases begin/);
    const beforeMain = await page.evaluate(() => Number(document.body.getAttribute('data-heed-case-painted') ?? 0));
    await page.keyboard.press('Enter');
    await reading.waitForCase(beforeMain);
    expect((await reading.state()).progress).toBe('Case 1 of 12');
    // measurement cases stay blind: no truth after a main case
    expect(await reading.commitWithKeys(['p', '9'])).toEqual([]);

    // Esc straight after a commit, while the save finishes and before the next image is drawn, still pauses
    const saved = await signalCount(page, 'saved');
    await page.keyboard.press('a');
    await page.keyboard.press('4');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor();
    await waitForSignal(page, 'saved', saved); // the answer given before Esc is saved
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor({ state: 'detached' });
    expect((await reading.state()).progress).toBe('Case 3 of 12');

    // full screen: leaving it by the browser's own Esc (which the page never sees) pauses
    await page.keyboard.press('f');
    await page.waitForFunction(() => document.fullscreenElement !== null);
    await page.evaluate(() => document.exitFullscreen()); // what the browser does with the first Esc in full screen
    await page.getByRole('dialog', { name: 'Paused' }).waitFor();
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor({ state: 'detached' });
    // in full screen an Esc that reaches the page (Keyboard Lock, or a browser that passes it) pauses and stays in full screen
    await page.keyboard.press('f');
    await page.waitForFunction(() => document.fullscreenElement !== null);
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor();
    expect(await page.evaluate(() => document.fullscreenElement !== null)).toBe(true);
    // leaving full screen with F while paused keeps the pause; F is the reader's own toggle
    await page.keyboard.press('Escape');
    await page.getByRole('dialog', { name: 'Paused' }).waitFor({ state: 'detached' });
    await page.keyboard.press('f');
    await page.waitForFunction(() => document.fullscreenElement === null);
    expect(await page.getByRole('dialog', { name: 'Paused' }).count()).toBe(0);
    await page.screenshot({ path: join(SHOTS, 'reading-main.png') });
  });
});

describe('percent scale: keys and slider to the export; Brier of rating/100', () => {
  const browser = useChromiumProfile(inject('appUrl'));
  it('exports the likelihoods set, calls from 50%, and a Brier score equal to one worked by hand', async () => {
    const chrome = await browser.launch();
    const { page } = chrome;
    await setUp(page, { name: 'Percent harbour', aidedMode: 'concurrent', scale: 'percent' }, ['P1']);
    const painted = await studyPage(page).startPeriod('P1', 1);
    const reading = readingPage(page);
    await reading.waitForCase(painted);
    const slider = page.getByRole('slider', { name: 'Likelihood present' });
    expect(await slider.getAttribute('aria-valuetext')).toBe('not set');
    const plans: [string[], number][] = [[['7'], 70], [['End'], 100], [['0'], 0], [['3', 'ArrowUp'], 35], [['9', 'ArrowDown', 'ArrowDown'], 80]];
    const pressed = new Map<string, number>();
    for (let i = 0; !(await reading.isDone()); i++) {
      const s = await reading.state();
      const [keys, value] = plans[i % plans.length] as [string[], number];
      await reading.commitWithKeys(keys);
      pressed.set(s.caseId, value);
    }
    await backToStudy(page);
    const log = await studyPage(page).exportText(/Save read log/);
    const rows = Papa.parse<Record<string, string>>(log, { header: true, skipEmptyLines: true }).data;
    for (const r of rows) {
      expect(r.scale).toBe('percent');
      expect(Number(r.final_rating)).toBe(pressed.get(r.case_id ?? ''));
      expect(r.final_call).toBe(Number(r.final_rating) >= 50 ? '1' : '0');
    }
    const dir = mkdtempSync(join(tmpdir(), 'heed-percent-'));
    writeFileSync(join(dir, 'reads.csv'), log);
    const report = JSON.parse(execFileSync(process.execPath, ['bin/heed.js', 'analyze', join(dir, 'reads.csv'), '--json', '--boot', '0'], { encoding: 'utf8' }));
    const main = rows.filter((r) => r.practice === '0');
    // Brier (1950): mean of (forecast − outcome)², the forecast being rating/100, by hand here
    const brier = main.reduce((s, r) => s + (Number(r.final_rating) / 100 - Number(r.truth)) ** 2, 0) / main.length;
    const section = report.readers[0].unaided ?? report.readers[0].aided;
    expect(section.brier).toBeCloseTo(brier, 12);
    expect(section.calibration).not.toBeNull();
  });
});
