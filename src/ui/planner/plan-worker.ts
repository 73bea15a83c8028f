/// <reference lib="webworker" />
// Runs a plan (the engine `heed plan` uses) off the main thread, posting progress every few
// simulated studies; the page cancels by terminating the worker.
import { planSteps, type PlanInput } from '../../analysis/planner/run-plan';

self.onmessage = (event: MessageEvent<PlanInput>) => {
  try {
    const steps = planSteps(event.data);
    let last = 0;
    for (;;) {
      const step = steps.next();
      if (step.done === true) {
        self.postMessage({ kind: 'done', report: step.value });
        return;
      }
      const now = performance.now();
      if (now - last > 100) { last = now; self.postMessage({ kind: 'progress', ...step.value }); }
    }
  } catch (error) {
    self.postMessage({ kind: 'error', error: error instanceof Error ? error.message : String(error) });
  }
};
