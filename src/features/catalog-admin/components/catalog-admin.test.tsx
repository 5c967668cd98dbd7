import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { CreatePartForm } from './create-part-form';
import { DataQualityReport } from './data-quality-report';
import { SupersessionForm } from './supersession-form';

// Fictional ids and numbers.
const PART = '00000000-0000-4000-8000-0000000000d1';

describe('catalog editor', () => {
  it('when a supersession is added from the newer part’s side, then the request names the older part as from', async () => {
    const { calls } = mockApi({ 'POST /api/admin/supersessions': jsonResponse(201, { supersession: { id: 's1' } }) });
    const { user } = renderWithProviders(<SupersessionForm partId={PART} />);

    await user.selectOptions(screen.getByLabelText('This part'), 'replaces');
    await user.type(screen.getByLabelText("Other part's number"), 'FX-100');
    await user.selectOptions(screen.getByLabelText('Interchange'), 'one_way');
    await user.click(screen.getByRole('button', { name: 'Add supersession' }));

    expect(await screen.findByText('Supersession added.')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ from: 'FX-100', to: PART, interchange: 'one_way', quantity: 1 });
  });

  it('when a conditional supersession has no note, then the shared rule’s message shows and nothing is sent', async () => {
    const { calls } = mockApi({});
    const { user } = renderWithProviders(<SupersessionForm partId={PART} />);
    await user.type(screen.getByLabelText("Other part's number"), 'FX-100');
    await user.selectOptions(screen.getByLabelText('Interchange'), 'conditional');
    await user.click(screen.getByRole('button', { name: 'Add supersession' }));
    expect(await screen.findByText('A conditional interchange needs a note saying the condition')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it('when a new part is created, then its first number goes with it and the editor opens it', async () => {
    const { calls } = mockApi({ 'POST /api/admin/parts': jsonResponse(201, { part: { id: PART, name: 'Pin, clevis, fictional' } }) });
    const { user, router } = renderWithProviders(<CreatePartForm onDone={() => {}} />, { url: '/admin/catalog' });

    await user.type(screen.getByLabelText('Name'), 'Pin, clevis, fictional');
    await user.clear(screen.getByLabelText('Category'));
    await user.type(screen.getByLabelText('Category'), 'pin');
    await user.type(screen.getByLabelText('First number'), 'FX-2001');
    await user.click(screen.getByRole('button', { name: 'Create part' }));

    expect(await screen.findByText('Part “Pin, clevis, fictional” created.')).toBeInTheDocument();
    expect(calls[0].body).toEqual({ name: 'Pin, clevis, fictional', category: 'pin', description: '', safetyClass: 'none', numbers: [{ number: 'FX-2001', kind: 'maker' }] });
    expect(router.state.location.search).toBe(`?part=${PART}`);
  });

  it('when the data-quality report loads, then each check shows its count and the loop is spelled out with links to fix it', async () => {
    mockApi({
      'GET /api/admin/data-quality': jsonResponse(200, {
        loops: [{ partIds: ['a', 'b'], numbers: ['FX-1', 'FX-2'], message: 'Supersession loop: FX-1 → FX-2 → back to the start' }],
        numbersOnSeveralParts: [],
        partsInNoAssembly: { count: 3, sample: [{ id: 'c', name: 'Gasket, fictional', primaryNumber: 'FX-3' }] },
        overlappingLines: [],
      }),
    });
    renderWithProviders(<DataQualityReport />);
    const loops = (await screen.findByRole('heading', { name: 'Supersession loops' })).closest('section')!;
    expect(within(loops).getByText('Supersession loop: FX-1 → FX-2 → back to the start')).toBeInTheDocument();
    expect(within(loops).getByRole('link', { name: 'FX-2' })).toHaveAttribute('href', '/admin/catalog?part=b');
    const duplicates = screen.getByRole('heading', { name: 'Numbers on several parts' }).closest('section')!;
    expect(within(duplicates).getByText('Nothing to fix.')).toBeInTheDocument();
    expect(screen.getByText('The first 1 of 3:')).toBeInTheDocument();
  });
});
