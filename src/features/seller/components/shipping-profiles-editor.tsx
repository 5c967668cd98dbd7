import { Star, Trash2 } from 'lucide-react';
import { useState } from 'react';
import { toast } from 'sonner';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { fieldErrorsOf } from '@/lib/api-client';
import { useSaveShippingProfile } from '../api/save-shipping-profile';
import type { ShippingProfile, ShippingRules } from '../api/seller-types';
import { dollarsToCents, formatCents } from '../utils/desk-format';
import { splitCountries } from './shop-form';

/** One line a seller can read: what a buyer pays under these rules. */
export function describeRules(r: ShippingRules): string {
  const where = r.shipsTo.includes('*') ? 'everywhere' : r.shipsTo.length ? r.shipsTo.join(', ') : 'nowhere (pickup only)';
  const free = 'freeAboveCents' in r && r.freeAboveCents ? `, free over ${formatCents(r.freeAboveCents)}` : '';
  const pickup = r.pickupAvailable ? '; pickup possible' : '';
  switch (r.kind) {
    case 'flat_per_order':
      return `${formatCents(r.amountCents)} per order${free}; ships to ${where}${pickup}`;
    case 'per_item':
      return `${formatCents(r.firstItemCents)} first item, ${formatCents(r.additionalItemCents)} each more${free}; ships to ${where}${pickup}`;
    case 'weight_bands':
      return `${r.bands.map((b) => `up to ${b.upToGrams} g ${formatCents(b.amountCents)}`).join(', ')}${r.overMaxCents != null ? `, heavier ${formatCents(r.overMaxCents)}` : ''}${free}; ships to ${where}${pickup}`;
    case 'pickup_only':
      return 'Pickup only';
  }
}

type Kind = ShippingRules['kind'];
const kindLabels: Record<Kind, string> = { flat_per_order: 'Flat per order', per_item: 'Per item', weight_bands: 'By weight', pickup_only: 'Pickup only' };

interface Draft {
  name: string;
  kind: Kind;
  amount: string;
  additional: string;
  bands: string;
  overMax: string;
  freeAbove: string;
  shipsTo: string;
  pickup: boolean;
}

const emptyDraft: Draft = { name: '', kind: 'flat_per_order', amount: '', additional: '', bands: '500:9.00, 2000:16.00', overMax: '', freeAbove: '', shipsTo: 'US', pickup: false };

/** Draft -> the rules the server's shipping schema checks; throws a message for the seller when a field does not parse. */
export function draftToRules(d: Draft): ShippingRules {
  const money = (s: string, what: string) => {
    const c = dollarsToCents(s);
    if (c === null) throw new Error(`${what}: give dollars, e.g. 12.50`);
    return c;
  };
  const optionalMoney = (s: string, what: string) => (s.trim() ? money(s, what) : null);
  const shipsTo = splitCountries(d.shipsTo.toUpperCase());
  const base = { shipsTo, pickupAvailable: d.pickup };
  switch (d.kind) {
    case 'flat_per_order':
      return { kind: 'flat_per_order', amountCents: money(d.amount, 'Amount'), freeAboveCents: optionalMoney(d.freeAbove, 'Free over'), ...base };
    case 'per_item':
      return { kind: 'per_item', firstItemCents: money(d.amount, 'First item'), additionalItemCents: money(d.additional, 'Each more'), freeAboveCents: optionalMoney(d.freeAbove, 'Free over'), ...base };
    case 'weight_bands': {
      const bands = d.bands
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean)
        .map((s) => {
          const m = s.match(/^(\d+)\s*(?:g)?\s*:\s*\$?([\d.]+)$/);
          if (!m) throw new Error(`Weight bands: write each as grams:dollars, e.g. 500:9.00 (not "${s}")`);
          return { upToGrams: Number(m[1]), amountCents: money(m[2], 'Weight band') };
        });
      return { kind: 'weight_bands', bands, overMaxCents: optionalMoney(d.overMax, 'Heavier than the last band'), freeAboveCents: optionalMoney(d.freeAbove, 'Free over'), ...base };
    }
    case 'pickup_only':
      return { kind: 'pickup_only', shipsTo: [], pickupAvailable: true };
  }
}

