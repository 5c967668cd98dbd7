import { zodResolver } from '@hookform/resolvers/zod';
import { ExternalLink } from 'lucide-react';
import { Fragment, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { z } from 'zod';
import { createAssemblyInput } from '@shared/schemas/catalog';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SelectField, TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import type { AssemblyRecord, AssemblyTreeNode } from '../api/admin-catalog-schemas';
import { useCreateLine } from '../api/create-line';
import { useDeleteAssembly } from '../api/delete-assembly';
import { useDeleteLine } from '../api/delete-line';
import { useAssemblyRecord } from '../api/get-assembly-record';
import { useUpdateAssembly } from '../api/update-assembly';
import { useUpdateLine } from '../api/update-line';
import { ConfirmButton } from './editor-controls';
import { LineForm } from './line-form';

const assemblyForm = z.object({
  code: createAssemblyInput.shape.code,
  name: createAssemblyInput.shape.name,
  description: z.string().trim().max(5000),
  parentId: z.string(),
});

export function flattenTree(nodes: AssemblyTreeNode[], depth = 0): Array<{ id: string; label: string }> {
  return nodes.flatMap((n) => [{ id: n.id, label: `${'— '.repeat(depth)}${n.code} ${n.name}` }, ...flattenTree(n.children, depth + 1)]);
}

/** One assembly: its code, name, description and parent; its parts-list lines; or delete it. */
export function AssemblyEditor({ assemblyId, candidates }: { assemblyId: string; candidates: Array<{ id: string; label: string }> }) {
  const record = useAssemblyRecord(assemblyId);
  if (record.isPending) return <PageSkeleton label="Loading the assembly" />;
  if (record.isError) return <Notice tone="danger" role="alert" title={record.error.message} />;
  const { assembly, vehicle, system } = record.data;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <p className="text-label text-drab-700 uppercase">
            {vehicle.name} · {system.name}
          </p>
          <h2 className="text-2xl font-bold text-ink">{assembly.name}</h2>
        </div>
        <Link to={paths.catalogAssembly.getHref(assembly.id)} className="inline-flex items-center gap-1 text-sm font-semibold text-patina-700 hover:underline">
          Open the public page <ExternalLink aria-hidden="true" className="size-4" />
        </Link>
      </div>
      <Card>
        <h3 className="mb-4 text-lg font-bold text-ink">Assembly</h3>
        <AssemblyDetailsForm key={JSON.stringify([assembly, record.data.parent])} record={record.data} candidates={candidates.filter((c) => c.id !== assembly.id)} />
      </Card>
      <Card>
        <h3 className="mb-4 text-lg font-bold text-ink">Parts-list lines</h3>
        <LinesEditor record={record.data} />
      </Card>
      <Card>
        <h3 className="mb-2 text-lg font-bold text-ink">Delete</h3>
        <p className="mb-3 text-sm text-ink-soft">Deleting an assembly deletes its sub-assemblies and their lines too.</p>
        <DeleteAssembly id={assembly.id} name={assembly.name} vehicleSlug={vehicle.slug} />
      </Card>
    </div>
  );
}

function AssemblyDetailsForm({ record, candidates }: { record: AssemblyRecord; candidates: Array<{ id: string; label: string }> }) {
  const [problem, setProblem] = useState<string | null>(null);
  const update = useUpdateAssembly();
  const initial = { code: record.assembly.code, name: record.assembly.name, description: record.assembly.description, parentId: record.parent?.id ?? '' };
  const form = useForm({ resolver: zodResolver(assemblyForm), defaultValues: initial });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    const changes: Record<string, string | null> = {};
    if (values.code !== initial.code) changes.code = values.code;
    if (values.name !== initial.name) changes.name = values.name;
    if (values.description !== initial.description) changes.description = values.description;
    if (values.parentId !== initial.parentId) changes.parentId = values.parentId || null;
    if (Object.keys(changes).length === 0) {
      setProblem('Change at least one field');
      return;
    }
    update.mutate(
      { id: record.assembly.id, changes },
      { onSuccess: () => toast.success('Assembly saved.'), onError: (e) => setProblem(applyServerErrors(e, form.setError, ['code', 'name', 'description', 'parentId'])) },
    );
  });
  return (
    <form noValidate aria-label="Assembly details" onSubmit={onSubmit} className="space-y-4">
      <FormAlert message={problem} />
      <div className="grid gap-4 sm:grid-cols-[8rem_minmax(0,1fr)]">
        <TextField label="Code" error={errors.code?.message} {...form.register('code')} />
        <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
      </div>
      <SelectField label="Part of" error={errors.parentId?.message} {...form.register('parentId')}>
        <option value="">(a top-level assembly of its system)</option>
        {candidates.map((c) => (
          <option key={c.id} value={c.id}>
            {c.label}
          </option>
        ))}
      </SelectField>
      <TextAreaField label="Description" rows={3} error={errors.description?.message} {...form.register('description')} />
      <Button type="submit" isLoading={update.isPending}>
        Save assembly
      </Button>
    </form>
  );
}

