/**
 * One plot on the results page: drawn by Observable Plot into this document (src/io/plots/render.ts),
 * with a title, a sentence saying what it shows, and buttons that save it as SVG or PNG.
 */
import { useEffect, useRef, useState, type ReactNode, type RefObject } from 'react';
import type { PlotOptions } from '../../io/plots/render';
import { getHost } from '../../host';
import { signal } from '../signals';
import { svgMarkup, svgToPng } from './plot-export';
import { renderPlotInPage } from '../adopted-styles';

/** Window event that makes every plot on the page draw now (before printing). */
export const DRAW_ALL_PLOTS = 'heed:draw-all-plots';

/** Draws every plot and opens the glossary, waits two frames for them to land, then runs `then` (e.g. the print dialog). */
export const drawAllPlotsThen = (then: () => void): void => {
  window.dispatchEvent(new Event(DRAW_ALL_PLOTS));
  for (const glossary of document.querySelectorAll('details.glossary')) glossary.setAttribute('open', '');
  requestAnimationFrame(() => requestAnimationFrame(then));
};

/**
 * True once the element comes within a screen or so of the viewport, or the page is about to
 * print: plots far down a long page are drawn when the reader gets near them, which keeps a page
 * of many readers quick to open.
 */
const useNearViewport = (ref: RefObject<HTMLElement | null>): boolean => {
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (near || el === null) return undefined;
    const show = () => setNear(true);
    window.addEventListener('beforeprint', show);
    window.addEventListener(DRAW_ALL_PLOTS, show);
    const observer = typeof IntersectionObserver === 'undefined' ? null : new IntersectionObserver((entries) => { if (entries.some((e) => e.isIntersecting)) show(); }, { rootMargin: '800px 0px' });
    if (observer === null) show();
    else observer.observe(el);
    return () => { window.removeEventListener('beforeprint', show); window.removeEventListener(DRAW_ALL_PLOTS, show); observer?.disconnect(); };
  }, [ref, near]);
  return near;
};

type Props = { title: string; file: string; options: PlotOptions; children?: ReactNode; wide?: boolean };

const fileSafe = (name: string) => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'plot';

export const PlotFigure = ({ title, file, options, children, wide }: Props) => {
  const holder = useRef<HTMLDivElement>(null);
  const [status, setStatus] = useState('');
  const near = useNearViewport(holder);
  const plotCss = useRef('');
  useEffect(() => {
    if (!near) return undefined;
    const { node, css } = renderPlotInPage({ ...options, ariaLabel: title });
    plotCss.current = css;
    node.setAttribute('role', 'img');
    // the whole figure is one image named by its title; Plot's labels on inner groups (no role) are not allowed there
    for (const inner of node.querySelectorAll('[aria-label]')) if (inner !== node) inner.removeAttribute('aria-label');
    holder.current?.replaceChildren(node);
    return () => { node.remove(); };
  }, [options, title, near]);
  const svg = (): SVGSVGElement | null => holder.current?.querySelector('svg') ?? null;
  const save = async (kind: 'svg' | 'png') => {
    const node = svg();
    if (node === null) return;
    try {
      const name = `${fileSafe(file)}.${kind}`;
      const result = kind === 'svg'
        ? await getHost().saveFile(name, svgMarkup(node, plotCss.current), 'image/svg+xml')
        : await getHost().saveFile(name, await svgToPng(node, 2, plotCss.current), 'image/png');
      setStatus(result.handedTo === 'downloads' ? `${name} handed to the downloads.` : result.saved ? `Saved ${name}.` : 'Not saved.');
      signal('saved', { file: name });
    } catch (error) {
      setStatus(`Not saved: ${error instanceof Error ? error.message : String(error)}`);
    }
  };
  return (
    <figure className={`plot-card${wide ? ' plot-wide' : ''}`}>
      <figcaption>
        <strong>{title}</strong>
        {children && <div className="plot-words">{children}</div>}
      </figcaption>
      <div className="plot" ref={holder} style={near ? undefined : { minHeight: 200 }} />
      <div className="plot-actions">
        <button type="button" className="small" onClick={() => void save('svg')} aria-label={`Save “${title}” as SVG`}>SVG</button>
        <button type="button" className="small" onClick={() => void save('png')} aria-label={`Save “${title}” as PNG`}>PNG</button>
        <span className="muted" aria-live="polite">{status}</span>
      </div>
    </figure>
  );
};
