import { zodResolver } from '@hookform/resolvers/zod';
import { Search } from 'lucide-react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { resolveQuery } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useResolveNumber } from '../api/resolve-number';

const MATCHED_BY: Record<string, string> = {
  exact: 'this number',
  alternate_number: 'another number of the same part',
  replaced_by: 'replaces it (newer)',
  replaces: 'replaced by it (older)',
};

/** Find a part to edit by any of its numbers, typed in any shape (the server normalises it). */
export function PartFinder({ selectedId }: { selectedId: string | null }) {
  const [number, setNumber] = useState('');
  const form = useForm({ resolver: zodResolver(resolveQuery), defaultValues: { number: '' } });
  const result = useResolveNumber(number);

  return (
    <div className="space-y-4">
      <form noValidate role="search" aria-label="Find a part by number" onSubmit={form.handleSubmit((v) => setNumber(v.number))} className="flex items-start gap-2">
        <TextField label="Part number" className="flex-1" autoComplete="off" error={form.formState.errors.number?.message} {...form.register('number')} />
        <Button type="submit" className="mt-7" icon={<Search aria-hidden="true" className="size-4" />} isLoading={result.isFetching}>
          Find
        </Button>
      </form>
      {result.isError ? <Notice tone="danger" role="alert" title={result.error.message} /> : null}
      {result.data ? (
        result.data.matches.length === 0 ? (
          <Notice tone="info" role="status" title={`No part carries ${result.data.query}`} />
        ) : (
          <ul aria-label="Parts found" className="divide-y divide-rule rounded-card border border-rule bg-paper-raised">
            {result.data.matches.map((m) => {
              const part = result.data.parts.find((p) => p.id === m.partId);
              return (
                <li key={`${m.partId}-${m.matchedBy}`} className={m.partId === selectedId ? 'bg-patina-50' : undefined}>
                  <Link to={paths.admin.catalog.getHref(m.partId)} className="block px-3 py-2 hover:bg-paper">
                    <span className="block font-medium text-ink">{part?.name ?? m.partId}</span>
                    <span className="block text-xs text-ink-muted">
                      <span className="font-mono">{part?.primaryNumber ?? m.number}</span> · {MATCHED_BY[m.matchedBy] ?? m.matchedBy}
                    </span>
                  </Link>
                </li>
              );
            })}
          </ul>
        )
      ) : null}
    </div>
  );
}
