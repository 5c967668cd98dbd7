import { zodResolver } from '@hookform/resolvers/zod';
import { ExternalLink } from 'lucide-react';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { z } from 'zod';
import { createPartInput, partNumberInput, partNumberKindLabels, partNumberKinds, safetyClasses, updatePartInput } from '@shared/schemas/catalog';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SelectField, TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { useAddPartNumber } from '../api/add-part-number';
import type { PartRecord } from '../api/admin-catalog-schemas';
import { useDeletePart } from '../api/delete-part';
import { useDeletePartNumber } from '../api/delete-part-number';
import { useDeleteSupersession } from '../api/delete-supersession';
import { usePartRecord } from '../api/get-part-record';
import { useUpdatePart } from '../api/update-part';
import { CategoryOptions, ConfirmButton } from './editor-controls';
import { SupersessionForm } from './supersession-form';

/** Everything about one part an administrator can change: details, numbers, supersessions; or delete it. */
export function PartEditor({ partId }: { partId: string }) {
  const record = usePartRecord(partId);
  if (record.isPending) return <PageSkeleton label="Loading the part" />;
  if (record.isError) return <Notice tone="danger" role="alert" title={record.error.message} />;
  const { part } = record.data;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-2xl font-bold text-ink">{part.name}</h2>
        <Link to={paths.catalogPart.getHref(part.id)} className="inline-flex items-center gap-1 text-sm font-semibold text-patina-700 hover:underline">
          Open the public page <ExternalLink aria-hidden="true" className="size-4" />
        </Link>
      </div>
      <Card>
        <h3 className="mb-4 text-lg font-bold text-ink">Details</h3>
        <PartDetailsForm key={JSON.stringify(part)} part={part} />
      </Card>
      <Card>
        <h3 className="mb-4 text-lg font-bold text-ink">Numbers</h3>
        <PartNumbersEditor record={record.data} />
      </Card>
      <Card>
        <h3 className="mb-4 text-lg font-bold text-ink">Supersessions</h3>
        <SupersessionList record={record.data} />
        <SupersessionForm partId={part.id} />
      </Card>
      <Card>
        <h3 className="mb-2 text-lg font-bold text-ink">Delete</h3>
        <p className="mb-3 text-sm text-ink-soft">A part still on a parts list cannot be deleted; remove its lines first.</p>
        <DeletePart partId={part.id} name={part.name} />
      </Card>
    </div>
  );
}

const detailsForm = z.object({
  name: createPartInput.shape.name,
  category: createPartInput.shape.category,
  description: z.string().trim().max(5000),
  safetyClass: z.enum(safetyClasses),
  restricted: z.boolean(),
  weightGrams: z.number({ error: 'Enter whole grams' }).int().min(0).max(5_000_000),
  lengthMm: z.number({ error: 'Enter whole millimetres' }).int().min(0).max(20_000),
  widthMm: z.number({ error: 'Enter whole millimetres' }).int().min(0).max(20_000),
  heightMm: z.number({ error: 'Enter whole millimetres' }).int().min(0).max(20_000),
  specs: z.string().refine((text) => {
    try {
      const v: unknown = JSON.parse(text);
      return typeof v === 'object' && v !== null && !Array.isArray(v);
    } catch {
      return false;
    }
  }, 'Write the specifications as a JSON object, e.g. {"boreIn": 1}'),
});
type DetailsValues = z.infer<typeof detailsForm>;
const detailFields = ['name', 'category', 'description', 'safetyClass', 'restricted', 'weightGrams', 'lengthMm', 'widthMm', 'heightMm'] as const;

function PartDetailsForm({ part }: { part: PartRecord['part'] }) {
  const listId = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const update = useUpdatePart();
  const initial: DetailsValues = { ...part, specs: JSON.stringify(part.specs, null, 2) };
  const form = useForm({ resolver: zodResolver(detailsForm), defaultValues: initial });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    // Only what changed goes to the server (the audit log then shows exactly that).
    const changes: Record<string, unknown> = {};
    for (const f of detailFields) if (values[f] !== initial[f]) changes[f] = values[f];
    const specs = JSON.parse(values.specs) as Record<string, unknown>;
    if (JSON.stringify(specs) !== JSON.stringify(part.specs)) changes.specs = specs;
    const checked = updatePartInput.safeParse(changes);
    if (!checked.success) {
      setProblem(checked.error.issues[0]?.message ?? 'Nothing to save');
      return;
    }
    update.mutate(
      { id: part.id, changes: checked.data },
      {
        onSuccess: () => toast.success('Part saved.'),
        onError: (error) => {
          const fieldMessage = applyServerErrors(error, form.setError, detailFields);
          setProblem(fieldMessage);
        },
      },
    );
  });

  const num = { valueAsNumber: true } as const;
  return (
    <form noValidate aria-label="Part details" onSubmit={onSubmit} className="space-y-4">
      <FormAlert message={problem} />
      <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Category" list={listId} error={errors.category?.message} {...form.register('category')} />
        <CategoryOptions id={listId} />
        <SelectField label="Safety class" error={errors.safetyClass?.message} {...form.register('safetyClass')}>
          {safetyClasses.map((c) => (
            <option key={c} value={c}>
              {c}
            </option>
          ))}
        </SelectField>
      </div>
      <TextAreaField label="Description" rows={3} error={errors.description?.message} {...form.register('description')} />
      <div className="grid gap-4 sm:grid-cols-4">
        <TextField label="Weight (g)" type="number" min={0} error={errors.weightGrams?.message} {...form.register('weightGrams', num)} />
        <TextField label="Length (mm)" type="number" min={0} error={errors.lengthMm?.message} {...form.register('lengthMm', num)} />
        <TextField label="Width (mm)" type="number" min={0} error={errors.widthMm?.message} {...form.register('widthMm', num)} />
        <TextField label="Height (mm)" type="number" min={0} error={errors.heightMm?.message} {...form.register('heightMm', num)} />
      </div>
      <TextAreaField
        label="Specifications (JSON)"
        rows={4}
        className="[&_textarea]:font-mono [&_textarea]:text-sm"
        hint="Checked against the category's own fields by the server."
        error={errors.specs?.message}
        {...form.register('specs')}
      />
      <label className="flex items-center gap-2 text-sm text-ink">
        <input type="checkbox" className="size-4 accent-patina-600" {...form.register('restricted')} />
        Restricted item (listings get an extra review)
      </label>
      <Button type="submit" isLoading={update.isPending}>
        Save details
      </Button>
    </form>
  );
}

