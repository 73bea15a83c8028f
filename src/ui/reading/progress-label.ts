/**
 * The reading view's counter: practice cases and the study's main cases are counted apart
 * ("Practice 2 of 5", then "Case 1 of 120"), so the reader knows when the cases that count begin.
 * Practice cases come first in every period (src/core/schedule.ts), but the count does not rely on it.
 */
export type ProgressLabel = {
  text: string;
  practice: boolean;
  /** the first main case after practice cases: the change is announced */
  firstMainAfterPractice: boolean;
};

export const progressLabel = (items: readonly { practice: boolean }[], itemIndex: number): ProgressLabel => {
  let practiceTotal = 0;
  let practiceUpTo = 0;
  let mainUpTo = 0;
  items.forEach((item, i) => {
    if (item.practice) practiceTotal++;
    if (i <= itemIndex) {
      if (item.practice) practiceUpTo++;
      else mainUpTo++;
    }
  });
  const practice = items[itemIndex]?.practice ?? false;
  if (practice) return { text: `Practice ${practiceUpTo} of ${practiceTotal}`, practice, firstMainAfterPractice: false };
  return {
    text: `Case ${mainUpTo} of ${items.length - practiceTotal}`,
    practice,
    firstMainAfterPractice: practiceTotal > 0 && mainUpTo === 1,
  };
};
