/**
 * Events the app signals for tests and benchmarks to wait on (never fixed sleeps): each is a
 * DOM event `heed:<name>` on window, and a running count of each is kept on document.body as
 * the attribute `data-heed-<name>`.
 */
export type SignalName = 'mounted' | 'ready' | 'saved' | 'case-painted' | 'backup';

export const signal = (name: SignalName, detail: Record<string, unknown> = {}): void => {
  const attribute = `data-heed-${name}`;
  const count = Number(document.body.getAttribute(attribute) ?? 0) + 1;
  document.body.setAttribute(attribute, String(count));
  // the first of each kind is also a user-timing mark, so a launch can be timed (and seen in a
  // performance trace) without a script injected into the page (bench/support/ab-flags.ts)
  if (count === 1) performance.mark(`heed-${name}`);
  window.dispatchEvent(new CustomEvent(`heed:${name}`, { detail: { ...detail, count, at: performance.now() } }));
};
