import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { TeardownUpdateInput } from '@shared/schemas/garage';
import { createTestQueryClient, jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { garageKeys } from '../api/garage-keys';
import { useChecklist } from '../api/get-checklist';
import { ASSEMBLY_ID, checklist, defaultLines, VEHICLE_ID } from '../testing/garage-fixtures';
import { TeardownChecklist } from './teardown-checklist';

const putPath = (lineId: string) => `/api/garage/vehicles/${VEHICLE_ID}/teardown/${lineId}`;

/**
 * A tiny stand-in for the server: PUT changes a line (needed = quantity - usable on hand for the need
 * statuses, as server/domain/needs.ts says) and GET of the checklist returns the current state.
 */
function fakeServer() {
  const lines = defaultLines();
  const put = ({ body, url }: { body: unknown; url: URL }) => {
    const id = url.pathname.split('/').pop()!;
    const line = lines.find((l) => l.id === id)!;
    const t = { ...line.teardown, ...(body as TeardownUpdateInput), updatedAt: '2025-03-06T08:00:00.000Z' };
    line.teardown = t;
    line.needed = ['replace', 'missing', 'wrong_part'].includes(t.status) ? Math.max(0, line.quantity - t.usableOnHand) : 0;
    return jsonResponse(200, { bomLineId: id, teardown: t, needed: line.needed });
  };
  const handlers = {
    [`GET /api/garage/vehicles/${VEHICLE_ID}/assemblies/${ASSEMBLY_ID}`]: () => jsonResponse(200, checklist(lines)),
    ...Object.fromEntries(lines.map((l) => [`PUT ${putPath(l.id)}`, put])),
  };
  return mockApi(handlers);
}

function Harness() {
  const q = useChecklist(VEHICLE_ID, ASSEMBLY_ID);
  return q.data ? <TeardownChecklist checklist={q.data} /> : null;
}

function renderChecklist() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(garageKeys.checklist(VEHICLE_ID, ASSEMBLY_ID), checklist());
  return renderWithProviders(<Harness />, { queryClient });
}

const lineItem = (name: RegExp) => screen.getByRole('listitem', { name });

