import { useQueryClient } from '@tanstack/react-query';
import { ArrowLeft, ArrowRight, ImagePlus, Star, Trash2 } from 'lucide-react';
import { useEffect, useId, useRef, useState, type DragEvent } from 'react';
import { toast } from 'sonner';
import { LISTING_LIMITS } from '@shared/schemas/listings';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { useDeleteListingPhoto } from '../api/delete-listing-photo';
import { listingKeys } from '../api/listing-keys';
import type { ListingPhoto } from '../api/listing-types';
import { useReorderListingPhotos } from '../api/reorder-listing-photos';
import { uploadListingPhoto } from '../api/upload-listing-photo';

// Matches server/lib/photos/pipeline.ts: JPEG, PNG and WebP only, 15 MB each, 12 per listing.
const ACCEPTED = ['image/jpeg', 'image/png', 'image/webp'];

interface Upload {
  key: string;
  name: string;
  progress: number;
  status: 'waiting' | 'uploading' | 'done' | 'failed';
  error?: string;
}

let uploadSeq = 0;

/** Checks a file before any byte is sent; returns the reason it is refused, or null. */
export function refuseFile(file: File): string | null {
  if (!ACCEPTED.includes(file.type)) return `${file.name}: only JPEG, PNG and WebP photos are accepted`;
  if (file.size > LISTING_LIMITS.photoBytesMax) return `${file.name}: larger than 15 MB`;
  return null;
}

export function movePhoto(ids: string[], from: number, to: number): string[] {
  if (to < 0 || to >= ids.length || from === to) return ids;
  const next = [...ids];
  const [moved] = next.splice(from, 1);
  next.splice(to, 0, moved);
  return next;
}

type Props = { listingId: string; photos: ListingPhoto[]; title: string };

/**
 * Photos of a listing: drop or choose files (each uploads in its own request with its own progress bar,
 * one after the other so they keep the chosen order), reorder by dragging or with the buttons, and the
 * first photo is the cover.
 */
