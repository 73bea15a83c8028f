import { describe, expect, it } from 'vitest';
import type { HeedDb } from '../../../src/store/db';
import { drawWhenSettled, launchQuery } from '../../../src/ui/startup';

const db = {} as HeedDb;

/** A query whose answer the test gives by hand, counting how often it was asked. */
const manual = <T>() => {
  const calls: { resolve: (v: T) => void; reject: (e: Error) => void }[] = [];
  const load = (): Promise<T> => new Promise<T>((resolve, reject) => { calls.push({ resolve, reject }); });
  return { calls, load };
};

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

describe('the launch queries', () => {
  it('hands the settled value to the first screen only, and nothing before it has arrived', async () => {
    const q = manual<{ n: number }>();
    const query = launchQuery(q.load, () => true);
    query.start(db);
    expect(query.takeSettled()).toBeUndefined();
    q.calls[0]?.resolve({ n: 1 });
    await query.settledOrFailed();
    expect(query.takeSettled()).toEqual({ n: 1 });
    // handed out once: a second screen gets neither the value nor the launch's promise
    expect(query.takeSettled()).toBeUndefined();
    void query.take(db);
    expect(q.calls).toHaveLength(2);
  });

  it('a screen that took the promise leaves no settled value behind', async () => {
    const q = manual<string>();
    const query = launchQuery(q.load, () => true);
    query.start(db);
    const taken = query.take(db);
    expect(q.calls).toHaveLength(1);
    q.calls[0]?.resolve('lists');
    await expect(taken).resolves.toBe('lists');
    expect(query.takeSettled()).toBeUndefined();
  });

  it('gives no settled value once the launch is no longer fresh', async () => {
    const q = manual<string>();
    let fresh = true;
    const query = launchQuery(q.load, () => fresh);
    query.start(db);
    q.calls[0]?.resolve('old');
    await query.settledOrFailed();
    fresh = false;
    expect(query.takeSettled()).toBeUndefined();
    void query.take(db);
    expect(q.calls).toHaveLength(2);
  });

  it('a failed query has no settled value; the screen that takes it gets the failure', async () => {
    const q = manual<string>();
    const query = launchQuery(q.load, () => true);
    query.start(db);
    q.calls[0]?.reject(new Error('refused'));
    await query.settledOrFailed();
    expect(query.takeSettled()).toBeUndefined();
    await expect(query.take(db)).rejects.toThrow('refused');
  });
});

describe('drawWhenSettled', () => {
  const timers = () => {
    const pending: (() => void)[] = [];
    return { pending, set: (run: () => void) => { pending.push(run); } };
  };

  it('draws once when the queries answer before the limit', async () => {
    const draws: boolean[] = [];
    const t = timers();
    let answer = (): void => undefined;
    const settled = new Promise<void>((resolve) => { answer = resolve; });
    drawWhenSettled(settled, (answered) => { draws.push(answered); }, 400, t.set);
    expect(draws).toEqual([]);
    answer();
    await tick();
    expect(draws).toEqual([true]);
    for (const run of t.pending) run();
    expect(draws).toEqual([true]);
  });

  it('draws at the limit when the queries are still out, and not again when they answer', async () => {
    const draws: boolean[] = [];
    const t = timers();
    let answer = (): void => undefined;
    const settled = new Promise<void>((resolve) => { answer = resolve; });
    drawWhenSettled(settled, (answered) => { draws.push(answered); }, 400, t.set);
    for (const run of t.pending) run();
    expect(draws).toEqual([false]);
    answer();
    await tick();
    expect(draws).toEqual([false]);
  });

  it('draws when a query fails (the screen shows the error)', async () => {
    const draws: boolean[] = [];
    const t = timers();
    drawWhenSettled(Promise.reject(new Error('no database')), (answered) => { draws.push(answered); }, 400, t.set);
    await tick();
    expect(draws).toEqual([true]);
  });
});
