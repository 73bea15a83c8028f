import { renderPlot, type PlotOptions } from '../plots/render';

/**
 * Where a report's plots are drawn: a DOM document (the browser's, or linkedom in Node), and
 * optionally what to do with each drawn plot before it becomes markup. The app uses that hook to
 * move the plot's styles out of the markup (its Content Security Policy allows no inline styles;
 * src/ui/styles/lift-styles.ts); the standalone page keeps them inline.
 */
export type PlotTarget = { document: Document; beforeMarkup?: (node: Element) => void };

/**
 * A plot as markup to place inside an HTML page. Inline SVG in HTML needs no namespace
 * attribute, and the report must hold no address at all, so any xmlns is left out.
 */
export const inlinePlot = (options: PlotOptions, target: PlotTarget, label: string): string => {
  const node = renderPlot(options, target.document);
  const svgs = node.tagName.toLowerCase() === 'svg' ? [node] : Array.from(node.querySelectorAll('svg'));
  for (const svg of svgs) {
    svg.removeAttribute('xmlns');
    svg.removeAttribute('xmlns:xlink');
  }
  // Plot labels its mark groups with aria-label on plain <g> elements, which ARIA does not
  // allow there; the whole figure is labelled once instead (role img, below).
  for (const el of Array.from(node.querySelectorAll('[aria-label]'))) el.removeAttribute('aria-label');
  const main = svgs[svgs.length - 1];
  if (main) {
    main.setAttribute('role', 'img');
    main.setAttribute('aria-label', label);
  }
  target.beforeMarkup?.(node);
  return `<div class="plot">${node.outerHTML}</div>`;
};
