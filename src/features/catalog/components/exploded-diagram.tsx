import { Minus, Plus, RotateCcw } from 'lucide-react';
import { useEffect, useId, useLayoutEffect, useMemo, useRef, type KeyboardEvent, type PointerEvent } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { cn } from '@/lib/cn';
import type { Callout } from '../api/catalog-schemas';
import { MAX_ZOOM, MIN_ZOOM, useViewBox } from '../hooks/use-view-box';
import { sanitizeSvg, type ViewBox } from '../utils/sanitize-svg';

export type ExplodedDiagramProps = {
  title: string;
  svg: string;
  callouts: Callout[];
  /** What each callout is, for its accessible name ("Callout 3: Gasket, filler cap"). */
  describeCallout: (callout: string) => string;
  /** Callouts with no line on this vehicle are drawn faded. */
  isInactive?: (callout: string) => boolean;
  highlighted: string | null;
  selected: string | null;
  onHighlight: (callout: string | null) => void;
  onSelect: (callout: string) => void;
};

const ZOOM_STEP = 1.25;
const PAN_STEP = 0.1;
const HOTSPOT_R = 17;
const DRAG_THRESHOLD_PX = 4;

/**
 * An exploded diagram: our own SVG drawing (sanitised), with focusable callout hotspots drawn over its bubbles.
 * Hovering or focusing a hotspot highlights it (and, through the parent, its parts-list rows); Enter, Space
 * or a click selects it. Zoom with the buttons, the wheel or + and −; pan by dragging or with the arrow keys.
 */
export function ExplodedDiagram(props: ExplodedDiagramProps) {
  const parsed = useMemo(() => sanitizeSvg(props.svg), [props.svg]);
  if (!parsed) {
    return (
      <Notice tone="warn" title="The diagram could not be shown">
        The parts list below still has every line.
      </Notice>
    );
  }
  return <DiagramView {...props} root={parsed.root} base={parsed.viewBox} />;
}

