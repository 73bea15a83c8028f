// The start of a reading benchmark: a reader on the aided-first sequence, past the practice cases.
import type { Page } from 'playwright-core';
import type { readingPage, studyPage } from '../../test/e2e/support/pages';

/**
 * Enrols the codes in turn until one is given sequence AU (aided first; sequences are assigned
 * in permuted blocks of two, so one of the first two usually is) and returns that code.
 */
export const enrolAidedFirstReader = async (study: ReturnType<typeof studyPage>, codes: readonly string[]): Promise<string> => {
  for (const code of codes) {
    await study.enrol(code);
    await study.enrolled(code);
    if ((await study.sequenceOf(code)) === 'AU') return code;
  }
  throw new Error('no enrolled reader was given the aided-first sequence AU');
};

/**
 * Reads the practice cases (each followed by its truth, then the practice-over cover) so that
 * every measured Enter commits a main case; returns how many there were.
 */
export const readPracticeCases = async (page: Page, reading: ReturnType<typeof readingPage>): Promise<number> => {
  let practice = 0;
  while ((await page.getByText('Practice case').count()) > 0) {
    await reading.answerByKeys(0, 5);
    practice++;
  }
  return practice;
};