export function ShippingProfilesEditor({ profiles }: { profiles: ShippingProfile[] }) {
  const save = useSaveShippingProfile();
  const [draft, setDraft] = useState<Draft>(emptyDraft);
  const [problem, setProblem] = useState<string | null>(null);
  const set = <K extends keyof Draft>(k: K, v: Draft[K]) => setDraft((d) => ({ ...d, [k]: v }));

  const create = () => {
    setProblem(null);
    let rules: ShippingRules;
    try {
      if (draft.name.trim().length < 2) throw new Error('Give the profile a name of at least 2 characters');
      rules = draftToRules(draft);
    } catch (e) {
      return setProblem((e as Error).message);
    }
    save.mutate(
      { kind: 'create', name: draft.name.trim(), rules, isDefault: profiles.length === 0 },
      {
        onSuccess: () => {
          toast.success('Shipping profile added');
          setDraft(emptyDraft);
        },
        onError: (error) => {
          const details = Object.entries(fieldErrorsOf(error)).map(([k, m]) => `${k.replace(/^rules\./, '')}: ${m[0]}`);
          setProblem([error.message, ...details].join(' · '));
        },
      },
    );
  };

  return (
    <div className="space-y-5">
      {profiles.length === 0 ? <p className="text-sm text-ink-muted">No shipping profiles yet. Listings without one are pickup or by arrangement.</p> : null}
      <ul className="divide-y divide-rule rounded-card border border-rule bg-paper-raised">
        {profiles.map((p) => (
          <li key={p.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
            <div className="min-w-0">
              <p className="flex items-center gap-2 font-semibold text-ink">
                {p.name} {p.isDefault ? <Badge tone="accent">Default</Badge> : null}
              </p>
              <p className="text-sm text-ink-soft">{describeRules(p.rules)}</p>
            </div>
            <div className="flex gap-2">
              {!p.isDefault ? (
                <Button size="sm" variant="secondary" icon={<Star aria-hidden="true" className="size-4" />} onClick={() => save.mutate({ kind: 'update', id: p.id, isDefault: true }, { onError: (e) => toast.error(e.message) })}>
                  Make default
                </Button>
              ) : null}
              <Button
                size="sm"
                variant="danger"
                aria-label={`Delete ${p.name}`}
                icon={<Trash2 aria-hidden="true" className="size-4" />}
                onClick={() => {
                  if (window.confirm(`Delete “${p.name}”? Listings using it keep selling without a shipping profile.`)) {
                    save.mutate({ kind: 'delete', id: p.id }, { onError: (e) => toast.error(e.message) });
                  }
                }}
              >
                Delete
              </Button>
            </div>
          </li>
        ))}
      </ul>

      <form
        aria-label="New shipping profile"
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          create();
        }}
        className="space-y-4 rounded-card border border-dashed border-rule-strong p-4"
      >
        <h3 className="font-semibold text-ink">Add a shipping profile</h3>
        <FormAlert message={problem} />
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Profile name" value={draft.name} onChange={(e) => set('name', e.target.value)} />
          <div>
            <label htmlFor="ship-kind" className="mb-1.5 block text-sm font-semibold text-ink">
              How you charge
            </label>
            <select id="ship-kind" value={draft.kind} onChange={(e) => set('kind', e.target.value as Kind)} className="block h-10 w-full rounded-tag border border-rule-strong bg-paper-raised px-3">
              {(Object.keys(kindLabels) as Kind[]).map((k) => (
                <option key={k} value={k}>
                  {kindLabels[k]}
                </option>
              ))}
            </select>
          </div>
        </div>
        {draft.kind === 'flat_per_order' ? <TextField label="Amount per order (US$)" value={draft.amount} onChange={(e) => set('amount', e.target.value)} /> : null}
        {draft.kind === 'per_item' ? (
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="First item (US$)" value={draft.amount} onChange={(e) => set('amount', e.target.value)} />
            <TextField label="Each more (US$)" value={draft.additional} onChange={(e) => set('additional', e.target.value)} />
          </div>
        ) : null}
        {draft.kind === 'weight_bands' ? (
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Weight bands" hint="grams:dollars, lightest first, e.g. 500:9.00, 2000:16.00" value={draft.bands} onChange={(e) => set('bands', e.target.value)} />
            <TextField label="Heavier than the last band (US$)" hint="Empty: such parcels are refused" value={draft.overMax} onChange={(e) => set('overMax', e.target.value)} />
          </div>
        ) : null}
        {draft.kind !== 'pickup_only' ? (
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Ships to" hint="Two-letter codes, or * for everywhere" value={draft.shipsTo} onChange={(e) => set('shipsTo', e.target.value)} />
            <TextField label="Free over (US$)" hint="Optional" value={draft.freeAbove} onChange={(e) => set('freeAbove', e.target.value)} />
          </div>
        ) : null}
        {draft.kind !== 'pickup_only' ? (
          <label className="flex items-center gap-2 text-sm text-ink">
            <input type="checkbox" checked={draft.pickup} onChange={(e) => set('pickup', e.target.checked)} className="size-4 accent-patina-600" />
            Buyers may also collect
          </label>
        ) : null}
        <Button type="submit" isLoading={save.isPending && save.variables?.kind === 'create'}>
          Add profile
        </Button>
      </form>
    </div>
  );
}
