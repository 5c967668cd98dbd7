import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { ArrowDown, ArrowUp, ArrowUpDown, Pencil } from 'lucide-react';
import { useState, type KeyboardEvent } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { textLinkClasses } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useQuickEditListing } from '../api/quick-edit-listing';
import type { DeskListing } from '../api/seller-types';
import { centsToDollars, dollarsToCents, formatCents, stateLabels, stateTones } from '../utils/desk-format';

// Column id -> the server's sort key (GET /api/me/listings?sort=); "-" in front sorts descending.
const SORT_KEYS: Record<string, string> = { title: 'title', quantity: 'quantity', price: 'price', updated: 'updated' };

export function sortingToParam(sorting: SortingState): string {
  const s = sorting[0];
  if (!s || !SORT_KEYS[s.id]) return '-updated';
  return `${s.desc ? '-' : ''}${SORT_KEYS[s.id]}`;
}

export function paramToSorting(sort: string): SortingState {
  const desc = sort.startsWith('-');
  const key = sort.replace(/^-/, '');
  const id = Object.keys(SORT_KEYS).find((k) => SORT_KEYS[k] === key);
  return id ? [{ id, desc }] : [];
}

const col = createColumnHelper<DeskListing>();

type Props = {
  listings: DeskListing[];
  sort: string;
  onSortChange: (sort: string) => void;
};

/** The seller's listings: sortable (on the server), with a quick edit of quantity and price per row. */
export function MyListingsTable({ listings, sort, onSortChange }: Props) {
  const [editing, setEditing] = useState<string | null>(null);
  const sorting = paramToSorting(sort);

  const columns = [
    col.display({
      id: 'photo',
      header: () => <span className="sr-only">Cover photo</span>,
      cell: ({ row }) => {
        const p = row.original.photos[0];
        return (
          <span className="block size-12 overflow-hidden rounded-tag border border-rule bg-paper-sunk" style={p ? { backgroundColor: p.placeholderColor } : undefined}>
            {p ? <img src={p.urls.thumb} alt="" className="h-full w-full object-cover" loading="lazy" /> : null}
          </span>
        );
      },
    }),
    col.accessor('title', {
      header: 'Listing',
      enableSorting: true,
      cell: ({ row }) => (
        <div className="min-w-48">
          <Link to={paths.sellerListings.edit.getHref(row.original.id)} className={textLinkClasses}>
            {row.original.title}
          </Link>
          <span className="block text-xs text-ink-muted">
            {row.original.part ? `${row.original.part.primaryNumber ?? ''} ${row.original.part.name}`.trim() : 'Unidentified part'} · {row.original.conditionLabel}
          </span>
        </div>
      ),
    }),
    col.accessor('state', {
      header: 'State',
      enableSorting: false,
      cell: ({ row }) => (
        <div className="flex flex-col items-start gap-1">
          <Badge tone={stateTones[row.original.state]}>{stateLabels[row.original.state]}</Badge>
          {row.original.flags?.length ? <span className="text-xs text-warn">{row.original.flags.length} flag{row.original.flags.length === 1 ? '' : 's'}</span> : null}
        </div>
      ),
    }),
    col.accessor('quantity', { header: 'Qty', enableSorting: true, cell: ({ getValue }) => <span className="tabular-nums">{getValue()}</span> }),
    col.accessor('priceCents', { id: 'price', header: 'Price', enableSorting: true, cell: ({ row }) => <span className="tabular-nums">{formatCents(row.original.priceCents, row.original.currency)}</span> }),
    col.accessor('updatedAt', { id: 'updated', header: 'Updated', enableSorting: true, cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDate(getValue())}</span> }),
    col.display({ id: 'actions', header: () => <span className="sr-only">Actions</span>, cell: () => null }),
  ];

  const table = useReactTable({
    data: listings,
    columns,
    state: { sorting },
    manualSorting: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => onSortChange(sortingToParam(typeof updater === 'function' ? updater(sorting) : updater)),
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => r.id,
  });

  return (
    <div className="overflow-x-auto rounded-card border border-rule bg-paper-raised shadow-card">
      <table className="w-full min-w-[52rem] border-collapse text-left text-sm">
        <caption className="sr-only">Your listings</caption>
        <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} scope="col" className="px-3 py-2.5" aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        {sorted === 'asc' ? (
                          <ArrowUp aria-hidden="true" className="size-3.5" />
                        ) : sorted === 'desc' ? (
                          <ArrowDown aria-hidden="true" className="size-3.5" />
                        ) : (
                          <ArrowUpDown aria-hidden="true" className="size-3.5 opacity-50" />
                        )}
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) =>
            editing === row.id ? (
              <QuickEditRow key={row.id} listing={row.original} onDone={() => setEditing(null)} />
            ) : (
              <tr key={row.id} className="border-t border-rule align-middle">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2">
                    {cell.column.id === 'actions' ? (
                      <div className="flex justify-end">
                        <Button
                          size="sm"
                          variant="ghost"
                          className="whitespace-nowrap"
                          icon={<Pencil aria-hidden="true" className="size-4" />}
                          onClick={() => setEditing(row.id)}
                          aria-label={`Quick edit ${row.original.title}`}
                        >
                          Quick edit
                        </Button>
                      </div>
                    ) : (
                      flexRender(cell.column.columnDef.cell, cell.getContext())
                    )}
                  </td>
                ))}
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}

