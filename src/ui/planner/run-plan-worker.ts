// Starts a plan in a Web Worker; `cancel` stops it at once (the worker is terminated).
import type { PlanProgress, PlanInput } from '../../analysis/planner/run-plan';
import type { PlanReport } from '../../analysis/planner/plan-report';

type Reply = ({ kind: 'progress' } & PlanProgress) | { kind: 'done'; report: PlanReport } | { kind: 'error'; error: string };

export type PlanJob = { result: Promise<PlanReport | null>; cancel: () => void };

export const startPlan = (input: PlanInput, onProgress: (p: PlanProgress) => void): PlanJob => {
  const worker = new Worker(new URL('./plan-worker.ts', import.meta.url), { type: 'module' });
  let settle: (r: PlanReport | null) => void = () => undefined;
  const result = new Promise<PlanReport | null>((resolve, reject) => {
    settle = resolve;
    worker.onmessage = (event: MessageEvent<Reply>) => {
      const m = event.data;
      if (m.kind === 'progress') onProgress({ done: m.done, total: m.total });
      else {
        worker.terminate();
        if (m.kind === 'done') resolve(m.report);
        else reject(new Error(m.error));
      }
    };
    worker.onerror = (event) => { worker.terminate(); reject(new Error(event.message)); };
  });
  worker.postMessage(input);
  return { result, cancel: () => { worker.terminate(); settle(null); } };
};
