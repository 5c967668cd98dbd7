import { useState, type ReactNode } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { LISTING_LIMITS, listingConditionCodes, usedGradeCodes, type CreateListingInput } from '@shared/schemas/listings';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { fieldErrorsOf, isApiError } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { usePartDefaults } from '../api/get-part-defaults';
import type { ShippingProfileOption } from '../api/listing-types';
import { conditionLabels, rubberUseLabels, usedGradeLabels } from '../utils/condition-labels';
import { emptyListingForm, formValuesToInput, inputToFormField, listingFormResolver, type ListingFormValues } from './listing-form-values';
import { PartPicker } from './part-picker';

type Props = {
  mode: 'create' | 'edit';
  defaultValues?: ListingFormValues;
  shippingProfiles: ShippingProfileOption[];
  submitLabel: string;
  isPending: boolean;
  /** Resolves when saved; a rejection is an API error whose field messages are put on the form. */
  onSubmit: (input: CreateListingInput) => Promise<unknown>;
};

function Fieldset({ legend, children, hint }: { legend: string; hint?: string; children: ReactNode }) {
  return (
    <fieldset className="space-y-4 rounded-card border border-rule bg-paper-raised p-5 shadow-card">
      <legend className="-ml-1 px-1 text-label text-drab-700 uppercase">{legend}</legend>
      {hint ? <p className="-mt-2 text-sm text-ink-soft">{hint}</p> : null}
      {children}
    </fieldset>
  );
}

