/**
 * Saving a drawn plot: SVG as its own markup, PNG by drawing that SVG onto a canvas (at twice the
 * size, for print) and encoding the canvas. Browser APIs only; the host saves the bytes.
 */
const SVG_NS = 'http://www.w3.org/2000/svg';

/**
 * The standalone markup of an SVG element (namespace added, white background kept). `css` is the
 * plot's own CSS, taken out of the page's copy (src/ui/adopted-styles.ts) and put back in the file.
 */
export const svgMarkup = (svg: SVGSVGElement, css = ''): string => {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute('xmlns', SVG_NS);
  if (css !== '') {
    // The copy is never in the page, so this element is only written to the file.
    const style = copy.ownerDocument.createElementNS(SVG_NS, 'style');
    style.textContent = css;
    copy.prepend(style);
  }
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(copy)}`;
};

/** PNG bytes of an SVG element, drawn at `scale` times its size. */
export const svgToPng = async (svg: SVGSVGElement, scale = 2, css = ''): Promise<Uint8Array> => {
  const width = Number(svg.getAttribute('width')) || svg.getBoundingClientRect().width;
  const height = Number(svg.getAttribute('height')) || svg.getBoundingClientRect().height;
  const url = URL.createObjectURL(new Blob([svgMarkup(svg, css)], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the plot could not be drawn as an image'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const ctx = canvas.getContext('2d');
    if (ctx === null) throw new Error('no 2D canvas to draw the plot on');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(image, 0, 0, canvas.width, canvas.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (blob === null) throw new Error('the plot could not be encoded as PNG');
    return new Uint8Array(await blob.arrayBuffer());
  } finally {
    URL.revokeObjectURL(url);
  }
};
