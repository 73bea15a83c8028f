/**
 * One plot on the results page: drawn by Observable Plot into this document (src/io/plots/render.ts),
 * with a title, a sentence saying what it shows, and buttons that save it as SVG or PNG.
 */
import { useEffect, useRef, useState, type ReactNode } from 'react';
import { renderPlot, type PlotOptions } from '../../io/plots/render';
import { getHost } from '../../host';
import { signal } from '../signals';
import { svgMarkup, svgToPng } from './plot-export';

type Props = { title: string; file: string; options: PlotOptions; children?: ReactNode; wide?: boolean };

const fileSafe = (name: string) => name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-|-$/g, '') || 'plot';

export const PlotFigure = ({ title, file, options, children, wide }: Props) => {
  const holder = useRef<HTMLDivElement>(null);
  const [status, setStatus] = useState('');
  useEffect(() => {
    const node = renderPlot({ ...options, ariaLabel: title }, document);
    node.setAttribute('role', 'img');
    // the whole figure is one image named by its title; Plot's labels on inner groups (no role) are not allowed there
    for (const inner of node.querySelectorAll('[aria-label]')) if (inner !== node) inner.removeAttribute('aria-label');
    holder.current?.replaceChildren(node);
    return () => { node.remove(); };
  }, [options, title]);
  const svg = (): SVGSVGElement | null => holder.current?.querySelector('svg') ?? null;
  const save = async (kind: 'svg' | 'png') => {
    const node = svg();
    if (node === null) return;
    try {
      const name = `${fileSafe(file)}.${kind}`;
      const result = kind === 'svg'
        ? await getHost().saveFile(name, svgMarkup(node), 'image/svg+xml')
        : await getHost().saveFile(name, await svgToPng(node), 'image/png');
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
      <div className="plot" ref={holder} />
      <div className="plot-actions">
        <button type="button" className="small" onClick={() => void save('svg')} aria-label={`Save “${title}” as SVG`}>SVG</button>
        <button type="button" className="small" onClick={() => void save('png')} aria-label={`Save “${title}” as PNG`}>PNG</button>
        <span className="muted" aria-live="polite">{status}</span>
      </div>
    </figure>
  );
};