function QuickEditRow({ listing, onDone }: { listing: DeskListing; onDone: () => void }) {
  const [quantity, setQuantity] = useState(String(listing.quantity));
  const [price, setPrice] = useState(centsToDollars(listing.priceCents));
  const [error, setError] = useState<string | null>(null);
  const edit = useQuickEditListing();

  const save = () => {
    const q = /^\d+$/.test(quantity.trim()) ? Number(quantity.trim()) : null;
    const cents = dollarsToCents(price);
    if (q === null || q > 9999) return setError('Give a whole quantity from 0 to 9999');
    if (cents === null || cents < 1) return setError('Give the price in dollars, e.g. 42.50');
    const change: { quantity?: number; priceCents?: number } = {};
    if (q !== listing.quantity) change.quantity = q;
    if (cents !== listing.priceCents) change.priceCents = cents;
    if (!Object.keys(change).length) return onDone();
    edit.mutate(
      { id: listing.id, ...change },
      {
        onSuccess: (l) => {
          toast.success(`Saved: ${l.title}`);
          onDone();
        },
        onError: (e) => setError(e.message),
      },
    );
  };
  const keys = (e: KeyboardEvent) => {
    if (e.key === 'Enter') save();
    if (e.key === 'Escape') onDone();
  };

  return (
    <tr className="border-t border-rule bg-patina-50/60">
      <td className="px-3 py-2" />
      <td className="px-3 py-2 font-semibold text-ink">{listing.title}</td>
      <td className="px-3 py-2">
        <Badge tone={stateTones[listing.state]}>{stateLabels[listing.state]}</Badge>
      </td>
      <td className="px-3 py-2">
        <input
          aria-label="Quantity"
          value={quantity}
          autoFocus
          inputMode="numeric"
          onChange={(e) => setQuantity(e.target.value)}
          onKeyDown={keys}
          className="h-8 w-20 rounded-tag border border-rule-strong bg-paper-raised px-2 tabular-nums"
        />
      </td>
      <td className="px-3 py-2">
        <input
          aria-label="Price (US$)"
          value={price}
          inputMode="decimal"
          onChange={(e) => setPrice(e.target.value)}
          onKeyDown={keys}
          className="h-8 w-28 rounded-tag border border-rule-strong bg-paper-raised px-2 tabular-nums"
        />
      </td>
      <td className="px-3 py-2 text-xs text-danger" role={error ? 'alert' : undefined}>
        {error ?? (listing.state === 'approved' ? <span className="text-ink-muted">Stays live</span> : null)}
      </td>
      <td className="px-3 py-2">
        <div className="flex justify-end gap-1">
          <Button size="sm" onClick={save} isLoading={edit.isPending}>
            Save
          </Button>
          <Button size="sm" variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </td>
    </tr>
  );
}
