import { ChevronLeft, ChevronRight, X, ZoomIn, ZoomOut } from 'lucide-react';
import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { cn } from '@/lib/cn';
import type { ListingPhoto } from '../api/listing-types';

type Props = { photos: ListingPhoto[]; title: string };

/**
 * The listing's photos: a large view with thumbnails. Left and Right arrows (or Home and End) move between
 * photos; Enter or a click opens the zoom view, where + and - zoom, arrows keep moving and Escape closes.
 */
export function PhotoGallery({ photos, title }: Props) {
  const [index, setIndex] = useState(0);
  const [open, setOpen] = useState(false);
  const count = photos.length;
  if (count === 0) {
    return (
      <div className="flex aspect-[4/3] items-center justify-center rounded-card border border-dashed border-rule-strong bg-paper-sunk text-sm text-ink-muted">
        No photos
      </div>
    );
  }
  const current = photos[Math.min(index, count - 1)];
  const go = (i: number) => setIndex(((i % count) + count) % count);

  const onKeyDown = (e: KeyboardEvent) => {
    const moves: Record<string, () => void> = {
      ArrowRight: () => go(index + 1),
      ArrowLeft: () => go(index - 1),
      Home: () => go(0),
      End: () => go(count - 1),
    };
    const move = moves[e.key];
    if (move) {
      e.preventDefault();
      move();
    }
  };

  return (
    <>
      <div role="region" aria-roledescription="gallery" aria-label={`Photos of ${title}`} onKeyDown={onKeyDown} className="space-y-3">
        <button
          type="button"
          onClick={() => setOpen(true)}
          aria-label={`Zoom photo ${index + 1} of ${count}`}
          className="group relative block aspect-[4/3] w-full cursor-zoom-in overflow-hidden rounded-card border border-rule"
          style={{ backgroundColor: current.placeholderColor }}
        >
          <img src={current.urls.medium} alt={`${title}, photo ${index + 1} of ${count}`} className="h-full w-full object-contain" />
          <span className="absolute right-2 bottom-2 inline-flex items-center gap-1 rounded-tag bg-ink/75 px-2 py-1 text-xs text-paper opacity-80 group-hover:opacity-100">
            <ZoomIn aria-hidden="true" className="size-4" /> Zoom
          </span>
        </button>
        {count > 1 ? (
          <div className="flex items-center gap-2">
            <button type="button" aria-label="Previous photo" onClick={() => go(index - 1)} className="rounded-tag p-1 text-ink-soft hover:bg-paper-sunk">
              <ChevronLeft aria-hidden="true" className="size-5" />
            </button>
            <ul aria-label="Choose a photo" className="flex flex-1 gap-2 overflow-x-auto py-1">
              {photos.map((p, i) => (
                <li key={p.id} className="shrink-0">
                  <button
                    type="button"
                    aria-label={`Photo ${i + 1}`}
                    aria-current={i === index ? 'true' : undefined}
                    onClick={() => go(i)}
                    className={cn('block size-16 overflow-hidden rounded-tag border-2', i === index ? 'border-patina-500' : 'border-transparent hover:border-rule-strong')}
                    style={{ backgroundColor: p.placeholderColor }}
                  >
                    <img src={p.urls.thumb} alt="" className="h-full w-full object-cover" loading="lazy" />
                  </button>
                </li>
              ))}
            </ul>
            <button type="button" aria-label="Next photo" onClick={() => go(index + 1)} className="rounded-tag p-1 text-ink-soft hover:bg-paper-sunk">
              <ChevronRight aria-hidden="true" className="size-5" />
            </button>
          </div>
        ) : null}
        <p className="sr-only" aria-live="polite">
          Photo {index + 1} of {count}
        </p>
      </div>
      {/* Outside the gallery region, so its arrow keys are not handled twice. */}
      {open ? <ZoomView photos={photos} index={index} title={title} onMove={go} onClose={() => setOpen(false)} /> : null}
    </>
  );
}

const ZOOMS = [1, 2, 3] as const;

