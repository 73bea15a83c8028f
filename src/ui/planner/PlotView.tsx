/** An Observable Plot figure in the page, drawn by the shared renderer (src/io/plots/render.ts). */
import { useEffect, useRef } from 'react';
import type { PlotOptions } from '../../io/plots/render';
import { renderPlotInPage } from '../adopted-styles';

export const PlotView = ({ options, label }: { options: PlotOptions; label: string }) => {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const host = ref.current;
    if (!host) return;
    const { node } = renderPlotInPage(options);
    host.replaceChildren(node);
    return () => { host.replaceChildren(); };
  }, [options]);
  return <figure className="plot" role="img" aria-label={label} ref={ref} />;
};
