import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import { ArrowDown, ArrowUp, ArrowUpDown, TriangleAlert } from 'lucide-react';
import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import type { BomLine } from '../api/catalog-schemas';
import { applicabilityText, compareCallouts } from '../utils/catalog-format';

export type BomTableProps = {
  lines: BomLine[];
  highlighted: string | null;
  selected: string | null;
  onHighlight: (callout: string | null) => void;
  onSelect: (callout: string) => void;
  /** True while the serial filter is applied (the "applies to" column then reads as a check). */
  filtered?: boolean;
};

const matchesText: FilterFn<BomLine> = (row, _columnId, value: string) => {
  const needle = value.trim().toLowerCase();
  if (!needle) return true;
  const l = row.original;
  return [l.callout, l.part.name, l.part.primaryNumber ?? '', l.notes ?? '', applicabilityText(l.applicability)].some((v) => v.toLowerCase().includes(needle));
};

const columns: ColumnDef<BomLine>[] = [
  {
    id: 'callout',
    header: 'Callout',
    accessorFn: (l) => l.callout,
    sortingFn: (a, b) => compareCallouts(a.original.callout, b.original.callout),
  },
  { id: 'number', header: 'Part number', accessorFn: (l) => l.part.primaryNumber ?? '' },
  { id: 'name', header: 'Part', accessorFn: (l) => l.part.name },
  { id: 'quantity', header: 'Qty', accessorFn: (l) => l.quantity },
  { id: 'applies', header: 'Applies to', accessorFn: (l) => applicabilityText(l.applicability) },
  { id: 'notes', header: 'Notes', accessorFn: (l) => l.notes ?? '', enableSorting: false },
];

const ariaSort = { asc: 'ascending', desc: 'descending' } as const;

/** The bill of materials: sortable by each column, filtered by one text box, linked both ways to the diagram. */
export function BomTable({ lines, highlighted, selected, onHighlight, onSelect, filtered = false }: BomTableProps) {
  const filterId = useId();
  const [sorting, setSorting] = useState<SortingState>([]);
  const [globalFilter, setGlobalFilter] = useState('');
  const bodyRef = useRef<HTMLTableSectionElement>(null);
  const table = useReactTable({
    data: lines,
    columns,
    state: { sorting, globalFilter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    globalFilterFn: matchesText,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId: (l) => l.id,
  });
  const rows = table.getRowModel().rows;

  // A callout picked on the diagram brings its row into view.
  useEffect(() => {
    if (!selected) return;
    const row = [...(bodyRef.current?.rows ?? [])].find((r) => r.dataset.callout === selected);
    row?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }, [selected]);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <label htmlFor={filterId} className="mb-1.5 block text-sm font-semibold text-ink">
            Filter the parts list
          </label>
          <input
            id={filterId}
            type="search"
            value={globalFilter}
            onChange={(e) => setGlobalFilter(e.target.value)}
            placeholder="Name, number or note"
            className="block h-10 w-72 max-w-full rounded-tag border border-rule-strong bg-paper-raised px-3 text-base text-ink placeholder:text-ink-muted focus-visible:border-patina-500"
          />
        </div>
        <p className="text-sm text-ink-muted" aria-live="polite">
          {rows.length === lines.length ? `${lines.length} lines` : `${rows.length} of ${lines.length} lines`}
        </p>
      </div>
      <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
        <table className="w-full min-w-[52rem] border-collapse text-left text-sm">
          <caption className="sr-only">Parts list{filtered ? ' for this vehicle' : ''}. Column headers sort.</caption>
          <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const label = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={header.column.getCanSort() ? (sorted ? ariaSort[sorted] : 'none') : undefined}
                      className={cn('px-3 py-2', header.column.id === 'quantity' && 'text-right')}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 rounded-tag uppercase hover:text-ink"
                        >
                          {label}
                          {sorted === 'asc' ? (
                            <ArrowUp aria-hidden="true" className="size-3.5" />
                          ) : sorted === 'desc' ? (
                            <ArrowDown aria-hidden="true" className="size-3.5" />
                          ) : (
                            <ArrowUpDown aria-hidden="true" className="size-3.5 opacity-50" />
                          )}
                        </button>
                      ) : (
                        label
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody ref={bodyRef}>
            {rows.map((row) => {
              const l = row.original;
              const isSelected = l.callout === selected;
              const isHighlighted = l.callout === highlighted;
              return (
                <tr
                  key={row.id}
                  data-callout={l.callout}
                  data-state={isSelected ? 'selected' : isHighlighted ? 'highlighted' : undefined}
                  onMouseEnter={() => onHighlight(l.callout)}
                  onMouseLeave={() => onHighlight(null)}
                  className={cn(
                    'border-t border-rule align-top transition-colors',
                    isSelected ? 'bg-patina-100' : isHighlighted ? 'bg-patina-50' : 'hover:bg-paper',
                  )}
                >
                  <td className={cn('px-3 py-2', isSelected && 'shadow-[inset_4px_0_0_var(--color-patina-600)]')}>
                    <button
                      type="button"
                      aria-label={`Show callout ${l.callout} on the diagram`}
                      aria-pressed={isSelected}
                      onClick={() => onSelect(l.callout)}
                      onFocus={() => onHighlight(l.callout)}
                      onBlur={() => onHighlight(null)}
                      className={cn(
                        'inline-flex size-8 items-center justify-center rounded-full border font-mono text-sm font-bold tabular-nums',
                        isSelected ? 'border-patina-700 bg-patina-600 text-white' : 'border-rule-strong bg-paper-raised text-ink hover:border-patina-500',
                      )}
                    >
                      {l.callout}
                    </button>
                  </td>
                  <td className="px-3 py-2 font-mono whitespace-nowrap text-ink">{l.part.primaryNumber ?? '—'}</td>
                  <th scope="row" className="px-3 py-2 font-normal">
                    <Link to={paths.catalogPart.getHref(l.part.id)} className="font-medium text-ink underline decoration-rule-strong underline-offset-3 hover:text-patina-700 hover:decoration-patina-500">
                      {l.part.name}
                    </Link>
                    {l.part.safetyClass !== 'none' ? (
                      <Badge tone="warn" className="ml-2 align-middle">
                        {l.part.safetyClass}
                      </Badge>
                    ) : null}
                  </th>
                  <td className="px-3 py-2 text-right tabular-nums">{l.quantity}</td>
                  <td className="px-3 py-2 text-ink-soft">
                    {applicabilityText(l.applicability)}
                    {l.uncertain?.length ? (
                      <span className="mt-1 flex gap-1 text-xs text-warn">
                        <TriangleAlert aria-hidden="true" className="size-3.5 shrink-0" />
                        <span>Check: {l.uncertain.join('; ')}</span>
                      </span>
                    ) : null}
                  </td>
                  <td className="px-3 py-2 text-ink-soft">{l.notes}</td>
                </tr>
              );
            })}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-muted">
                  {lines.length === 0 ? 'No lines on this vehicle.' : 'No line matches the filter.'}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
