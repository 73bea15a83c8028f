// The results page's analysis (src/ui/results/run-analysis.ts) stops its workers when the page
// moves on (other seed or resamples typed, screen left), so superseded analyses of a large study
// do not keep both cores busy. Stand-in workers record what the page does to them.
import { inWorker, type WorkerMakers } from '../../../src/ui/results/run-analysis';

type Stand = Worker & { sent: unknown[]; ended: boolean; reply: (data: unknown) => void };

const standIn = (): Stand => {
  const w = {
    sent: [] as unknown[], ended: false,
    onmessage: null as ((e: MessageEvent) => void) | null,
    onerror: null, onmessageerror: null,
    postMessage(data: unknown) { this.sent.push(data); },
    terminate() { this.ended = true; },
    reply(data: unknown) { this.onmessage?.({ data } as MessageEvent); },
  };
  return w as unknown as Stand;
};

const made = () => {
  const all: { analysis: Stand[]; bootstrap: Stand[] } = { analysis: [], bootstrap: [] };
  const makers: WorkerMakers = {
    analysis: () => { const w = standIn(); all.analysis.push(w); return w; },
    bootstrap: () => { const w = standIn(); all.bootstrap.push(w); return w; },
  };
  return { all, makers };
};

const request = { dbName: 'heed', studyId: 's1', seed: 1, boot: 1000, bootstrapElsewhere: true };
const cols = { caseScratch: [], attributes: new Map() } as never;

describe('the results page stops a superseded analysis', () => {
  it('ends the analysis and the bootstrap worker at once and rejects with AbortError', async () => {
    const { all, makers } = made();
    const cancel = new AbortController();
    const running = inWorker(request, undefined, cancel.signal, makers);
    const analysis = all.analysis[0]!;
    expect(analysis.sent).toEqual([request]);
    analysis.reply({ ok: true, step: 'columns', cols });
    expect(all.bootstrap).toHaveLength(1);
    cancel.abort();
    await expect(running).rejects.toMatchObject({ name: 'AbortError' });
    expect(analysis.ended).toBe(true);
    expect(all.bootstrap[0]!.ended).toBe(true);
  });

  it('starts no worker for a request already given up', async () => {
    const { all, makers } = made();
    const cancel = new AbortController();
    cancel.abort();
    await expect(inWorker(request, undefined, cancel.signal, makers)).rejects.toMatchObject({ name: 'AbortError' });
    expect(all.analysis).toHaveLength(0);
  });

  it('still gives the report when nobody cancels, and fails plainly when an answer cannot be read', async () => {
    const { all, makers } = made();
    const done = inWorker(request, undefined, new AbortController().signal, makers);
    all.analysis[0]!.reply({ ok: true, report: { findings: [] }, roc: [] });
    await expect(done).resolves.toEqual({ report: { findings: [] }, roc: [] });

    const broken = inWorker(request, undefined, undefined, makers);
    const w = all.analysis[1]!;
    (w.onmessageerror as unknown as () => void)();
    await expect(broken).rejects.toThrow(/could not be read/);
    expect(w.ended).toBe(true);
  });
});
