import { Search, X } from 'lucide-react';
import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { usePartSearch, type PartCandidate } from '../api/search-parts';

export interface PickedPart {
  id: string;
  name: string;
  number: string;
}

const matchedByText: Record<string, string> = {
  exact: 'number matches',
  alternate_number: 'number matches (O/0, I/1 read alike)',
  replaced_by: 'replaces the number you typed',
  replaces: 'is replaced by the number you typed',
};

function useDebounced(value: string, ms: number) {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

type Props = {
  value: PickedPart | null;
  onChange: (part: PickedPart | null) => void;
  error?: string;
};

/** Finds the catalog part by any of its numbers (old numbers offer their replacements too) or by name. */
export function PartPicker({ value, onChange, error }: Props) {
  const id = useId();
  const [text, setText] = useState('');
  const q = useDebounced(text.trim(), 250);
  const search = usePartSearch(q);

  if (value) {
    return (
      <div className="flex items-center justify-between gap-3 rounded-tag border border-patina-300 bg-patina-50 px-3 py-2">
        <div className="min-w-0">
          <p className="font-semibold text-ink">{value.name}</p>
          {value.number ? <p className="font-mono text-sm text-ink-soft">{value.number}</p> : null}
        </div>
        <Button size="sm" variant="ghost" icon={<X aria-hidden="true" className="size-4" />} onClick={() => onChange(null)}>
          Change part
        </Button>
      </div>
    );
  }

  const results: PartCandidate[] = search.data ?? [];
  return (
    <div>
      <label htmlFor={id} className="mb-1.5 block text-sm font-semibold text-ink">
        Find the part by number or name
      </label>
      <div className="relative">
        <Search aria-hidden="true" className="pointer-events-none absolute top-2.5 left-3 size-5 text-ink-muted" />
        <input
          id={id}
          type="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder="e.g. an ordnance number, a stock number or a maker's number"
          aria-describedby={`${id}-hint`}
          aria-invalid={error ? true : undefined}
          className={cn(
            'block h-10 w-full rounded-tag border bg-paper-raised pr-3 pl-10 text-base text-ink placeholder:text-ink-muted',
            error ? 'border-danger' : 'border-rule-strong',
          )}
        />
      </div>
      <p id={`${id}-hint`} className="mt-1 text-xs text-ink-muted">
        Type it as printed, with or without dashes. An old number also finds the parts that replace it.
      </p>
      {q.length >= 2 ? (
        <div aria-live="polite" className="mt-2">
          {search.isFetching && results.length === 0 ? <p className="text-sm text-ink-muted">Searching…</p> : null}
          {search.isError ? <p className="text-sm text-danger">{search.error.message}</p> : null}
          {search.isSuccess && results.length === 0 ? <p className="text-sm text-ink-muted">No catalog part matches “{q}”.</p> : null}
          {results.length > 0 ? (
            <ul aria-label="Matching parts" className="divide-y divide-rule overflow-hidden rounded-tag border border-rule bg-paper-raised">
              {results.map((r) => (
                <li key={r.partId}>
                  <button
                    type="button"
                    className="flex w-full items-baseline justify-between gap-3 px-3 py-2 text-left hover:bg-patina-50 focus-visible:bg-patina-50"
                    onClick={() => onChange({ id: r.partId, name: r.name, number: r.number })}
                  >
                    <span>
                      <span className="font-medium text-ink">{r.name}</span>
                      <span className="ml-2 font-mono text-sm text-ink-soft">{r.number}</span>
                    </span>
                    <span className="shrink-0 text-xs text-ink-muted">{matchedByText[r.matchedBy] ?? r.matchedBy}</span>
                  </button>
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      {error ? <p className="mt-1 text-sm font-medium text-danger">{error}</p> : null}
    </div>
  );
}
