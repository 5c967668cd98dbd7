import { useState } from 'react';
import { useForm, type FieldErrors, type Resolver } from 'react-hook-form';
import { toast } from 'sonner';
import { shopProfileInput } from '@shared/schemas/listings';
import { Button } from '@/components/ui/button';
import { TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { fieldErrorsOf, isApiError } from '@/lib/api-client';
import { useSaveShop } from '../api/save-shop';
import type { Shop } from '../api/seller-types';

interface ShopFormValues {
  shopName: string;
  location: string;
  country: string;
  shipsTo: string;
  pickupAtShows: boolean;
  showsNote: string;
  returnPolicy: string;
}

export const splitCountries = (s: string) =>
  s
    .split(/[\s,;]+/)
    .map((c) => c.trim())
    .filter(Boolean);

const toInput = (v: ShopFormValues) => ({ ...v, shipsTo: splitCountries(v.shipsTo) });

// The shared schema checks the request body; its messages land on the form's fields (shipsTo.N -> shipsTo).
const resolver: Resolver<ShopFormValues> = async (values) => {
  const r = shopProfileInput.safeParse(toInput(values));
  if (r.success) return { values, errors: {} };
  const errors: FieldErrors<ShopFormValues> = {};
  for (const issue of r.error.issues) {
    const field = String(issue.path[0]) as keyof ShopFormValues;
    if (!errors[field]) errors[field] = { type: issue.code, message: field === 'shipsTo' ? `${issue.message} (separate codes with commas)` : issue.message };
  }
  return { values: {}, errors };
};

export function ShopForm({ shop }: { shop: Shop | null }) {
  const [problem, setProblem] = useState<string | null>(null);
  const save = useSaveShop();
  const form = useForm<ShopFormValues>({
    resolver,
    defaultValues: {
      shopName: shop?.shopName ?? '',
      location: shop?.location ?? '',
      country: shop?.country ?? 'US',
      shipsTo: (shop?.shipsTo ?? ['US']).join(', '),
      pickupAtShows: shop?.pickupAtShows ?? false,
      showsNote: shop?.showsNote ?? '',
      returnPolicy: shop?.returnPolicy ?? '',
    },
  });
  const { errors } = form.formState;
  const pickup = form.watch('pickupAtShows');

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    save.mutate(toInput(values), {
      onSuccess: () => toast.success('Shop profile saved'),
      onError: (error) => {
        const fe = fieldErrorsOf(error);
        for (const [k, m] of Object.entries(fe)) if (k in values && m[0]) form.setError(k as keyof ShopFormValues, { message: m[0] });
        setProblem(isApiError(error) ? error.message : 'Something went wrong. Try again.');
      },
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Shop profile" className="space-y-4">
      <FormAlert message={problem} />
      <TextField label="Shop name" error={errors.shopName?.message} {...form.register('shopName')} />
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField label="Location" hint="Town and region buyers see, e.g. Marlow Flats, Ohio" error={errors.location?.message} {...form.register('location')} />
        <TextField label="Country" hint="Two-letter code" maxLength={2} error={errors.country?.message} {...form.register('country')} />
      </div>
      <TextField label="Ships to" hint="Two-letter country codes, separated by commas; leave empty for pickup only" error={errors.shipsTo?.message} {...form.register('shipsTo')} />
      <label className="flex items-center gap-2 text-sm text-ink">
        <input type="checkbox" className="size-4 accent-patina-600" {...form.register('pickupAtShows')} />
        Buyers can pick up at shows
      </label>
      {pickup ? <TextField label="Which shows" hint="Where and when buyers can collect" error={errors.showsNote?.message} {...form.register('showsNote')} /> : null}
      <TextAreaField label="Return policy" rows={4} error={errors.returnPolicy?.message} {...form.register('returnPolicy')} />
      <Button type="submit" isLoading={save.isPending}>
        Save shop profile
      </Button>
    </form>
  );
}
