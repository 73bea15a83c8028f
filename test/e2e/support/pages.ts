/**
 * Page objects: what a coordinator or reader does, found by role and accessible name. Waits are
 * on the app's own signals (src/ui/signals.ts), never on fixed sleeps.
 */
import type { Page } from 'playwright-core';
import { signalCount, waitForSignal } from './chromium';

export type DesignChoices = {
  name: string;
  aidedMode?: 'sequential' | 'concurrent';
  washoutDays?: number;
  plantedFalsePositive?: number;
  plantedFalseNegative?: number;
  caution?: 'never' | 'with every aided read' | 'with a random half of aided reads';
  findings?: string[];
  caseSet?: string;
  breakEvery?: number;
  scale?: 'call-confidence' | 'five-point' | 'percent';
  training?: boolean;
};

export const homePage = (page: Page) => ({
  waitUntilReady: async () => { await waitForSignal(page, 'ready'); await page.getByRole('heading', { name: 'Heed', level: 1 }).waitFor(); },
  newStudy: async (d: DesignChoices) => {
    await page.getByRole('button', { name: 'New study' }).click();
    await page.getByLabel('Study name').fill(d.name);
    if (d.caseSet) await page.getByLabel('Case set').selectOption({ label: d.caseSet });
    if (d.findings) {
      for (const box of await page.getByRole('group', { name: 'Findings asked' }).getByRole('checkbox').all()) {
        const label = (await box.evaluate((el) => el.parentElement?.textContent ?? '')).trim();
        await box.setChecked(d.findings.includes(label));
      }
    }
    if (d.aidedMode) await page.getByLabel('Aided condition').selectOption(d.aidedMode);
    if (d.washoutDays !== undefined) await page.getByLabel('Washout days').fill(String(d.washoutDays));
    if (d.plantedFalsePositive !== undefined) await page.getByLabel('False-positive suggestions').fill(String(d.plantedFalsePositive));
    if (d.plantedFalseNegative !== undefined) await page.getByLabel('False-negative suggestions').fill(String(d.plantedFalseNegative));
    if (d.breakEvery !== undefined) await page.getByLabel('Break every N cases').fill(String(d.breakEvery));
    if (d.caution) await page.getByLabel('Show the notice').selectOption({ label: d.caution });
    if (d.scale) await page.getByLabel('Answer scale').selectOption(d.scale);
    if (d.training) await page.getByLabel('Training: show the truth after each case').check();
    await page.getByRole('button', { name: 'Create study' }).click();
    await page.getByRole('heading', { name: d.name, level: 1 }).waitFor();
  },
  resume: async (text: RegExp) => { await page.getByRole('button', { name: text }).click(); },
  openStudy: async (name: string) => { await page.getByRole('button', { name, exact: true }).click(); await page.getByRole('heading', { name, level: 1 }).waitFor(); },
});

export const studyPage = (page: Page) => ({
  enrol: async (code: string, role = 'radiologist', years?: number) => {
    await page.getByLabel('Reader code').fill(code);
    await page.getByLabel('Role').selectOption(role);
    await page.getByLabel('Years of experience').fill(years === undefined ? '' : String(years));
    await page.getByRole('button', { name: 'Enrol' }).click();
  },
  enrolled: async (code: string) => { await page.getByRole('cell', { name: code, exact: true }).waitFor(); },
  enrolProblem: () => page.getByRole('alert').first().textContent(),
  sequenceOf: async (code: string) => {
    const row = page.getByRole('row').filter({ has: page.getByRole('cell', { name: code, exact: true }) });
    return (await row.getByRole('cell').nth(3).textContent())?.trim() ?? '';
  },
  startPeriod: async (code: string, period: number) => {
    const before = await signalCount(page, 'case-painted');
    await page.getByRole('button', { name: new RegExp(`^(Start|Resume) ${code} period ${period}$`) }).click();
    return before;
  },
  openEarly: async (reason: string, by: string) => {
    await page.getByLabel('Reason for opening early').fill(reason);
    await page.getByLabel('Allowed by').fill(by);
    await page.getByRole('button', { name: 'Open early (logged)' }).click();
  },
  /** Clicks an export button and returns the downloaded file's text. */
  exportText: async (button: RegExp): Promise<string> => {
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: button }).click()]);
    const path = await download.path();
    const { readFileSync } = await import('node:fs');
    return readFileSync(path, 'utf8');
  },
});

