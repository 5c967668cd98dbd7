import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { LISTING_ID, makeListing, makePhoto } from '../testing/listing-fixtures';
import { movePhoto, PhotoManager, refuseFile } from './photo-manager';

/** A stand-in XMLHttpRequest whose uploads the test drives by hand. */
class FakeXhr {
  static sent: FakeXhr[] = [];
  upload: { onprogress: ((e: { lengthComputable: boolean; loaded: number; total: number }) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  status = 0;
  responseText = '';
  method = '';
  url = '';
  withCredentials = false;
  body: FormData | null = null;
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader() {}
  abort() {}
  send(body: FormData) {
    this.body = body;
    FakeXhr.sent.push(this);
  }
  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ lengthComputable: true, loaded, total }));
  }
  respond(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    act(() => this.onload?.());
  }
}

const jpeg = (name: string) => new File([new Uint8Array(2048)], name, { type: 'image/jpeg' });

describe('photo manager', () => {
  it('when two photos are dropped, then each uploads in its own request with its own progress bar, one after the other', async () => {
    FakeXhr.sent = [];
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    mockApi({ [`GET /api/listings/${LISTING_ID}`]: jsonResponse(200, {}) });
    renderWithProviders(<PhotoManager listingId={LISTING_ID} photos={[]} title="Wheel cylinder" />);

    fireEvent.drop(screen.getByTestId('photo-drop-zone'), { dataTransfer: { files: [jpeg('front.jpg'), jpeg('marks.jpg')], types: ['Files'] } });

    const bars = await screen.findAllByRole('progressbar');
    expect(bars.map((b) => b.getAttribute('aria-label'))).toEqual(['Upload of front.jpg', 'Upload of marks.jpg']);
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    const first = FakeXhr.sent[0];
    expect(first.method).toBe('POST');
    expect(first.url).toBe(`/api/listings/${LISTING_ID}/photos`);
    expect((first.body!.get('photos') as File).name).toBe('front.jpg');
    expect(screen.getByText('Waiting')).toBeInTheDocument();

    first.progress(512, 2048);
    expect(screen.getByRole('progressbar', { name: 'Upload of front.jpg' })).toHaveAttribute('aria-valuenow', '25');
    first.respond(201, { listing: makeListing(), photos: [makePhoto(1)] });

    await waitFor(() => expect(FakeXhr.sent).toHaveLength(2));
    expect((FakeXhr.sent[1].body!.get('photos') as File).name).toBe('marks.jpg');
    FakeXhr.sent[1].respond(415, { error: { code: 'unsupported_media', message: 'marks.jpg is not a photo we can read' } });
    expect(await screen.findByRole('alert')).toHaveTextContent('marks.jpg is not a photo we can read');
    expect(screen.getByRole('progressbar', { name: 'Upload of front.jpg' })).toHaveAttribute('aria-valuenow', '100');
  });

  it('when a file is not a JPEG, PNG or WebP photo, then it is refused before any upload', () => {
    expect(refuseFile(new File(['x'], 'scan.heic', { type: 'image/heic' }))).toMatch(/only JPEG, PNG and WebP/);
    expect(refuseFile(jpeg('ok.jpg'))).toBeNull();
  });

  it('when a photo is made the cover, then the new order goes to the server with it first', async () => {
    const photos = [makePhoto(1), makePhoto(2), makePhoto(3)];
    const { calls } = mockApi({
      [`PUT /api/listings/${LISTING_ID}/photos/order`]: ({ body }) => jsonResponse(200, { photos: (body as { photoIds: string[] }).photoIds.map((id, i) => ({ ...photos.find((p) => p.id === id)!, position: i })) }),
      [`GET /api/listings/${LISTING_ID}`]: jsonResponse(200, {}),
    });
    const { user } = renderWithProviders(<PhotoManager listingId={LISTING_ID} photos={photos} title="Wheel cylinder" />);

    const order = screen.getByRole('list', { name: 'Photo order' });
    expect(within(order).getAllByRole('listitem')[0]).toHaveTextContent('Cover');
    await user.click(within(within(order).getAllByRole('listitem')[2]).getByRole('button', { name: 'Make cover' }));

    await waitFor(() => expect(calls.find((c) => c.method === 'PUT')?.body).toEqual({ photoIds: [photos[2].id, photos[0].id, photos[1].id] }));
    expect(within(order).getAllByRole('img')[0]).toHaveAttribute('alt', 'Wheel cylinder, photo 1');
    expect(within(order).getAllByRole('img')[0]).toHaveAttribute('src', '/media/t3.webp');
  });

  it('when moved, then the order shifts without losing a photo', () => {
    expect(movePhoto(['a', 'b', 'c'], 0, 2)).toEqual(['b', 'c', 'a']);
    expect(movePhoto(['a', 'b', 'c'], 1, -1)).toEqual(['a', 'b', 'c']);
  });
});
