/**
 * Draw an Observable Plot figure into a given `document`: the browser's in the app, a linkedom
 * document in the CLI (see src/cli/plot-document.ts), so both make the same SVG.
 */
import * as Plot from '@observablehq/plot';
import { FONT } from './theme';

export type PlotOptions = Plot.PlotOptions;

/** The class of every plot's SVG (Plot's CSS is scoped to it), fixed so pages and tests can find it. */
export const PLOT_CLASS = 'heed-plot';

/** Renders options to an element (SVG, or a figure when a legend or title is asked). */
export const renderPlot = (options: PlotOptions, document: Document): SVGSVGElement | HTMLElement => {
  const style = { fontFamily: FONT, fontSize: '12px', background: 'white', color: '#222', overflow: 'visible' };
  return Plot.plot({ className: PLOT_CLASS, ...options, document, style: { ...style, ...(typeof options.style === 'object' ? options.style : {}) } });
};

/** The figure as standalone markup, for HTML reports and SVG downloads. */
export const plotMarkup = (options: PlotOptions, document: Document): string => {
  const node = renderPlot(options, document);
  if (node.tagName.toLowerCase() === 'svg' && !node.getAttribute('xmlns')) node.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  return node.outerHTML;
};
