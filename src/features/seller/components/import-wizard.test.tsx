import { fireEvent, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi, renderWithProviders } from '@/testing/test-utils';
import { ImportWizard } from './import-wizard';

const fields = [
  { name: 'part_number', label: 'Part number', required: false },
  { name: 'title', label: 'Title', required: true },
  { name: 'condition', label: 'Condition', required: true },
  { name: 'quantity', label: 'Quantity', required: true },
  { name: 'price', label: 'Price', required: true },
];

// 30 rows so the import goes up in two requests (25 + 5).
const rows = Array.from({ length: 30 }, (_, i) => `FX-${100 + i},Clamp ${i + 1},nos,${i + 1},${i === 3 ? 'cheap' : '2.50'}`);
const csv = `Item No,Name,Cond,Qty,Each\n${rows.join('\n')}\n`;

function preview(mapping: Record<string, string | null>) {
  return {
    headers: ['Item No', 'Name', 'Cond', 'Qty', 'Each'],
    mapping,
    fields,
    rows: rows.map((_, i) => ({
      row: i + 2,
      values: { part_number: `FX-${100 + i}`, title: `Clamp ${i + 1}`, condition: 'nos', quantity: String(i + 1), price: i === 3 ? 'cheap' : '2.50' },
      part: { id: 'p', name: 'Hose clamp (fictional)' },
      errors: i === 3 ? [{ field: 'price', message: 'Give the price in dollars, e.g. 42.50' }] : [],
    })),
    summary: { total: 30, valid: 29, invalid: 1 },
  };
}

describe('import wizard', () => {
  it('when a CSV is mapped, checked and imported skipping the bad row, then the rows go up in chunks with progress and row numbers of the file', async () => {
    const guessed = { part_number: 'Item No', title: 'Name', condition: null, quantity: 'Qty', price: 'Each' };
    const commits: Array<{ csv: string; as: string; skipInvalid: boolean; mapping: unknown }> = [];
    const { calls } = mockApi({
      'POST /api/me/listings/import/preview': ({ body }) => jsonResponse(200, preview((body as { mapping?: Record<string, string | null> }).mapping ?? guessed)),
      'POST /api/me/listings/import': ({ body }) => {
        const b = body as { csv: string; as: string; skipInvalid: boolean; mapping: unknown };
        commits.push(b);
        const n = b.csv.trim().split('\r\n').length - 1;
        // The first chunk holds the bad row (its 4th data row, chunk row 5).
        const skipped = commits.length === 1 ? [{ row: 5, errors: [{ field: 'price', message: 'Give the price in dollars' }] }] : [];
        return jsonResponse(201, { created: n - skipped.length, listingIds: [], as: b.as, skipped });
      },
    });
    const { user } = renderWithProviders(<ImportWizard />);

    const file = new File([csv], 'stock.csv', { type: 'text/csv' });
    await user.upload(screen.getByLabelText('Choose a CSV file'), file);

    // Step 2: the guessed mapping, with condition left for the seller.
    expect(await screen.findByLabelText(/^Condition/)).toHaveValue('');
    expect(screen.getByLabelText(/^Title/)).toHaveValue('Name');
    await user.selectOptions(screen.getByLabelText(/^Condition/), 'Cond');
    await user.click(screen.getByRole('button', { name: 'Check the rows' }));
    expect(calls.filter((c) => c.path.endsWith('/preview')).at(-1)?.body).toMatchObject({ mapping: { condition: 'Cond', title: 'Name' } });

    // Step 3: each row's errors; import needs the skip choice while a row is bad.
    expect(await screen.findByText('29 of 30 rows are ready; 1 has errors.')).toBeInTheDocument();
    expect(screen.getByRole('cell', { name: /price: Give the price in dollars, e\.g\. 42\.50/ })).toBeInTheDocument();
    const importButton = screen.getByRole('button', { name: /^Import \d+ listings/ });
    expect(importButton).toBeDisabled();
    await user.click(screen.getByLabelText(/skip the 1 with errors/));
    await user.click(screen.getByRole('radio', { name: /Submitted for review now/ }));
    await user.click(screen.getByRole('button', { name: 'Import 29 listings' }));

    expect(await screen.findByText('29 listings imported as submitted for review')).toBeInTheDocument();
    expect(screen.getByText('Skipped rows: 5.')).toBeInTheDocument();
    expect(screen.getByRole('progressbar', { name: 'Import progress' })).toHaveAttribute('aria-valuenow', '30');
    expect(commits).toHaveLength(2);
    expect(commits[0]).toMatchObject({ as: 'submitted', skipInvalid: true, mapping: { condition: 'Cond' } });
    expect(commits[0].csv.split('\r\n')[0]).toBe('Item No,Name,Cond,Qty,Each');
    expect(commits[1].csv.trim().split('\r\n')).toHaveLength(6);
  });

  it('when the file is dropped and the server cannot read it, then its message shows', async () => {
    mockApi({ 'POST /api/me/listings/import/preview': jsonResponse(400, { error: { code: 'validation_failed', message: 'The CSV file has no header row' } }) });
    renderWithProviders(<ImportWizard />);
    const drop = screen.getByText('Drop a CSV file here, or').parentElement!;
    fireEvent.drop(drop, { dataTransfer: { files: [new File(['\n'], 'empty.csv', { type: 'text/csv' })] } });
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent('The CSV file has no header row'));
  });
});
