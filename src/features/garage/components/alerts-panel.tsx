import { Trash2 } from 'lucide-react';
import { useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import { conditionPolicies, conditionPolicyLabels, type ConditionPolicy } from '@shared/schemas/garage';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/form-field';
import { Notice } from '@/components/ui/notice';
import { Skeleton } from '@/components/ui/skeleton';
import { fieldErrorsOf } from '@/lib/api-client';
import { useCreateAlert } from '../api/create-alert';
import { useDeleteAlert } from '../api/delete-alert';
import { useAlerts } from '../api/get-alerts';
import { formatCents, parseDollarsToCents } from '../utils/garage-format';

/** Watch a part number with a condition and a top price; a notice arrives when a matching listing goes live. */
export function AlertForm() {
  const create = useCreateAlert();
  const [number, setNumber] = useState('');
  const [policy, setPolicy] = useState<ConditionPolicy>('any');
  const [price, setPrice] = useState('');
  const [errors, setErrors] = useState<{ number?: string; price?: string }>({});

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    const next: typeof errors = {};
    if (!number.trim()) next.number = 'Enter the part number to watch';
    const cents = price.trim() === '' ? null : parseDollarsToCents(price);
    if (cents === 0 || (price.trim() !== '' && cents === null)) next.price = 'Dollars and cents, e.g. 45 or 45.50';
    setErrors(next);
    if (next.number || next.price) return;
    create.mutate(
      { number: number.trim(), policy, maxPriceCents: cents },
      {
        onSuccess: (a) => {
          toast.success(`Watching ${a.number || a.part.primaryNumber || a.part.name}`);
          setNumber('');
          setPrice('');
        },
        onError: (err) => {
          const fe = fieldErrorsOf(err);
          setErrors({ number: fe.number?.[0] ?? fe.partId?.[0] ?? err.message, price: fe.maxPriceCents?.[0] });
        },
      },
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Watch a part" className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,2fr)_minmax(0,1fr)_auto] sm:items-start">
      <TextField label="Part number" spellCheck={false} autoComplete="off" value={number} onChange={(e) => setNumber(e.target.value)} error={errors.number} hint="Any number the part carries; later numbers that replace it count too." />
      <SelectField label="Condition" value={policy} onChange={(e) => setPolicy(e.target.value as ConditionPolicy)}>
        {conditionPolicies.map((p) => (
          <option key={p} value={p}>
            {conditionPolicyLabels[p]}
          </option>
        ))}
      </SelectField>
      <TextField label="Top price ($)" inputMode="decimal" placeholder="No limit" value={price} onChange={(e) => setPrice(e.target.value)} error={errors.price} />
      <Button type="submit" className="sm:mt-7" isLoading={create.isPending}>
        Watch
      </Button>
    </form>
  );
}

export function AlertList() {
  const alerts = useAlerts();
  const remove = useDeleteAlert();
  if (alerts.isPending) return <Skeleton className="h-24" />;
  if (alerts.isError) return <Notice tone="danger" role="alert" title="We could not load your alerts">{alerts.error.message}</Notice>;
  if (alerts.data.length === 0) return <p className="text-ink-soft">You are not watching any part yet.</p>;
  return (
    <ul aria-label="Your wanted alerts" className="divide-y divide-rule rounded-card border border-rule bg-paper-raised shadow-card">
      {alerts.data.map((a) => (
        <li key={a.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3">
          <div className="min-w-0 flex-1">
            <p className="text-sm text-ink">
              <span className="font-mono font-semibold">{a.number || a.part.primaryNumber}</span> {a.part.name}
            </p>
            <p className="text-xs text-ink-muted">
              {conditionPolicyLabels[a.policy]} · {a.maxPriceCents === null ? 'any price' : `up to ${formatCents(a.maxPriceCents)}`} · {a.hits} match
              {a.hits === 1 ? '' : 'es'} so far
            </p>
          </div>
          <Button
            variant="ghost"
            size="sm"
            icon={<Trash2 aria-hidden="true" className="size-4" />}
            aria-label={`Stop watching ${a.number || a.part.name}`}
            onClick={() => remove.mutate(a.id, { onError: (e) => toast.error(e.message) })}
          >
            Stop
          </Button>
        </li>
      ))}
    </ul>
  );
}
