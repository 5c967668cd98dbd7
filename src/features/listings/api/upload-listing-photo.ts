import { apiErrorBodySchema } from '@shared/errors';
import { apiPaths } from '@/config/paths';
import { env } from '@/config/env';
import { ApiError } from '@/lib/api-client';
import type { Listing, ListingPhoto } from './listing-types';

export interface UploadReply {
  listing: Listing;
  photos: ListingPhoto[];
}

const fallback: Record<number, string> = {
  413: 'This photo is too large (at most 15 MB).',
  415: 'Only JPEG, PNG and WebP photos are accepted.',
};

/**
 * One photo in its own request, so each file gets its own progress bar: fetch reports no upload progress,
 * XMLHttpRequest does. Same-origin, so the browser adds the Origin header the server requires.
 * `onProgress` gets 0..1 while the bytes go out.
 */
export function uploadListingPhoto(listingId: string, file: File, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<UploadReply> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${env.VITE_API_BASE_URL}${apiPaths.listings.photos(listingId)}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300 && body && typeof body === 'object') {
        onProgress(1);
        resolve(body as UploadReply);
        return;
      }
      const parsed = apiErrorBodySchema.safeParse(body);
      reject(
        parsed.success
          ? new ApiError({ status: xhr.status, ...parsed.data.error })
          : new ApiError({ status: xhr.status, code: 'http_error', message: fallback[xhr.status] ?? `The upload failed (${xhr.status}).` }),
      );
    };
    xhr.onerror = () => reject(new ApiError({ status: 0, code: 'network_error', message: 'The upload did not reach Drabyard. Check your connection and try again.' }));
    xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    const form = new FormData();
    form.append('photos', file, file.name);
    xhr.send(form);
  });
}
