import { renderPlot, type PlotOptions } from '../plots/render';

/**
 * A plot as markup to place inside an HTML page. Inline SVG in HTML needs no namespace
 * attribute, and the report must hold no address at all, so any xmlns is left out.
 */
export const inlinePlot = (options: PlotOptions, document: Document, label: string): string => {
  const node = renderPlot(options, document);
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
  return `<div class="plot">${node.outerHTML}</div>`;
};
