/**
 * The busy flag and problem line that a panel's file and button actions share: one action at a
 * time, the problem cleared when the next starts. `picked` turns a file input's change into an
 * action on the chosen file's bytes and clears the input, so the same file can be picked again.
 */
import { useState, type ChangeEvent } from 'react';

export type BusyAction = {
  busy: boolean;
  problem: string;
  setProblem: (text: string) => void;
  run: (work: () => Promise<void>) => Promise<void>;
  picked: (work: (name: string, bytes: Uint8Array) => Promise<void>) => (event: ChangeEvent<HTMLInputElement>) => void;
};

export const useBusyAction = (): BusyAction => {
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState('');
  const run = async (work: () => Promise<void>) => {
    setBusy(true);
    setProblem('');
    try {
      await work();
    } finally {
      setBusy(false);
    }
  };
  const picked = (work: (name: string, bytes: Uint8Array) => Promise<void>) => (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    void run(async () => work(file.name, new Uint8Array(await file.arrayBuffer())));
  };
  return { busy, problem, setProblem, run, picked };
};
