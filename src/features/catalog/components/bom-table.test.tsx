import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { assemblyReply } from '../testing/catalog-fixtures';
import { BomTable } from './bom-table';

const lines = assemblyReply().lines;
const partNames = () => screen.getAllByRole('rowheader').map((th) => within(th).getByRole('link').textContent);

function renderTable() {
  return renderWithProviders(<BomTable lines={lines} highlighted={null} selected={null} onHighlight={vi.fn()} onSelect={vi.fn()} />);
}

describe('parts list table', () => {
  it('when a column header is clicked, then the rows sort by it, and a second click reverses them', async () => {
    const { user } = renderTable();
    expect(partNames()).toEqual(['Master cylinder, early', 'Master cylinder, late', 'Cap, filler, vented', 'Screw, cap, hexagon head']);

    const partHeader = screen.getByRole('columnheader', { name: /^Part$/ });
    await user.click(within(partHeader).getByRole('button'));
    expect(partHeader).toHaveAttribute('aria-sort', 'ascending');
    expect(partNames()).toEqual(['Cap, filler, vented', 'Master cylinder, early', 'Master cylinder, late', 'Screw, cap, hexagon head']);

    await user.click(within(partHeader).getByRole('button'));
    expect(partHeader).toHaveAttribute('aria-sort', 'descending');
    expect(partNames()[0]).toBe('Screw, cap, hexagon head');
  });

  it('when sorted by callout, then 10 comes after 2', async () => {
    const { user } = renderTable();
    await user.click(within(screen.getByRole('columnheader', { name: /Callout/ })).getByRole('button'));
    await user.click(within(screen.getByRole('columnheader', { name: /Callout/ })).getByRole('button'));
    // Descending: 10 first, as a number.
    expect(partNames()[0]).toBe('Screw, cap, hexagon head');
  });

  it('when text is typed in the filter, then only the lines that match by name, number or note stay', async () => {
    const { user } = renderTable();
    const filter = screen.getByLabelText('Filter the parts list');
    await user.type(filter, 'master');
    expect(partNames()).toEqual(['Master cylinder, early', 'Master cylinder, late']);
    expect(screen.getByText('2 of 4 lines')).toBeInTheDocument();

    await user.clear(filter);
    await user.type(filter, 'FV-10647');
    expect(partNames()).toEqual(['Screw, cap, hexagon head']);

    await user.clear(filter);
    await user.type(filter, 'vented type');
    expect(partNames()).toEqual(['Cap, filler, vented']);

    await user.clear(filter);
    await user.type(filter, 'no such thing');
    expect(screen.getByText('No line matches the filter.')).toBeInTheDocument();
  });
});
