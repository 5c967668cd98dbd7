import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { createPartInput, partNumberInput, partNumberKindLabels, partNumberKinds, safetyClasses } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreatePart } from '../api/create-part';
import { CategoryOptions } from './editor-controls';

// A new part starts with its name, category and first number; more numbers, specs and sizes come in the editor.
const newPartForm = createPartInput
  .pick({ name: true, category: true, description: true })
  .extend({ safetyClass: createPartInput.shape.safetyClass.unwrap(), number: partNumberInput.shape.number, kind: partNumberInput.shape.kind });

export function CreatePartForm({ onDone }: { onDone: () => void }) {
  const listId = useId();
  const navigate = useNavigate();
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreatePart();
  const form = useForm({
    resolver: zodResolver(newPartForm),
    defaultValues: { name: '', category: 'generic', description: '', safetyClass: 'none' as const, number: '', kind: 'maker' as const },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(({ number, kind, ...part }) => {
    setProblem(null);
    create.mutate(
      { ...part, numbers: [{ number, kind }] },
      {
        onSuccess: (created) => {
          toast.success(`Part “${created.name}” created.`);
          onDone();
          void navigate(paths.admin.catalog.getHref(created.id));
        },
        onError: (error) => setProblem(applyServerErrors(error, form.setError, ['name', 'category', 'description', 'safetyClass'])),
      },
    );
  });

  return (
    <form noValidate aria-label="New part" onSubmit={onSubmit} className="space-y-4">
      <FormAlert message={problem} />
      <TextField label="Name" hint="Noun first, as in a parts list: “Cup, piston, primary”." error={errors.name?.message} {...form.register('name')} />
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
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="First number" autoComplete="off" error={errors.number?.message} {...form.register('number')} />
        <SelectField label="Kind of number" error={errors.kind?.message} {...form.register('kind')}>
          {partNumberKinds.map((k) => (
            <option key={k} value={k}>
              {partNumberKindLabels[k]}
            </option>
          ))}
        </SelectField>
      </div>
      <TextAreaField label="Description" rows={3} error={errors.description?.message} {...form.register('description')} />
      <div className="flex gap-2">
        <Button type="submit" isLoading={create.isPending}>
          Create part
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
