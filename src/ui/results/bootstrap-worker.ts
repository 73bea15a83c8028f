/// <reference lib="webworker" />
// The second worker of a large study's results (analysis-steps.ts): given the columns the first
// worker built, it computes the reader averages with their bootstrap intervals on the other core,
// while the first computes the estimates and the ROC curves.
import type { ReadColumns } from '../../analysis/read-columns';
import { readerAveragedOfColumns } from '../../analysis/engine';
import type { StepOptions } from './analysis-steps';

export type BootstrapRequest = StepOptions & { cols: ReadColumns };

self.onmessage = (event: MessageEvent<BootstrapRequest>) => {
  const { cols, ...options } = event.data;
  try {
    self.postMessage({ ok: true, averaged: readerAveragedOfColumns(cols, options) });
  } catch (error) {
    self.postMessage({ ok: false, error: error instanceof Error ? error.message : String(error) });
  } finally {
    self.close();
  }
};
