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
  window.dispatchEvent(new CustomEvent(`heed:${name}`, { detail: { ...detail, count, at: performance.now() } }));
};