export type ReadingState = { caseId: string; phase: string; assistance: string; progress: string };

export const readingPage = (page: Page) => {
  const state = async (): Promise<ReadingState> => {
    const main = page.locator('main.reading');
    return {
      caseId: (await main.getAttribute('data-case')) ?? '',
      phase: (await main.getAttribute('data-phase')) ?? '',
      assistance: (await main.getAttribute('data-assistance')) ?? '',
      progress: (await page.getByLabel('Progress').textContent()) ?? '',
    };
  };
  const commitWithKeys = async (keys: string[]): Promise<string[]> => {
    const saved = await signalCount(page, 'saved');
    const painted = await signalCount(page, 'case-painted');
    const before = (await state()).caseId;
    for (const k of keys) await page.keyboard.press(k);
    await page.keyboard.press('Enter');
    await waitForSignal(page, 'saved', saved);
    const truths: string[] = [];
    for (;;) {
      // a new case is answerable once its image is painted (the clock starts then), or once a
      // rest break is up; a cover in between (the truth, practice over) is continued with Enter
      const next = await page.waitForFunction(([min, was]) => {
        const dialog = document.querySelector('[role=dialog]')?.getAttribute('aria-label');
        if (dialog === 'The truth' || dialog === 'Practice over' || dialog === 'Break') return dialog;
        const main = document.querySelector('main.reading[data-case]');
        if (main === null || main.getAttribute('data-case') === was) return 'answerable';
        return Number(document.body.getAttribute('data-heed-case-painted') ?? 0) > Number(min) ? 'answerable' : false;
      }, [painted, before] as const, { timeout: 60_000 });
      const what = await next.jsonValue();
      if (what === 'The truth') {
        truths.push((await page.getByRole('dialog', { name: 'The truth' }).textContent()) ?? '');
        await page.keyboard.press('Enter');
        await page.getByRole('dialog', { name: 'The truth' }).waitFor({ state: 'detached' });
      } else if (what === 'Practice over') {
        await page.keyboard.press('Enter');
        await page.getByRole('dialog', { name: 'Practice over' }).waitFor({ state: 'detached' });
      } else return truths;
    }
  };
  return {
    state,
    /** Waits until the current case's image has been painted `after` + 1 times in total. */
    waitForCase: (after: number) => waitForSignal(page, 'case-painted', after),
    suggestionText: async () => (await page.getByRole('region', { name: 'Model suggestion' }).count()) > 0
      ? (await page.getByRole('region', { name: 'Model suggestion' }).textContent()) ?? '' : null,
    /** Answers the current question with the keyboard only: P or A, a digit for confidence, Enter. */
    answerByKeys: async (call: 0 | 1, confidenceDigit: number) => commitWithKeys([call === 1 ? 'p' : 'a', String(confidenceDigit)]),
    /**
     * Presses the answer keys, then Enter, and waits until the next question can be answered.
     * The truth shown after a case (training study, practice case) and the practice-over
     * announcement are continued from with Enter; the truth texts seen are returned.
     */
    commitWithKeys,
    isDone: async () => (await page.getByRole('heading', { name: /Period \d+ complete/ }).count()) > 0,
  };
};

/** The coordinator lock: setting the passphrase on the start page, and the lock screen. */
export const lockPage = (page: Page) => ({
  setPassphrase: async (phrase: string) => {
    const panel = page.getByRole('region', { name: 'Coordinator lock' });
    await panel.getByLabel('New passphrase').fill(phrase);
    await panel.getByLabel('Repeat the passphrase').fill(phrase);
    await panel.getByRole('button', { name: 'Set the passphrase' }).click();
    await panel.waitFor({ state: 'detached' });
  },
  waitUntilLocked: async () => { await page.getByRole('heading', { name: 'Coordinator lock', level: 1 }).waitFor(); },
  isLocked: async () => (await page.getByRole('heading', { name: 'Coordinator lock', level: 1 }).count()) > 0,
  unlock: async (phrase: string) => {
    await page.getByLabel('Coordinator passphrase').fill(phrase);
    await page.getByRole('button', { name: 'Unlock' }).click();
  },
});
