import * as Plot from '@observablehq/plot';
import { describe, expect, it } from 'vitest';
import { plotDocument } from '../../../../src/cli/plot-document';
import { plotMarkup } from '../../../../src/io/plots/render';

describe('plotMarkup', () => {
  it('draws an Observable Plot figure as standalone SVG in Node through linkedom', () => {
    const markup = plotMarkup({ marks: [Plot.dot([{ x: 1, y: 2 }, { x: 3, y: 4 }], { x: 'x', y: 'y' })] }, plotDocument());
    expect(markup.startsWith('<svg')).toBe(true);
    expect(markup).toContain('xmlns="http://www.w3.org/2000/svg"');
    expect(markup.match(/<circle/g)?.length).toBe(2);
  });
});
