import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { createLineInput } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import type { AssemblyLine } from '../api/admin-catalog-schemas';

const shape = createLineInput.shape;
const serialText = z.string().trim().regex(/^\d{0,8}$/, 'Digits only, or leave empty');
const dateText = z
  .string()
  .trim()
  .refine((v) => v === '' || shape.builtFrom.safeParse(v).success, 'Use YYYY, YYYY-MM or YYYY-MM-DD');

// Every field as typed; empty optional fields become null in the request.
const lineForm = z
  .object({
    callout: shape.callout,
    part: shape.part,
    quantity: z.number({ error: 'Enter a whole number' }).int().min(1).max(1000),
    notes: z.string().trim().max(500),
    serialFrom: serialText,
    serialTo: serialText,
    builtFrom: dateText,
    builtTo: dateText,
    variants: z.string().trim().max(400),
  })
  .refine((v) => v.serialFrom === '' || v.serialTo === '' || Number(v.serialFrom) <= Number(v.serialTo), {
    message: 'The first serial must not be after the last',
    path: ['serialTo'],
  });
type LineValues = z.infer<typeof lineForm>;

export type LineChanges = {
  callout: string;
  part: string;
  quantity: number;
  notes: string | null;
  serialFrom: number | null;
  serialTo: number | null;
  builtFrom: string | null;
  builtTo: string | null;
  variants: string[] | null;
};

function toChanges(v: LineValues): LineChanges {
  const variants = v.variants
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  return {
    callout: v.callout,
    part: v.part,
    quantity: v.quantity,
    notes: v.notes || null,
    serialFrom: v.serialFrom === '' ? null : Number(v.serialFrom),
    serialTo: v.serialTo === '' ? null : Number(v.serialTo),
    builtFrom: v.builtFrom || null,
    builtTo: v.builtTo || null,
    variants: variants.length ? variants : null,
  };
}

const fields = ['callout', 'part', 'quantity', 'notes', 'serialFrom', 'serialTo', 'builtFrom', 'builtTo', 'variants'] as const;

export type LineFormProps = {
  line?: AssemblyLine;
  submitLabel: string;
  isPending: boolean;
  onSubmit: (changes: LineChanges, done: { fail: (error: unknown) => void; reset: () => void }) => void;
  onCancel?: () => void;
};

/** Add or change one parts-list line: callout, part (by number), quantity, notes and where it applies. */
export function LineForm({ line, submitLabel, isPending, onSubmit, onCancel }: LineFormProps) {
  const [problem, setProblem] = useState<string | null>(null);
  const a = line?.applicability;
  const form = useForm({
    resolver: zodResolver(lineForm),
    defaultValues: {
      callout: line?.callout ?? '',
      part: line?.part.primaryNumber ?? line?.part.id ?? '',
      quantity: line?.quantity ?? 1,
      notes: line?.notes ?? '',
      serialFrom: a?.serialFrom?.toString() ?? '',
      serialTo: a?.serialTo?.toString() ?? '',
      builtFrom: a?.builtFrom ?? '',
      builtTo: a?.builtTo ?? '',
      variants: a?.variants?.join(', ') ?? '',
    },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) => {
    setProblem(null);
    onSubmit(toChanges(values), {
      fail: (error) => setProblem(applyServerErrors(error, form.setError, fields)),
      reset: () => form.reset(),
    });
  });

  return (
    <form noValidate aria-label={line ? `Edit line ${line.callout}` : 'Add a line'} onSubmit={submit} className="space-y-3">
      <FormAlert message={problem} />
      <div className="grid gap-3 sm:grid-cols-[6rem_minmax(0,1fr)_6rem]">
        <TextField label="Callout" autoComplete="off" error={errors.callout?.message} {...form.register('callout')} />
        <TextField label="Part number" hint="As printed, or a part id." autoComplete="off" error={errors.part?.message} {...form.register('part')} />
        <TextField label="Quantity" type="number" min={1} error={errors.quantity?.message} {...form.register('quantity', { valueAsNumber: true })} />
      </div>
      <TextField label="Notes" hint="“Either side”, “used with …”" error={errors.notes?.message} {...form.register('notes')} />
      <fieldset className="grid gap-3 sm:grid-cols-5">
        <legend className="mb-1 text-sm font-semibold text-ink sm:col-span-5">Applies to (leave empty for every vehicle)</legend>
        <TextField label="Serial from" inputMode="numeric" error={errors.serialFrom?.message} {...form.register('serialFrom')} />
        <TextField label="Serial to" inputMode="numeric" error={errors.serialTo?.message} {...form.register('serialTo')} />
        <TextField label="Built from" placeholder="YYYY-MM" error={errors.builtFrom?.message} {...form.register('builtFrom')} />
        <TextField label="Built to" placeholder="YYYY-MM" error={errors.builtTo?.message} {...form.register('builtTo')} />
        <TextField label="Variants" hint="Codes, comma-separated" error={errors.variants?.message} {...form.register('variants')} />
      </fieldset>
      <div className="flex gap-2">
        <Button type="submit" size="sm" isLoading={isPending}>
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button size="sm" variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
