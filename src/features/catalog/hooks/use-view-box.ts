import { useCallback, useState } from 'react';
import type { ViewBox } from '../utils/sanitize-svg';

export const MIN_ZOOM = 1;
export const MAX_ZOOM = 8;

/** Keeps a zoomed view inside the drawing and its zoom between MIN_ZOOM and MAX_ZOOM. */
export function clampView(base: ViewBox, view: ViewBox): ViewBox {
  const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, base.width / view.width));
  const width = base.width / zoom;
  const height = base.height / zoom;
  const x = Math.min(base.x + base.width - width, Math.max(base.x, view.x));
  const y = Math.min(base.y + base.height - height, Math.max(base.y, view.y));
  return { x, y, width, height };
}

/**
 * Zoom and pan of a drawing by moving its viewBox (so lines stay sharp at any zoom). Coordinates are the
 * drawing's own units; `around` is the point that stays put while zooming (the centre when omitted).
 */
export function useViewBox(base: ViewBox) {
  const [view, setView] = useState<ViewBox>(base);
  const [baseSeen, setBaseSeen] = useState(base);
  // A new drawing starts from its full view (state adjusted during render, not in an effect).
  if (baseSeen !== base && JSON.stringify(baseSeen) !== JSON.stringify(base)) {
    setBaseSeen(base);
    setView(base);
  }

  const zoomBy = useCallback(
    (factor: number, around?: { x: number; y: number }) =>
      setView((v) => {
        const cx = around?.x ?? v.x + v.width / 2;
        const cy = around?.y ?? v.y + v.height / 2;
        const width = v.width / factor;
        const height = v.height / factor;
        return clampView(base, { x: cx - ((cx - v.x) / v.width) * width, y: cy - ((cy - v.y) / v.height) * height, width, height });
      }),
    [base],
  );
  const panBy = useCallback((dx: number, dy: number) => setView((v) => clampView(base, { ...v, x: v.x + dx, y: v.y + dy })), [base]);
  const panTo = useCallback((next: ViewBox) => setView(clampView(base, next)), [base]);
  const reset = useCallback(() => setView(base), [base]);

  return { view, zoom: base.width / view.width, zoomBy, panBy, panTo, reset };
}
