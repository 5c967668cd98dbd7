import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { createSupersessionInput, interchangeLabels, interchanges } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateSupersession } from '../api/create-supersession';

const shape = createSupersessionInput.shape;
// Asked from this part's side ("is replaced by" / "replaces"); the request is the shared from/to shape.
const supersessionForm = z
  .object({
    direction: z.enum(['replaced_by', 'replaces']),
    other: shape.to,
    interchange: shape.interchange,
    note: z.string().trim().max(500),
    quantity: z.number({ error: 'Enter a whole number' }).int().min(1).max(100),
  })
  .refine((v) => v.interchange !== 'conditional' || v.note.length > 0, { message: 'A conditional interchange needs a note saying the condition', path: ['note'] });

export function SupersessionForm({ partId }: { partId: string }) {
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateSupersession();
  const form = useForm({
    resolver: zodResolver(supersessionForm),
    defaultValues: { direction: 'replaced_by' as const, other: '', interchange: 'two_way' as const, note: '', quantity: 1 },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(({ direction, other, interchange, note, quantity }) => {
    setProblem(null);
    const input = {
      from: direction === 'replaced_by' ? partId : other,
      to: direction === 'replaced_by' ? other : partId,
      interchange,
      quantity,
      ...(note ? { note } : {}),
    };
    create.mutate(input, {
      onSuccess: () => {
        toast.success('Supersession added.');
        form.reset();
      },
      onError: (error) => {
        // The server names the fields from/to; here they are one "other" field.
        const message = applyServerErrors(error, form.setError, ['interchange', 'note', 'quantity']);
        setProblem(message);
      },
    });
  });

  return (
    <form noValidate aria-label="Add a supersession" onSubmit={onSubmit} className="space-y-3 border-t border-rule pt-4">
      <FormAlert message={problem} />
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="This part" error={errors.direction?.message} {...form.register('direction')}>
          <option value="replaced_by">is replaced by</option>
          <option value="replaces">replaces</option>
        </SelectField>
        <TextField label="Other part's number" hint="As printed, or a part id." autoComplete="off" error={errors.other?.message} {...form.register('other')} />
      </div>
      <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <SelectField label="Interchange" error={errors.interchange?.message} {...form.register('interchange')}>
          {interchanges.map((k) => (
            <option key={k} value={k}>
              {interchangeLabels[k]}
            </option>
          ))}
        </SelectField>
        <TextField label="Quantity" type="number" min={1} hint="How many new parts per old one." error={errors.quantity?.message} {...form.register('quantity', { valueAsNumber: true })} />
      </div>
      <TextField label="Note" hint="Required for a conditional interchange: the other change it needs." error={errors.note?.message} {...form.register('note')} />
      <Button type="submit" variant="secondary" isLoading={create.isPending}>
        Add supersession
      </Button>
    </form>
  );
}
