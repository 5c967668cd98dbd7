import { useState, type FormEvent } from 'react';
import { toast } from 'sonner';
import { conditionPolicies, conditionPolicyLabels, type ConditionPolicy } from '@shared/schemas/garage';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/form-field';
import { isApiError } from '@/lib/api-client';
import { resolvePartNumber, useAddWant } from '../api/add-want';
import type { PartSummary } from '../api/garage-schemas';

/** Adds a want by hand: a part number as typed, how many, in which condition. */
export function WantForm({ vehicleId }: { vehicleId: string }) {
  const add = useAddWant(vehicleId);
  const [number, setNumber] = useState('');
  const [quantity, setQuantity] = useState('1');
  const [policy, setPolicy] = useState<ConditionPolicy>('any');
  const [note, setNote] = useState('');
  const [error, setError] = useState<{ number?: string; quantity?: string }>({});
  const [choices, setChoices] = useState<PartSummary[]>([]);
  const [resolving, setResolving] = useState(false);

  const addPart = (part: PartSummary, qty: number) =>
    add.mutate(
      { partId: part.id, quantity: qty, policy, note: note.trim() },
      {
        onSuccess: () => {
          toast.success(`${part.primaryNumber ?? part.name} added to the needs list`);
          setNumber('');
          setQuantity('1');
          setNote('');
          setChoices([]);
        },
        onError: (e) => toast.error(e.message),
      },
    );

  const onSubmit = async (e: FormEvent) => {
    e.preventDefault();
    setChoices([]);
    const qty = Number(quantity);
    const next: typeof error = {};
    if (!number.trim()) next.number = 'Enter a part number';
    if (!Number.isInteger(qty) || qty < 1 || qty > 10_000) next.quantity = 'A whole number from 1';
    setError(next);
    if (next.number || next.quantity) return;
    setResolving(true);
    try {
      const found = await resolvePartNumber(number.trim());
      if (found.length === 0) setError({ number: 'No catalog part carries this number' });
      else if (found.length === 1) addPart(found[0], qty);
      else setChoices(found);
    } catch (err) {
      setError({ number: isApiError(err) ? err.message : 'Could not look the number up' });
    } finally {
      setResolving(false);
    }
  };

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a want" className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_6rem_minmax(0,2fr)]">
        <TextField label="Part number" spellCheck={false} autoComplete="off" value={number} onChange={(e) => setNumber(e.target.value)} error={error.number} />
        <TextField label="Quantity" type="number" min={1} inputMode="numeric" value={quantity} onChange={(e) => setQuantity(e.target.value)} error={error.quantity} />
        <SelectField label="Condition" value={policy} onChange={(e) => setPolicy(e.target.value as ConditionPolicy)}>
          {conditionPolicies.map((p) => (
            <option key={p} value={p}>
              {conditionPolicyLabels[p]}
            </option>
          ))}
        </SelectField>
      </div>
      <TextField label="Note" hint="Optional, e.g. a spare to keep on the shelf." value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
      {choices.length ? (
        <div role="group" aria-label="Several parts carry this number" className="rounded-card border border-info/40 bg-info-soft p-3">
          <p className="text-sm font-semibold text-ink">Several parts carry this number: which one?</p>
          <ul className="mt-2 flex flex-wrap gap-2">
            {choices.map((p) => (
              <li key={p.id}>
                <Button variant="secondary" size="sm" onClick={() => addPart(p, Number(quantity))}>
                  {p.primaryNumber} {p.name}
                </Button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <Button type="submit" variant="secondary" isLoading={resolving || add.isPending}>
        Add to needs list
      </Button>
    </form>
  );
}
