import { Link2, Search } from 'lucide-react';
import { useState } from 'react';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { useLinkListingPart } from '../api/link-listing-part';
import { useResolvePartNumber } from '../api/resolve-part-number';
import type { QueueListing } from '../api/moderation-types';

/** For a listing the seller could not tie to the catalog: find the part by a number and link it. */
export function LinkPartForm({ listing }: { listing: QueueListing }) {
  const [typed, setTyped] = useState('');
  const [number, setNumber] = useState('');
  const found = useResolvePartNumber(number);
  const link = useLinkListingPart();
  const parts = found.data?.parts ?? [];

  return (
    <section aria-label="Link to catalog part" className="max-w-2xl space-y-3 rounded-card border border-rule bg-paper-raised p-4">
      <h3 className="font-semibold text-ink">Link to catalog part</h3>
      <form
        noValidate
        role="search"
        aria-label={`Find a part for ${listing.title}`}
        className="flex items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          setNumber(typed.trim());
        }}
      >
        <TextField label="Part number" className="flex-1" value={typed} onChange={(e) => setTyped(e.target.value)} autoComplete="off" />
        <Button type="submit" variant="secondary" icon={<Search aria-hidden="true" className="size-4" />} disabled={typed.trim() === ''} isLoading={found.isFetching}>
          Find
        </Button>
      </form>
      <FormAlert message={found.error?.message ?? link.error?.message} />
      {number !== '' && found.isSuccess && parts.length === 0 ? <p className="text-sm text-ink-muted">No catalog part carries that number.</p> : null}
      {parts.length > 0 ? (
        <ul aria-label="Candidate parts" className="divide-y divide-rule rounded-tag border border-rule">
          {parts.map((p) => (
            <li key={p.id} className="flex items-center justify-between gap-3 px-3 py-2 text-sm">
              <span>
                <span className="block font-semibold text-ink">{p.name}</span>
                <span className="block font-mono text-xs text-ink-muted">{p.primaryNumber ?? 'No primary number'}</span>
              </span>
              <Button
                size="sm"
                icon={<Link2 aria-hidden="true" className="size-4" />}
                aria-label={`Link ${p.name}`}
                disabled={link.isPending}
                isLoading={link.isPending && link.variables?.partId === p.id}
                onClick={() =>
                  link.mutate({ id: listing.id, partId: p.id }, { onSuccess: () => toast.success(`Linked ${listing.title} to ${p.name}`) })
                }
              >
                Link
              </Button>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