function PartNumbersEditor({ record }: { record: PartRecord }) {
  const partId = record.part.id;
  const [problem, setProblem] = useState<string | null>(null);
  const add = useAddPartNumber();
  const remove = useDeletePartNumber();
  const form = useForm({ resolver: zodResolver(partNumberInput), defaultValues: { number: '', kind: 'maker' as const } });
  const total = record.numbers.reduce((n, g) => n + g.numbers.length, 0);

  const onSubmit = form.handleSubmit((number) => {
    setProblem(null);
    add.mutate(
      { partId, number },
      {
        onSuccess: () => {
          toast.success(`Number ${number.number} added.`);
          form.reset({ number: '', kind: number.kind });
        },
        onError: (error) => setProblem(applyServerErrors(error, form.setError, ['number', 'kind'])),
      },
    );
  });

  return (
    <div className="space-y-4">
      <ul aria-label="Numbers of this part" className="divide-y divide-rule">
        {record.numbers.flatMap((g) =>
          g.numbers.map((n) => (
            <li key={n.id} className="flex items-center justify-between gap-3 py-2">
              <span>
                <span className="font-mono font-semibold text-ink">{n.printed}</span>{' '}
                <span className="text-xs text-ink-muted">{partNumberKindLabels[g.kind]}</span>
              </span>
              <Button
                size="sm"
                variant="ghost"
                aria-label={`Remove number ${n.printed}`}
                disabled={total <= 1 || remove.isPending}
                title={total <= 1 ? 'A part keeps at least one number' : undefined}
                onClick={() =>
                  remove.mutate({ partId, numberId: n.id }, { onSuccess: () => toast.success(`Number ${n.printed} removed.`), onError: (e) => toast.error(e.message) })
                }
              >
                Remove
              </Button>
            </li>
          )),
        )}
      </ul>
      <form noValidate aria-label="Add a number" onSubmit={onSubmit} className="space-y-3">
        <FormAlert message={problem} />
        <div className="grid items-start gap-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto]">
          <TextField label="Number as printed" autoComplete="off" error={form.formState.errors.number?.message} {...form.register('number')} />
          <SelectField label="Kind" error={form.formState.errors.kind?.message} {...form.register('kind')}>
            {partNumberKinds.map((k) => (
              <option key={k} value={k}>
                {partNumberKindLabels[k]}
              </option>
            ))}
          </SelectField>
          <Button type="submit" variant="secondary" className="sm:mt-7" isLoading={add.isPending}>
            Add number
          </Button>
        </div>
      </form>
    </div>
  );
}

const SHORT = { two_way: 'two-way', one_way: 'one-way', conditional: 'conditional' } as const;

function SupersessionList({ record }: { record: PartRecord }) {
  const remove = useDeleteSupersession();
  const partId = record.part.id;
  const names = new Map(record.chain.parts.map((p) => [p.id, p.primaryNumber ?? p.name]));
  const touching = record.chain.edges.filter((e) => e.fromPartId === partId || e.toPartId === partId);
  if (touching.length === 0) return <p className="mb-4 text-sm text-ink-muted">This part neither replaces nor is replaced by another.</p>;
  return (
    <ul aria-label="Supersessions of this part" className="mb-5 divide-y divide-rule">
      {touching.map((e, i) => {
        const text = `${names.get(e.fromPartId) ?? e.fromPartId} → ${e.quantity > 1 ? `${e.quantity} × ` : ''}${names.get(e.toPartId) ?? e.toPartId}`;
        return (
          <li key={e.id ?? i} className="flex items-center justify-between gap-3 py-2 text-sm">
            <span>
              <span className="font-mono text-ink">{text}</span> <span className="text-ink-muted">({SHORT[e.interchange]}{e.note ? `: ${e.note}` : ''})</span>
            </span>
            {e.id ? (
              <Button
                size="sm"
                variant="ghost"
                aria-label={`Remove supersession ${text}`}
                disabled={remove.isPending}
                onClick={() => remove.mutate(e.id!, { onSuccess: () => toast.success('Supersession removed.'), onError: (err) => toast.error(err.message) })}
              >
                Remove
              </Button>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}

function DeletePart({ partId, name }: { partId: string; name: string }) {
  const remove = useDeletePart();
  const navigate = useNavigate();
  return (
    <ConfirmButton
      label="Delete part"
      confirmLabel={`Delete “${name}”`}
      isPending={remove.isPending}
      onConfirm={() =>
        remove.mutate(partId, {
          onSuccess: () => {
            toast.success(`Part “${name}” deleted.`);
            void navigate(paths.admin.catalog.getHref());
          },
          onError: (e) => toast.error(e.message),
        })
      }
    />
  );
}