function ZoomView({ photos, index, title, onMove, onClose }: { photos: ListingPhoto[]; index: number; title: string; onMove: (i: number) => void; onClose: () => void }) {
  const [zoom, setZoom] = useState(0);
  const [origin, setOrigin] = useState('50% 50%');
  const dialog = useRef<HTMLDivElement>(null);
  const opener = useRef<Element | null>(null);
  const photo = photos[index];

  useEffect(() => {
    opener.current = document.activeElement;
    dialog.current?.focus();
    return () => (opener.current as HTMLElement | null)?.focus?.();
  }, []);

  // Keys work wherever focus is while the view is open (a button that became disabled drops focus to the body).
  useEffect(() => {
    const onKey = (e: globalThis.KeyboardEvent) => {
      const keys: Record<string, () => void> = {
        Escape: onClose,
        ArrowRight: () => onMove(index + 1),
        ArrowLeft: () => onMove(index - 1),
        '+': () => setZoom((z) => Math.min(ZOOMS.length - 1, z + 1)),
        '=': () => setZoom((z) => Math.min(ZOOMS.length - 1, z + 1)),
        '-': () => setZoom((z) => Math.max(0, z - 1)),
        '0': () => setZoom(0),
      };
      const k = keys[e.key];
      if (k) {
        e.preventDefault();
        k();
      }
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [index, onMove, onClose]);

  const onKeyDown = (e: KeyboardEvent) => {
    // Keep focus inside the dialog.
    if (e.key === 'Tab' && dialog.current) {
      const focusable = [...dialog.current.querySelectorAll<HTMLElement>('button')];
      const first = focusable[0];
      const last = focusable[focusable.length - 1];
      if (e.shiftKey && document.activeElement === first) {
        e.preventDefault();
        last.focus();
      } else if (!e.shiftKey && document.activeElement === last) {
        e.preventDefault();
        first.focus();
      }
    }
  };

  return (
    <div
      ref={dialog}
      role="dialog"
      aria-modal="true"
      aria-label={`${title}: photo ${index + 1} of ${photos.length}, zoom ${ZOOMS[zoom]}×`}
      tabIndex={-1}
      onKeyDown={onKeyDown}
      className="fixed inset-0 z-50 flex flex-col bg-ink text-paper outline-none"
    >
      <div className="flex items-center justify-between gap-2 px-4 py-2">
        <p className="text-sm">
          Photo {index + 1} of {photos.length} · {ZOOMS[zoom]}×
        </p>
        <div className="flex gap-1">
          <button type="button" aria-label="Zoom out" disabled={zoom === 0} onClick={() => setZoom((z) => Math.max(0, z - 1))} className="rounded-tag p-2 hover:bg-white/10 disabled:opacity-40">
            <ZoomOut aria-hidden="true" className="size-5" />
          </button>
          <button
            type="button"
            aria-label="Zoom in"
            disabled={zoom === ZOOMS.length - 1}
            onClick={() => setZoom((z) => Math.min(ZOOMS.length - 1, z + 1))}
            className="rounded-tag p-2 hover:bg-white/10 disabled:opacity-40"
          >
            <ZoomIn aria-hidden="true" className="size-5" />
          </button>
          {photos.length > 1 ? (
            <>
              <button type="button" aria-label="Previous photo" onClick={() => onMove(index - 1)} className="rounded-tag p-2 hover:bg-white/10">
                <ChevronLeft aria-hidden="true" className="size-5" />
              </button>
              <button type="button" aria-label="Next photo" onClick={() => onMove(index + 1)} className="rounded-tag p-2 hover:bg-white/10">
                <ChevronRight aria-hidden="true" className="size-5" />
              </button>
            </>
          ) : null}
          <button type="button" aria-label="Close" onClick={onClose} className="rounded-tag p-2 hover:bg-white/10">
            <X aria-hidden="true" className="size-5" />
          </button>
        </div>
      </div>
      <div className="flex-1 overflow-hidden">
        <img
          src={photo.urls.large}
          alt={`${title}, photo ${index + 1}`}
          onClick={(e) => {
            // Click zooms in at the spot clicked; at the largest zoom a click goes back to fit.
            const r = e.currentTarget.getBoundingClientRect();
            setOrigin(`${(((e.clientX - r.left) / r.width) * 100).toFixed(1)}% ${(((e.clientY - r.top) / r.height) * 100).toFixed(1)}%`);
            setZoom((z) => (z === ZOOMS.length - 1 ? 0 : z + 1));
          }}
          style={{ transform: `scale(${ZOOMS[zoom]})`, transformOrigin: origin }}
          className={cn('h-full w-full object-contain transition-transform', zoom === ZOOMS.length - 1 ? 'cursor-zoom-out' : 'cursor-zoom-in')}
        />
      </div>
    </div>
  );
}