/** The listing's details: the part, condition, stock and price, shipping size, description. Photos come after. */
export function ListingForm({ mode, defaultValues, shippingProfiles, submitLabel, isPending, onSubmit }: Props) {
  const [problem, setProblem] = useState<string | null>(null);
  const defaultProfile = shippingProfiles.find((p) => p.isDefault)?.id ?? '';
  const form = useForm<ListingFormValues>({
    resolver: listingFormResolver(mode),
    defaultValues: defaultValues ?? { ...emptyListingForm, shippingProfileId: defaultProfile },
  });
  const { errors } = form.formState;
  const identified = form.watch('identified');
  const condition = form.watch('condition');
  const part = form.watch('part');
  const grade = form.watch('usedGrade');
  const format = form.watch('descriptionFormat');
  const defaults = usePartDefaults(identified === 'catalog' ? (part?.id ?? null) : null).data?.part;
  const fromPart = (n: number | undefined, unit: string) => (mode === 'create' && defaults && n !== undefined ? `${n} ${unit} from the part` : undefined);

  const submit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      await onSubmit(formValuesToInput(values) as CreateListingInput);
    } catch (error) {
      const fieldErrors = fieldErrorsOf(error);
      let unmapped = false;
      for (const [key, messages] of Object.entries(fieldErrors)) {
        const field = inputToFormField[key];
        if (field && messages[0]) form.setError(field, { type: 'server', message: messages[0] });
        else unmapped = true;
      }
      if (!isApiError(error)) setProblem('Something went wrong. Try again.');
      else if (unmapped || Object.keys(fieldErrors).length === 0) setProblem(error.message);
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Listing details" className="space-y-6">
      <FormAlert message={problem} />

      <Fieldset legend="The part">
        <div role="radiogroup" aria-label="Is the part in the catalog?" className="flex flex-wrap gap-4 text-sm">
          {(
            [
              ['catalog', 'From the catalog'],
              ['unidentified', 'Not in the catalog: I will describe it'],
            ] as const
          ).map(([value, text]) => (
            <label key={value} className="flex items-center gap-2">
              <input type="radio" value={value} className="size-4 accent-patina-600" {...form.register('identified')} />
              {text}
            </label>
          ))}
        </div>
        {identified === 'catalog' ? (
          <Controller
            control={form.control}
            name="part"
            render={({ field }) => (
              <PartPicker
                value={field.value}
                error={errors.part?.message}
                onChange={(p) => {
                  field.onChange(p);
                  if (p && !form.getValues('title')) form.setValue('title', p.name);
                }}
              />
            )}
          />
        ) : (
          <p className="text-sm text-ink-soft">
            Describe it below in at least {LISTING_LIMITS.unidentifiedDescriptionMin} characters: markings, size, where it came from. An administrator links it to
            the catalog when they can.
          </p>
        )}
        <TextField label="Title" maxLength={LISTING_LIMITS.titleMax} error={errors.title?.message} {...form.register('title')} />
      </Fieldset>

      <Fieldset legend="Condition">
        <div role="radiogroup" aria-label="Condition" aria-invalid={errors.condition ? true : undefined} className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {listingConditionCodes.map((code) => (
            <label
              key={code}
              className={cn(
                'flex cursor-pointer gap-2 rounded-tag border px-3 py-2 text-sm has-[:checked]:border-patina-500 has-[:checked]:bg-patina-50',
                errors.condition ? 'border-danger' : 'border-rule-strong',
              )}
            >
              <input type="radio" value={code} className="mt-0.5 size-4 accent-patina-600" {...form.register('condition')} />
              <span>
                <span className="block font-semibold text-ink">{conditionLabels[code].label}</span>
                <span className="block text-xs text-ink-muted">{conditionLabels[code].hint}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.condition ? <p className="text-sm font-medium text-danger">{errors.condition.message}</p> : null}
        <div className="grid gap-4 sm:grid-cols-2">
          {condition === 'used_original' ? (
            <SelectField
              label="Grade (Drabyard scale)"
              error={errors.usedGrade?.message}
              hint={grade ? usedGradeLabels[grade].explanation : '1 is best. Buyers see what the grade means.'}
              {...form.register('usedGrade')}
            >
              <option value="">Pick a grade</option>
              {usedGradeCodes.map((g) => (
                <option key={g} value={g}>
                  {usedGradeLabels[g].rank}. {usedGradeLabels[g].label}
                </option>
              ))}
            </SelectField>
          ) : null}
          <SelectField
            label="Rubber parts"
            hint="For hydraulic brake rubber: old rubber may only be offered for display or authenticity."
            error={errors.rubberUse?.message}
            {...form.register('rubberUse')}
          >
            <option value="">No rubber parts / not applicable</option>
            <option value="serviceable">{rubberUseLabels.serviceable}</option>
            <option value="display_only">{rubberUseLabels.display_only}</option>
          </SelectField>
        </div>
        <label className="flex items-center gap-2 text-sm text-ink">
          <input type="checkbox" className="size-4 accent-patina-600" {...form.register('makersMarks')} />
          Maker&rsquo;s marks present (stampings, casting numbers, script): show them in the photos
        </label>
      </Fieldset>

      <Fieldset legend="Stock and price">
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Quantity" inputMode="numeric" error={errors.quantity?.message} {...form.register('quantity')} />
          <TextField label="Price each (US$)" inputMode="decimal" placeholder="42.50" error={errors.price?.message} {...form.register('price')} />
        </div>
      </Fieldset>

      <Fieldset legend="Shipping" hint={mode === 'create' ? 'Leave weight and size empty to take them from the catalog part.' : undefined}>
        <SelectField label="Shipping profile" error={errors.shippingProfileId?.message} {...form.register('shippingProfileId')}>
          <option value="">None (pickup or arrange with the buyer)</option>
          {shippingProfiles.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
              {p.isDefault ? ' (default)' : ''}
            </option>
          ))}
        </SelectField>
        <div className="grid gap-4 sm:grid-cols-4">
          <TextField label="Weight (g)" inputMode="numeric" placeholder={fromPart(defaults?.weightGrams, 'g')} error={errors.weightGrams?.message} {...form.register('weightGrams')} />
          <TextField label="Length (mm)" inputMode="numeric" placeholder={fromPart(defaults?.lengthMm, 'mm')} error={errors.lengthMm?.message} {...form.register('lengthMm')} />
          <TextField label="Width (mm)" inputMode="numeric" placeholder={fromPart(defaults?.widthMm, 'mm')} error={errors.widthMm?.message} {...form.register('widthMm')} />
          <TextField label="Height (mm)" inputMode="numeric" placeholder={fromPart(defaults?.heightMm, 'mm')} error={errors.heightMm?.message} {...form.register('heightMm')} />
        </div>
      </Fieldset>

      <Fieldset legend="Description">
        <div role="radiogroup" aria-label="Description format" className="flex gap-4 text-sm">
          <label className="flex items-center gap-2">
            <input type="radio" value="plain" className="size-4 accent-patina-600" {...form.register('descriptionFormat')} />
            Plain text
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="markdown" className="size-4 accent-patina-600" {...form.register('descriptionFormat')} />
            Markdown
          </label>
        </div>
        <TextAreaField
          label="Description"
          rows={7}
          maxLength={LISTING_LIMITS.descriptionMax}
          hint={
            format === 'markdown'
              ? 'Markdown: **bold**, *italic*, lists, links. It is rendered through our sanitiser when saved: no images or HTML.'
              : 'Blank lines start new paragraphs.'
          }
          error={errors.description?.message}
          {...form.register('description')}
        />
      </Fieldset>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" isLoading={isPending}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