describe('teardown checklist', () => {
  it('when a status is picked on a line, then exactly that status is PUT for that line', async () => {
    const { calls } = fakeServer();
    const { user } = renderChecklist();

    const boot = lineItem(/Callout 7: Boot/);
    await user.click(within(boot).getByRole('radio', { name: 'Replace' }));

    await waitFor(() => expect(calls.filter((c) => c.method === 'PUT')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'PUT')).toEqual({ method: 'PUT', path: `/api/garage/vehicles/${VEHICLE_ID}/teardown/line-boot`, body: { status: 'replace' } });
    await waitFor(() => expect(within(boot).getByRole('radio', { name: 'Replace' })).toBeChecked());
  });

  it('when a line is marked replace, then needed shows as quantity minus usable on hand, and a usable piece lowers it', async () => {
    const { calls } = fakeServer();
    const { user } = renderChecklist();

    const cap = lineItem(/Callout 9: Cap/);
    expect(within(cap).getByTestId('needed')).toHaveTextContent('Needed 3 = 4 per assembly − 1 usable on hand');

    await user.click(within(cap).getByRole('button', { name: 'One more usable on hand' }));
    await waitFor(() => expect(within(cap).getByTestId('needed')).toHaveTextContent('Needed 2 = 4 per assembly − 2 usable on hand'));
    expect(calls.filter((c) => c.method === 'PUT').map((c) => c.body)).toEqual([{ usableOnHand: 2 }]);
  });

  it('when the wanted condition of a needed line changes, then the policy is PUT', async () => {
    const { calls } = fakeServer();
    const { user } = renderChecklist();

    const cap = lineItem(/Callout 9: Cap/);
    await user.selectOptions(within(cap).getByLabelText('Wanted condition'), 'reproduction_ok');
    await waitFor(() => expect(calls.filter((c) => c.method === 'PUT').map((c) => c.body)).toEqual([{ policy: 'reproduction_ok' }]));
  });

  it('when a note is edited and saved, then the trimmed note is PUT', async () => {
    const { calls } = fakeServer();
    const { user } = renderChecklist();

    const cap = lineItem(/Callout 9: Cap/);
    const note = within(cap).getByLabelText(/Note on KV-7740/);
    await user.clear(note);
    await user.type(note, '  Two cracked, one missing its vent  ');
    await user.click(within(cap).getByRole('button', { name: 'Save note' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PUT').map((c) => c.body)).toEqual([{ note: 'Two cracked, one missing its vent' }]));
  });

  it('when a line is kept or not inspected, then no needed count or usable stepper shows', () => {
    fakeServer();
    renderChecklist();
    const boot = lineItem(/Callout 7: Boot/);
    expect(within(boot).queryByTestId('needed')).not.toBeInTheDocument();
    expect(within(boot).queryByRole('button', { name: 'One more usable on hand' })).not.toBeInTheDocument();
  });

  it('when lines are brake or steering parts, then each shows its short caution, and others do not', () => {
    fakeServer();
    renderChecklist();
    expect(within(lineItem(/Callout 7: Boot/)).getByText(/Brake work: have it inspected by a qualified mechanic before road use/)).toBeInTheDocument();
    expect(within(lineItem(/Callout 12: Drag link/)).getByText(/Steering work: have it inspected/)).toBeInTheDocument();
    expect(within(lineItem(/Callout 9: Cap/)).queryByText(/inspected by a qualified mechanic/)).not.toBeInTheDocument();
  });

  it('when the checklist renders, then the assembly and vehicle progress bars carry their share and lines excluded by serial fold away', () => {
    fakeServer();
    renderChecklist();
    const asm = screen.getByRole('progressbar', { name: 'Progress of Master cylinder' });
    expect(asm).toHaveAttribute('aria-valuenow', '33');
    expect(asm).toHaveAttribute('aria-valuetext', '1 of 3 lines inspected (33%)');
    expect(screen.getByRole('progressbar', { name: 'Progress of the whole vehicle' })).toHaveAttribute('aria-valuenow', '10');
    expect(screen.getByText('Not on this vehicle (1)')).toBeInTheDocument();
    expect(screen.getByText('Serials from 5000')).toBeInTheDocument();
  });
  it('when photos are chosen on a line, then they go up as multipart "photos" and the thumbnails show', async () => {
    const photo = { id: 'ph1', placeholderColor: '#8a7b66', urls: { thumb: '/media/t.webp', medium: '/media/m.webp', large: '/media/l.webp' } };
    let stored = false;
    const lines = defaultLines();
    mockApi({
      [`GET /api/garage/vehicles/${VEHICLE_ID}/assemblies/${ASSEMBLY_ID}`]: () =>
        jsonResponse(200, checklist(stored ? lines.map((l) => (l.id === 'line-boot' ? { ...l, teardown: { ...l.teardown, photos: [photo] } } : l)) : lines)),
      [`POST ${putPath('line-boot')}/photos`]: () => {
        stored = true;
        return jsonResponse(201, { bomLineId: 'line-boot', photos: [photo] });
      },
    });
    const fetchMock = vi.mocked(fetch);
    const { user } = renderChecklist();

    const boot = lineItem(/Callout 7: Boot/);
    await user.click(within(boot).getByText('Note and photos'));
    await user.upload(within(boot).getByLabelText('Add photos of Boot, master cylinder push rod'), new File([new Uint8Array([0xff, 0xd8, 0xff])], 'boot.jpg', { type: 'image/jpeg' }));
    const call = fetchMock.mock.calls.find(([url]) => String(url).endsWith('/photos'));
    const uploaded = call?.[1]?.body as FormData;
    expect(uploaded).toBeInstanceOf(FormData);
    expect((uploaded.get('photos') as File).name).toBe('boot.jpg');
    expect(await within(boot).findByRole('img', { name: 'Photo 1 of Boot, master cylinder push rod' })).toHaveAttribute('src', '/media/t.webp');
  });
});
