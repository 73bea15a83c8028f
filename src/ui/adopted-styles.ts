// Styles made at run time (Observable Plot's CSS for each plot and legend, the reader report's
// CSS, a plot's inline styles inside report markup) reach the page as constructed style sheets.
// Heed's Content Security Policy (style-src 'self', no 'unsafe-inline') blocks <style> elements
// and style="" attributes that the browser parses, but not style sheets built through the CSSOM,
// nor element.style set by script (how React and Plot set styles on elements they create).

import { renderPlot, type PlotOptions } from '../io/plots/render';

const adoptedBy = new WeakMap<Document, Set<string>>();

/** Adds the CSS to the document as a constructed style sheet, once per text. */
export const adoptCss = (css: string, doc: Document = document): void => {
  const done = adoptedBy.get(doc) ?? new Set<string>();
  adoptedBy.set(doc, done);
  if (css.trim() === '' || done.has(css)) return;
  const sheet = new CSSStyleSheet();
  sheet.replaceSync(css);
  doc.adoptedStyleSheets = doc.adoptedStyleSheets.concat(sheet);
  done.add(css);
};

/**
 * Takes every <style> element out of a node drawn by Plot (before it is put in the page, where
 * the policy would block it) and adopts its CSS instead. Returns that CSS, for saving the plot.
 */
export const liftStyleElements = (node: Element): string => {
  const texts: string[] = [];
  for (const style of Array.from(node.querySelectorAll('style'))) {
    const css = style.textContent ?? '';
    adoptCss(css, node.ownerDocument);
    texts.push(css);
    style.remove();
  }
  return texts.join('\n');
};

/**
 * A plot drawn for this page: Plot's <style> elements taken out and their CSS adopted (the page's
 * style policy would block them). `css` is that CSS, for a saved copy of the plot.
 */
export const renderPlotInPage = (options: PlotOptions): { node: SVGSVGElement | HTMLElement; css: string } => {
  const node = renderPlot(options, document);
  return { node, css: liftStyleElements(node) };
};

/** A short stable name for a declaration block (FNV-1a, 32 bits), so equal styles share a class. */
const classFor = (text: string): string => {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) hash = Math.imul(hash ^ text.charCodeAt(i), 0x01000193) >>> 0;
  return `heed-style-${hash.toString(16).padStart(8, '0')}`;
};

type Styled = Element & ElementCSSInlineStyle;

/**
 * For a node that will become markup (the reader report in the app): <style> elements are lifted
 * as above, and each style="" attribute becomes a class whose rule holds the same declarations,
 * marked !important because an inline style wins over the page's rules.
 */
export const liftInlineStyles = (node: Element): void => {
  liftStyleElements(node);
  const styled = [node, ...Array.from(node.querySelectorAll('[style]'))].filter((el): el is Styled => el.hasAttribute('style') && 'style' in el);
  const rules: string[] = [];
  for (const el of styled) {
    const declarations: string[] = [];
    for (let i = 0; i < el.style.length; i += 1) {
      const name = el.style.item(i);
      declarations.push(`${name}: ${el.style.getPropertyValue(name)} !important;`);
    }
    el.removeAttribute('style');
    if (declarations.length === 0) continue;
    const block = declarations.join(' ');
    const name = classFor(block);
    el.classList.add(name);
    rules.push(`.${name} { ${block} }`);
  }
  adoptCss(rules.join('\n'), node.ownerDocument);
};