function LinesEditor({ record }: { record: AssemblyRecord }) {
  const [editing, setEditing] = useState<string | null>(null);
  const create = useCreateLine();
  const update = useUpdateLine();
  const remove = useDeleteLine();
  return (
    <div className="space-y-5">
      {record.lines.length === 0 ? (
        <p className="text-sm text-ink-muted">No lines yet.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] border-collapse text-left text-sm">
            <caption className="sr-only">Lines of {record.assembly.name}</caption>
            <thead className="bg-paper-sunk text-label text-ink-muted uppercase">
              <tr>
                <th scope="col" className="px-3 py-2">Callout</th>
                <th scope="col" className="px-3 py-2">Part</th>
                <th scope="col" className="px-3 py-2 text-right">Qty</th>
                <th scope="col" className="px-3 py-2">Notes</th>
                <th scope="col" className="px-3 py-2 text-right">Change</th>
              </tr>
            </thead>
            <tbody>
              {record.lines.map((l) => (
                <Fragment key={l.id}>
                  <tr className="border-t border-rule align-top">
                    <td className="px-3 py-2 font-mono font-bold">{l.callout}</td>
                    <th scope="row" className="px-3 py-2 font-normal">
                      <span className="font-medium text-ink">{l.part.name}</span>
                      <span className="block font-mono text-xs text-ink-muted">{l.part.primaryNumber}</span>
                    </th>
                    <td className="px-3 py-2 text-right">{l.quantity}</td>
                    <td className="px-3 py-2 text-ink-soft">{l.notes}</td>
                    <td className="px-3 py-2">
                      <div className="flex justify-end gap-2">
                        <Button size="sm" variant="secondary" aria-expanded={editing === l.id} onClick={() => setEditing((id) => (id === l.id ? null : l.id))}>
                          Edit
                        </Button>
                        <Button
                          size="sm"
                          variant="ghost"
                          aria-label={`Remove line ${l.callout}: ${l.part.name}`}
                          disabled={remove.isPending}
                          onClick={() => remove.mutate(l.id, { onSuccess: () => toast.success(`Line ${l.callout} removed.`), onError: (e) => toast.error(e.message) })}
                        >
                          Remove
                        </Button>
                      </div>
                    </td>
                  </tr>
                  {editing === l.id ? (
                    <tr className="bg-paper">
                      <td colSpan={5} className="px-3 py-3">
                        <LineForm
                          line={l}
                          submitLabel="Save line"
                          isPending={update.isPending}
                          onCancel={() => setEditing(null)}
                          onSubmit={(changes, done) =>
                            update.mutate(
                              { id: l.id, changes },
                              {
                                onSuccess: () => {
                                  toast.success(`Line ${changes.callout} saved.`);
                                  setEditing(null);
                                },
                                onError: done.fail,
                              },
                            )
                          }
                        />
                      </td>
                    </tr>
                  ) : null}
                </Fragment>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <div className="border-t border-rule pt-4">
        <h4 className="mb-3 font-semibold text-ink">Add a line</h4>
        <LineForm
          submitLabel="Add line"
          isPending={create.isPending}
          onSubmit={(changes, done) =>
            create.mutate(
              { assemblyId: record.assembly.id, ...changes },
              {
                onSuccess: () => {
                  toast.success(`Line ${changes.callout} added.`);
                  done.reset();
                },
                onError: done.fail,
              },
            )
          }
        />
      </div>
    </div>
  );
}

function DeleteAssembly({ id, name, vehicleSlug }: { id: string; name: string; vehicleSlug: string }) {
  const remove = useDeleteAssembly();
  const navigate = useNavigate();
  return (
    <ConfirmButton
      label="Delete assembly"
      confirmLabel={`Delete “${name}”`}
      isPending={remove.isPending}
      onConfirm={() =>
        remove.mutate(id, {
          onSuccess: () => {
            toast.success(`Assembly “${name}” deleted.`);
            void navigate(paths.admin.catalogAssemblies.getHref({ vehicle: vehicleSlug }));
          },
          onError: (e) => toast.error(e.message),
        })
      }
    />
  );
}
