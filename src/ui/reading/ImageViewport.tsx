/**
 * The case image fit to the viewport, with zoom (wheel, + and -), pan (drag) and window/level.
 * The image is drawn at native size on a canvas; zoom and pan are a CSS transform, so changing
 * them never redraws pixels.
 */
import { useLayoutEffect, useRef, useState, type PointerEvent, type WheelEvent } from 'react';
import { DEFAULT_LEVEL, DEFAULT_WIDTH, windowedPixels, type GrayImage } from './gray-image';

export type View = { zoom: number; panX: number; panY: number; level: number; width: number };
export const DEFAULT_VIEW: View = { zoom: 1, panX: 0, panY: 0, level: DEFAULT_LEVEL, width: DEFAULT_WIDTH };

type Props = {
  image: GrayImage | null;
  view: View;
  onView: (view: View) => void;
  hidden: boolean;
  /** called after the image's pixels are on the canvas, before the browser paints */
  onDrawn: () => void;
};

export const ImageViewport = ({ image, view, onView, hidden, onDrawn }: Props) => {
  const canvas = useRef<HTMLCanvasElement>(null);
  const frame = useRef<HTMLDivElement>(null);
  const drag = useRef<{ x: number; y: number; panX: number; panY: number } | null>(null);
  // the frame's size, kept by a ResizeObserver: a new case reads no layout (no forced reflow)
  const [box, setBox] = useState<{ width: number; height: number } | null>(null);

  useLayoutEffect(() => {
    const element = canvas.current;
    if (!element || !image) return;
    // resizing a canvas clears and reallocates it: only when the size changes
    if (element.width !== image.width) element.width = image.width;
    if (element.height !== image.height) element.height = image.height;
    const context = element.getContext('2d');
    if (!context) return;
    context.putImageData(windowedPixels(image, view.level, view.width), 0, 0);
    onDrawn();
  }, [image, view.level, view.width, onDrawn]);

  useLayoutEffect(() => {
    const element = frame.current;
    if (!element) return;
    const observer = new ResizeObserver((entries) => {
      const size = entries[entries.length - 1]?.contentRect;
      if (size) setBox((old) => (old && old.width === size.width && old.height === size.height ? old : { width: size.width, height: size.height }));
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  const fit = image && box ? Math.min(box.width / image.width, box.height / image.height) : 1;

  const onWheel = (event: WheelEvent) => {
    const factor = event.deltaY < 0 ? 1.15 : 1 / 1.15;
    onView({ ...view, zoom: Math.min(8, Math.max(0.5, view.zoom * factor)) });
  };
  const onPointerDown = (event: PointerEvent) => {
    drag.current = { x: event.clientX, y: event.clientY, panX: view.panX, panY: view.panY };
    (event.target as Element).setPointerCapture(event.pointerId);
  };
  const onPointerMove = (event: PointerEvent) => {
    const start = drag.current;
    if (!start) return;
    onView({ ...view, panX: start.panX + event.clientX - start.x, panY: start.panY + event.clientY - start.y });
  };
  const scale = fit * view.zoom;
  return (
    <div ref={frame} className="viewport" onWheel={onWheel} aria-label="Case image" role="img">
      <canvas
        ref={canvas}
        className="viewport-canvas"
        style={{ visibility: hidden ? 'hidden' : 'visible', transform: `translate(${view.panX}px, ${view.panY}px) scale(${scale})` }}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={() => { drag.current = null; }}
      />
    </div>
  );
};
