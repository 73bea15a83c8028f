/**
 * Calls `onIdle` once after `ms` without activity; `touch` restarts the wait. The coordinator's
 * side uses it to return to the lock after the chosen idle minutes.
 */
export type IdleTimer = { touch: () => void; stop: () => void };

export const createIdleTimer = (ms: number, onIdle: () => void): IdleTimer => {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const start = () => {
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(() => { timer = null; onIdle(); }, ms);
  };
  start();
  return {
    touch: start,
    stop: () => { if (timer !== null) clearTimeout(timer); timer = null; },
  };
};