function DiagramView({
  title,
  callouts,
  describeCallout,
  isInactive,
  highlighted,
  selected,
  onHighlight,
  onSelect,
  root,
  base,
}: ExplodedDiagramProps & { root: Element; base: ViewBox }) {
  const hintId = useId();
  const svgRef = useRef<SVGSVGElement>(null);
  const drawingRef = useRef<SVGGElement>(null);
  const drag = useRef<{ pointerId: number; x: number; y: number; view: ViewBox; moved: boolean } | null>(null);
  const suppressClick = useRef(false);
  const { view, zoom, zoomBy, panBy, panTo, reset } = useViewBox(base);

  // Copy the cleaned drawing into the page (imported nodes, never markup strings).
  useLayoutEffect(() => {
    const g = drawingRef.current;
    if (!g) return;
    g.replaceChildren(...[...root.childNodes].map((node) => document.importNode(node, true)));
  }, [root]);

  // Mark the drawing's own bubble and leaders of the active callout, so they take the highlight colour too.
  useEffect(() => {
    const g = drawingRef.current;
    if (!g) return;
    for (const el of g.querySelectorAll('[data-callout]')) {
      const c = el.getAttribute('data-callout');
      if (c === selected) el.setAttribute('data-state', 'selected');
      else if (c === highlighted) el.setAttribute('data-state', 'highlighted');
      else el.removeAttribute('data-state');
    }
  }, [root, highlighted, selected]);

  const toDrawing = (clientX: number, clientY: number) => {
    const rect = svgRef.current!.getBoundingClientRect();
    return {
      x: view.x + ((clientX - rect.left) / (rect.width || 1)) * view.width,
      y: view.y + ((clientY - rect.top) / (rect.height || 1)) * view.height,
    };
  };

  // React's wheel listener is passive, so the page would scroll too; this one may cancel it.
  const wheel = useRef<(e: WheelEvent) => void>(() => {});
  useEffect(() => {
    wheel.current = (e: WheelEvent) => {
      const zoomIn = e.deltaY < 0;
      if ((zoomIn && zoom >= MAX_ZOOM) || (!zoomIn && zoom <= MIN_ZOOM)) return; // at the limit: let the page scroll
      e.preventDefault();
      zoomBy(zoomIn ? ZOOM_STEP : 1 / ZOOM_STEP, toDrawing(e.clientX, e.clientY));
    };
  });
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const listener = (e: WheelEvent) => wheel.current(e);
    svg.addEventListener('wheel', listener, { passive: false });
    return () => svg.removeEventListener('wheel', listener);
  }, []);

  const onPointerDown = (e: PointerEvent<SVGSVGElement>) => {
    if (e.button !== 0) return;
    drag.current = { pointerId: e.pointerId, x: e.clientX, y: e.clientY, view, moved: false };
  };
  const onPointerMove = (e: PointerEvent<SVGSVGElement>) => {
    const d = drag.current;
    if (!d || d.pointerId !== e.pointerId) return;
    if (!d.moved) {
      if (Math.hypot(e.clientX - d.x, e.clientY - d.y) < DRAG_THRESHOLD_PX) return;
      // Capture only once it is a drag, so a plain click still reaches the hotspot under the pointer.
      d.moved = true;
      e.currentTarget.setPointerCapture?.(e.pointerId);
    }
    const rect = e.currentTarget.getBoundingClientRect();
    const scale = d.view.width / (rect.width || 1);
    panTo({ ...d.view, x: d.view.x - (e.clientX - d.x) * scale, y: d.view.y - (e.clientY - d.y) * scale });
  };
  const endDrag = (e: PointerEvent<SVGSVGElement>) => {
    if (drag.current?.moved) suppressClick.current = true;
    drag.current = null;
    e.currentTarget.releasePointerCapture?.(e.pointerId);
  };

  const onKeyDown = (e: KeyboardEvent<SVGSVGElement>) => {
    const step = { x: view.width * PAN_STEP, y: view.height * PAN_STEP };
    const actions: Record<string, () => void> = {
      ArrowLeft: () => panBy(-step.x, 0),
      ArrowRight: () => panBy(step.x, 0),
      ArrowUp: () => panBy(0, -step.y),
      ArrowDown: () => panBy(0, step.y),
      '+': () => zoomBy(ZOOM_STEP),
      '=': () => zoomBy(ZOOM_STEP),
      '-': () => zoomBy(1 / ZOOM_STEP),
      '0': reset,
    };
    const action = actions[e.key];
    if (!action || e.altKey || e.ctrlKey || e.metaKey) return;
    e.preventDefault();
    action();
  };

  const select = (callout: string) => {
    if (suppressClick.current) {
      suppressClick.current = false;
      return;
    }
    onSelect(callout);
  };

  return (
    <figure className="space-y-2">
      <div role="toolbar" aria-label="Diagram view" className="flex flex-wrap items-center gap-2">
        <Button size="sm" variant="secondary" aria-label="Zoom in" icon={<Plus aria-hidden="true" className="size-4" />} disabled={zoom >= MAX_ZOOM} onClick={() => zoomBy(ZOOM_STEP)} />
        <Button size="sm" variant="secondary" aria-label="Zoom out" icon={<Minus aria-hidden="true" className="size-4" />} disabled={zoom <= MIN_ZOOM} onClick={() => zoomBy(1 / ZOOM_STEP)} />
        <Button size="sm" variant="ghost" icon={<RotateCcw aria-hidden="true" className="size-4" />} disabled={zoom <= MIN_ZOOM} onClick={reset}>
          Reset view
        </Button>
        <span className="ml-auto text-xs text-ink-muted tabular-nums" aria-live="polite">
          {Math.round(zoom * 100)}%
        </span>
      </div>
      <div className="overflow-hidden rounded-card border border-rule-strong bg-white shadow-card">
        <svg
          ref={svgRef}
          viewBox={`${view.x} ${view.y} ${view.width} ${view.height}`}
          role="group"
          aria-label={`Exploded diagram: ${title}`}
          aria-describedby={hintId}
          tabIndex={0}
          className={cn('block h-auto w-full touch-none select-none', zoom > MIN_ZOOM ? 'cursor-grab active:cursor-grabbing' : '')}
          onKeyDown={onKeyDown}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={endDrag}
          onPointerCancel={endDrag}
        >
          <g
            ref={drawingRef}
            aria-hidden="true"
            className={cn(
              '[&_[data-state]_line]:stroke-patina-600 [&_[data-state]_line]:[stroke-width:2.5]',
              '[&_[data-state=highlighted]_circle]:fill-patina-100',
            )}
          />
          <g>
            {callouts.map(({ callout, x, y }) => {
              const isSelected = callout === selected;
              const isHighlighted = callout === highlighted;
              const inactive = isInactive?.(callout) ?? false;
              return (
                <g
                  key={callout}
                  role="button"
                  tabIndex={0}
                  aria-label={`Callout ${callout}: ${describeCallout(callout)}`}
                  aria-pressed={isSelected}
                  data-callout-hotspot={callout}
                  data-state={isSelected ? 'selected' : isHighlighted ? 'highlighted' : undefined}
                  className="cursor-pointer outline-none"
                  onMouseEnter={() => onHighlight(callout)}
                  onMouseLeave={() => onHighlight(null)}
                  onFocus={() => onHighlight(callout)}
                  onBlur={() => onHighlight(null)}
                  onClick={() => select(callout)}
                  onKeyDown={(e) => {
                    if (e.key === 'Enter' || e.key === ' ') {
                      e.preventDefault();
                      e.stopPropagation();
                      onSelect(callout);
                    }
                  }}
                >
                  <circle
                    cx={x}
                    cy={y}
                    r={HOTSPOT_R}
                    className={cn(
                      isSelected
                        ? 'fill-patina-600 stroke-patina-800'
                        : isHighlighted
                          ? 'fill-patina-100/70 stroke-patina-600'
                          : inactive
                            ? 'fill-paper-sunk/70 stroke-transparent'
                            : 'fill-transparent stroke-transparent',
                    )}
                    strokeWidth={3}
                  />
                  {isSelected ? (
                    <text x={x} y={y + 4.5} textAnchor="middle" fontSize={13} fontWeight="bold" className="pointer-events-none fill-white">
                      {callout}
                    </text>
                  ) : null}
                </g>
              );
            })}
          </g>
        </svg>
      </div>
      <figcaption id={hintId} className="text-xs text-ink-muted">
        Tab to a callout and press Enter to pick it out in the parts list. Arrow keys pan, + and − zoom, 0 resets; or drag and use the wheel.
      </figcaption>
    </figure>
  );
}
