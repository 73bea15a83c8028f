/**
 * A stopwatch over a monotonic clock that can pause: reading time excludes paused time.
 * Pure: the caller passes the clock readings (performance.now() in the app), so tests are exact.
 */
export type ActiveClock = { startedAt: number; accumulated: number; runningSince: number | null };

export const startClock = (now: number): ActiveClock => ({ startedAt: now, accumulated: 0, runningSince: now });

export const pauseClock = (clock: ActiveClock, now: number): ActiveClock =>
  clock.runningSince === null ? clock : { ...clock, accumulated: clock.accumulated + (now - clock.runningSince), runningSince: null };

export const resumeClock = (clock: ActiveClock, now: number): ActiveClock =>
  clock.runningSince !== null ? clock : { ...clock, runningSince: now };

/** Active milliseconds so far, rounded to 0.1 ms. */
export const elapsedMs = (clock: ActiveClock, now: number): number => {
  const running = clock.runningSince === null ? 0 : now - clock.runningSince;
  return Math.round((clock.accumulated + running) * 10) / 10;
};
