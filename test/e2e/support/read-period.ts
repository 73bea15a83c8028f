// Reads the open period to its end by keys (alternating calls, varied confidence), then hands the
// workstation back to the coordinator. Returns the number of answers given.
import type { RunningChromium } from './chromium';
import { readingPage } from './pages';

export const readWholePeriod = async (chrome: RunningChromium): Promise<number> => {
  const reading = readingPage(chrome.page);
  let steps = 0;
  while (!(await reading.isDone())) {
    await reading.answerByKeys((steps % 2) as 0 | 1, 1 + (steps % 9));
    steps++;
  }
  await chrome.page.getByRole('button', { name: 'Done: hand back the workstation' }).click();
  await chrome.page.getByRole('button', { name: 'Coordinator: back to the study' }).click();
  return steps;
};
