import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { createGarageVehicleInput, originalityTargetLabels, originalityTargets } from '@shared/schemas/garage';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCatalogModel, useCatalogModels } from '../api/get-catalog-models';
import { useCreateGarageVehicle } from '../api/create-garage-vehicle';
import type { GarageVehicle } from '../api/garage-schemas';

// The shared request schema, with empty optional fields turned into null before it checks them.
const emptyToNull = z
  .string()
  .trim()
  .transform((v) => (v === '' ? null : v));
const formSchema = createGarageVehicleInput.extend({
  buildDate: emptyToNull.pipe(createGarageVehicleInput.shape.buildDate.unwrap()),
  variant: emptyToNull.pipe(createGarageVehicleInput.shape.variant.unwrap()),
});

const targetHints: Record<(typeof originalityTargets)[number], string> = {
  as_built: 'Every part as the factory fitted it for this serial: originals and NOS.',
  period_correct: 'Right for the period, including period replacement stock.',
  usable_driver: 'Runs and stops safely; reproductions are welcome.',
};

const fields = ['vehicleSlug', 'serial', 'buildDate', 'variant', 'nickname', 'originalityTarget'] as const;

/** Adds a vehicle: model, serial as stamped, build date, variant and the originality target. */
export function VehicleForm({ onCreated }: { onCreated?: (vehicle: GarageVehicle) => void }) {
  const [problem, setProblem] = useState<string | null>(null);
  const models = useCatalogModels();
  const form = useForm({
    resolver: zodResolver(formSchema),
    defaultValues: { vehicleSlug: '', nickname: '', serial: '', buildDate: '', variant: '', originalityTarget: 'as_built' as const },
  });
  const slug = form.watch('vehicleSlug');
  const model = models.data?.find((m) => m.slug === slug) ?? null;
  const detail = useCatalogModel(model ? model.slug : null);
  const variants = detail.data?.variants ?? [];
  const create = useCreateGarageVehicle();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    create.mutate(values, {
      onSuccess: (vehicle) => {
        form.reset();
        onCreated?.(vehicle);
      },
      onError: (error) => setProblem(applyServerErrors(error, form.setError, fields)),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a vehicle" className="space-y-5">
      <FormAlert message={problem ?? (models.isError ? models.error.message : null)} />
      <div className="grid gap-5 sm:grid-cols-2">
        <SelectField label="Vehicle model" error={errors.vehicleSlug?.message} disabled={models.isPending} {...form.register('vehicleSlug')}>
          <option value="">{models.isPending ? 'Loading models…' : 'Pick a model'}</option>
          {(models.data ?? []).map((m) => (
            <option key={m.slug} value={m.slug}>
              {m.name} ({m.yearFrom}–{m.yearTo})
            </option>
          ))}
        </SelectField>
        <TextField
          label="Serial number"
          autoComplete="off"
          spellCheck={false}
          hint={
            model
              ? `As stamped on the data plate: ${model.serialPrefix}${model.serialFrom} to ${model.serialPrefix}${model.serialTo}.`
              : 'As stamped on the data plate.'
          }
          error={errors.serial?.message}
          {...form.register('serial')}
        />
        <TextField
          label="Build date"
          inputMode="numeric"
          placeholder="YYYY-MM-DD"
          hint="From the data plate; a year or year and month is fine. Leave empty if unknown."
          error={errors.buildDate?.message}
          {...form.register('buildDate')}
        />
        {variants.length > 0 ? (
          <SelectField label="Variant" hint="Only if the data plate or build record says so." error={errors.variant?.message} {...form.register('variant')}>
            <option value="">Standard / not known</option>
            {variants.map((v) => (
              <option key={v.code} value={v.code}>
                {v.name} ({v.code})
              </option>
            ))}
          </SelectField>
        ) : (
          <TextField label="Variant" hint="Maker's variant code, if any." error={errors.variant?.message} {...form.register('variant')} />
        )}
        <TextField label="Nickname" hint="Optional: what you call it in the shop." error={errors.nickname?.message} {...form.register('nickname')} />
      </div>
      <fieldset>
        <legend className="mb-2 text-sm font-semibold text-ink">Originality target</legend>
        <div className="grid gap-2 sm:grid-cols-3">
          {originalityTargets.map((t) => (
            <label
              key={t}
              className="flex cursor-pointer gap-2.5 rounded-card border border-rule-strong bg-paper-raised p-3 has-checked:border-patina-600 has-checked:bg-patina-50"
            >
              <input type="radio" value={t} className="mt-1 accent-patina-600" {...form.register('originalityTarget')} />
              <span>
                <span className="block text-sm font-semibold text-ink">{originalityTargetLabels[t]}</span>
                <span className="block text-xs text-ink-muted">{targetHints[t]}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.originalityTarget?.message ? <p className="mt-1 text-sm font-medium text-danger">{errors.originalityTarget.message}</p> : null}
      </fieldset>
      <Button type="submit" isLoading={create.isPending}>
        Add vehicle
      </Button>
    </form>
  );
}
