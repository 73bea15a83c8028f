import * as Plot from '@observablehq/plot';
import type { PlotOptions } from './render';
import { PALETTE, SIZE } from './theme';

/**
 * A strip of anonymous peers' values (grey dots stacked where they coincide, unlabelled) with
 * the reader's own value marked by a thick vermilion line labelled "you", on 0–100%.
 * Peers are only values: no names, no codes.
 */
export const peerStripPlot = (peers: readonly number[], own: number, label: string): PlotOptions => ({
  width: SIZE.width,
  height: 140,
  marginLeft: 20,
  marginRight: 30,
  marginTop: 24,
  marginBottom: 42,
  x: { domain: [0, 1], tickFormat: '.0%', label, labelAnchor: 'center', labelArrow: 'none' },
  marks: [
    Plot.ruleX([own], { stroke: PALETTE.reader, strokeWidth: 3 }),
    Plot.text([own], { x: (d: number) => d, frameAnchor: 'top', dy: -14, text: () => `you ${Math.round(own * 100)}%`, fill: PALETTE.ink, fontWeight: 'bold', fontSize: 12 }),
    Plot.dot(peers.map((v) => ({ v })), Plot.dodgeY({ x: 'v', r: 6, anchor: 'bottom', padding: 1, fill: PALETTE.peer, stroke: 'white' })),
  ],
});
