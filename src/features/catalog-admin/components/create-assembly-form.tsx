import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { z } from 'zod';
import { createAssemblyInput } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateAssembly } from '../api/create-assembly';

const shape = createAssemblyInput.shape;
const newAssemblyForm = z.object({
  systemSlug: shape.systemSlug,
  parentId: z.string(),
  code: shape.code,
  name: shape.name,
  description: z.string().trim().max(5000),
});

// The trade's usual systems (DOMAIN.md); the server checks the slug against its own list.
const SYSTEM_SUGGESTIONS = ['engine', 'clutch', 'transmission', 'transfer-case', 'axles', 'brakes', 'steering', 'electrical', 'fuel', 'cooling', 'exhaust', 'frame', 'body', 'wheels-tires', 'accessories'];

export type CreateAssemblyFormProps = {
  vehicleSlug: string;
  systems: Array<{ slug: string; name: string }>;
  candidates: Array<{ id: string; label: string }>;
  onDone: () => void;
};

export function CreateAssemblyForm({ vehicleSlug, systems, candidates, onDone }: CreateAssemblyFormProps) {
  const listId = useId();
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateAssembly();
  const form = useForm({
    resolver: zodResolver(newAssemblyForm),
    defaultValues: { systemSlug: systems[0]?.slug ?? '', parentId: '', code: '', name: '', description: '' },
  });
  const { errors } = form.formState;
  const slugs = [...new Set([...systems.map((s) => s.slug), ...SYSTEM_SUGGESTIONS])];

  const onSubmit = form.handleSubmit(({ parentId, ...values }) => {
    setProblem(null);
    create.mutate(
      { vehicleSlug, ...values, parentId: parentId || null },
      {
        onSuccess: (created) => {
          toast.success(`Assembly “${values.name}” created.`);
          onDone();
          void navigate(paths.admin.catalogAssemblies.getHref({ vehicle: vehicleSlug, assembly: created.id }));
        },
        onError: (e) => setProblem(applyServerErrors(e, form.setError, ['systemSlug', 'parentId', 'code', 'name', 'description'])),
      },
    );
  });

  return (
    <form noValidate aria-label="New assembly" onSubmit={onSubmit} className="space-y-4">
      <FormAlert message={problem} />
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_8rem]">
        <TextField label="System" list={listId} hint="A system slug, e.g. brakes" error={errors.systemSlug?.message} {...form.register('systemSlug')} />
        <datalist id={listId}>
          {slugs.map((s) => (
            <option key={s} value={s} />
          ))}
        </datalist>
        <TextField label="Code" error={errors.code?.message} {...form.register('code')} />
      </div>
      <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
      <SelectField label="Part of" {...form.register('parentId')}>
        <option value="">(a top-level assembly of its system)</option>
        {candidates.map((c) => (
          <option key={c.id} value={c.id}>
            {c.label}
          </option>
        ))}
      </SelectField>
      <TextAreaField label="Description" rows={3} error={errors.description?.message} {...form.register('description')} />
      <div className="flex gap-2">
        <Button type="submit" isLoading={create.isPending}>
          Create assembly
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