export function PhotoManager({ listingId, photos, title }: Props) {
  const inputId = useId();
  const queryClient = useQueryClient();
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [order, setOrder] = useState<string[]>(() => photos.map((p) => p.id));
  const [dragOver, setDragOver] = useState(false);
  const [dragging, setDragging] = useState<number | null>(null);
  const queue = useRef(Promise.resolve());
  const reorder = useReorderListingPhotos();
  const remove = useDeleteListingPhoto();

  // The server's order wins whenever the photos change (after an upload, a removal or a saved reorder).
  const serverOrder = photos.map((p) => p.id).join(',');
  useEffect(() => setOrder(serverOrder ? serverOrder.split(',') : []), [serverOrder]);

  const byId = new Map(photos.map((p) => [p.id, p]));
  const shown = order.map((id) => byId.get(id)).filter((p): p is ListingPhoto => !!p);
  const pending = uploads.filter((u) => u.status === 'waiting' || u.status === 'uploading').length;
  const room = LISTING_LIMITS.photosMax - photos.length - pending;

  const patch = (key: string, change: Partial<Upload>) => setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...change } : u)));

  function addFiles(files: File[]) {
    const refused: string[] = [];
    const ok: File[] = [];
    for (const f of files) {
      const why = refuseFile(f);
      if (why) refused.push(why);
      else ok.push(f);
    }
    if (ok.length > room) {
      refused.push(`Only ${Math.max(0, room)} more photo${room === 1 ? '' : 's'} fit (at most ${LISTING_LIMITS.photosMax} per listing)`);
      ok.splice(Math.max(0, room));
    }
    for (const r of refused) toast.error(r);
    const items = ok.map((file) => ({ file, item: { key: `u${++uploadSeq}`, name: file.name, progress: 0, status: 'waiting' as const } }));
    setUploads((list) => [...list.filter((u) => u.status !== 'done'), ...items.map((i) => i.item)]);
    for (const { file, item } of items) {
      queue.current = queue.current.then(async () => {
        patch(item.key, { status: 'uploading' });
        try {
          await uploadListingPhoto(listingId, file, (progress) => patch(item.key, { progress }));
          patch(item.key, { status: 'done', progress: 1 });
          await queryClient.invalidateQueries({ queryKey: listingKeys.detail(listingId) });
        } catch (error) {
          patch(item.key, { status: 'failed', error: error instanceof Error ? error.message : 'The upload failed' });
        }
      });
    }
  }

  function saveOrder(next: string[]) {
    const before = order;
    setOrder(next);
    reorder.mutate(
      { id: listingId, photoIds: next },
      {
        onError: (error) => {
          setOrder(before);
          toast.error(error.message);
        },
      },
    );
  }

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragOver(false);
    if (e.dataTransfer.files.length) addFiles([...e.dataTransfer.files]);
  };

  return (
    <section aria-labelledby={`${inputId}-h`} className="space-y-4 rounded-card border border-rule bg-paper-raised p-5 shadow-card">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`${inputId}-h`} className="text-lg font-bold text-ink">
          Photos
        </h2>
        <p className="text-sm text-ink-muted">
          {photos.length} of {LISTING_LIMITS.photosMax}. The first photo is the cover.
        </p>
      </div>

      <div
        onDragOver={(e) => {
          if (e.dataTransfer.types.includes('Files')) {
            e.preventDefault();
            setDragOver(true);
          }
        }}
        onDragLeave={() => setDragOver(false)}
        onDrop={onDrop}
        data-testid="photo-drop-zone"
        className={cn(
          'flex flex-col items-center gap-2 rounded-card border-2 border-dashed px-4 py-6 text-center',
          dragOver ? 'border-patina-500 bg-patina-50' : 'border-rule-strong bg-paper',
        )}
      >
        <ImagePlus aria-hidden="true" className="size-8 text-patina-600" />
        <p className="text-sm text-ink-soft">Drop photos here, or</p>
        <label htmlFor={inputId} className="cursor-pointer rounded-tag border border-rule-strong bg-paper-raised px-3 py-1.5 text-sm font-semibold text-ink hover:bg-paper-sunk">
          Choose photos
        </label>
        <input
          id={inputId}
          type="file"
          multiple
          accept={ACCEPTED.join(',')}
          className="sr-only"
          disabled={room <= 0}
          onChange={(e) => {
            addFiles([...(e.target.files ?? [])]);
            e.target.value = '';
          }}
        />
        <p className="text-xs text-ink-muted">JPEG, PNG or WebP, up to 15 MB each. Show the maker&rsquo;s marks and any damage.</p>
      </div>

      {uploads.length > 0 ? (
        <ul aria-label="Uploads" className="space-y-2">
          {uploads.map((u) => (
            <li key={u.key} className="text-sm">
              <div className="flex justify-between gap-3">
                <span className="truncate text-ink">{u.name}</span>
                <span className={cn('shrink-0', u.status === 'failed' ? 'text-danger' : 'text-ink-muted')}>
                  {u.status === 'waiting' ? 'Waiting' : u.status === 'uploading' ? `${Math.round(u.progress * 100)}%` : u.status === 'done' ? 'Uploaded' : 'Failed'}
                </span>
              </div>
              <div
                role="progressbar"
                aria-label={`Upload of ${u.name}`}
                aria-valuemin={0}
                aria-valuemax={100}
                aria-valuenow={Math.round(u.progress * 100)}
                className="mt-1 h-1.5 overflow-hidden rounded-full bg-paper-sunk"
              >
                <div className={cn('h-full transition-[width]', u.status === 'failed' ? 'bg-danger' : 'bg-patina-500')} style={{ width: `${Math.round(u.progress * 100)}%` }} />
              </div>
              {u.error ? (
                <p role="alert" className="mt-1 text-danger">
                  {u.error}
                </p>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}

      {shown.length > 0 ? (
        <ol aria-label="Photo order" className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
          {shown.map((p, i) => (
            <li
              key={p.id}
              draggable
              onDragStart={(e) => {
                setDragging(i);
                e.dataTransfer.effectAllowed = 'move';
              }}
              onDragOver={(e) => {
                if (dragging !== null) e.preventDefault();
              }}
              onDrop={(e) => {
                if (dragging === null) return;
                e.preventDefault();
                e.stopPropagation();
                saveOrder(movePhoto(order, dragging, i));
                setDragging(null);
              }}
              onDragEnd={() => setDragging(null)}
              className={cn('overflow-hidden rounded-tag border bg-paper', i === 0 ? 'border-patina-500 ring-2 ring-patina-200' : 'border-rule', dragging === i && 'opacity-50')}
            >
              <div className="relative aspect-[4/3]" style={{ backgroundColor: p.placeholderColor }}>
                <img src={p.urls.thumb} alt={`${title}, photo ${i + 1}`} className="h-full w-full cursor-grab object-cover" loading="lazy" />
                {i === 0 ? (
                  <span className="absolute top-1.5 left-1.5 inline-flex items-center gap-1 rounded-tag bg-ink/80 px-1.5 py-0.5 text-label text-paper uppercase">
                    <Star aria-hidden="true" className="size-3" /> Cover
                  </span>
                ) : null}
              </div>
              <div className="flex items-center justify-between gap-1 p-1">
                <Button size="sm" variant="ghost" aria-label={`Move photo ${i + 1} earlier`} disabled={i === 0 || reorder.isPending} onClick={() => saveOrder(movePhoto(order, i, i - 1))} className="px-2">
                  <ArrowLeft aria-hidden="true" className="size-4" />
                </Button>
                {i > 0 ? (
                  <Button size="sm" variant="ghost" disabled={reorder.isPending} onClick={() => saveOrder(movePhoto(order, i, 0))} className="px-2 text-xs">
                    Make cover
                  </Button>
                ) : null}
                <Button
                  size="sm"
                  variant="ghost"
                  aria-label={`Move photo ${i + 1} later`}
                  disabled={i === shown.length - 1 || reorder.isPending}
                  onClick={() => saveOrder(movePhoto(order, i, i + 1))}
                  className="px-2"
                >
                  <ArrowRight aria-hidden="true" className="size-4" />
                </Button>
                <Button
                  size="sm"
                  variant="ghost"
                  aria-label={`Remove photo ${i + 1}`}
                  disabled={remove.isPending}
                  onClick={() => remove.mutate({ id: listingId, photoId: p.id }, { onError: (error) => toast.error(error.message) })}
                  className="px-2 text-danger"
                >
                  <Trash2 aria-hidden="true" className="size-4" />
                </Button>
              </div>
            </li>
          ))}
        </ol>
      ) : (
        <p className="text-sm text-ink-muted">No photos yet. Buyers trust listings with clear photos of the real part.</p>
      )}
    </section>
  );
}
