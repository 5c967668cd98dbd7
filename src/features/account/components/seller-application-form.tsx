import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { sellerApplicationInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextAreaField, TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateSellerApplication } from '../api/create-seller-application';

export function SellerApplicationForm() {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(sellerApplicationInput),
    defaultValues: { businessName: '', location: '', whatTheySell: '' },
  });
  const create = useCreateSellerApplication();
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    create.mutate(values, {
      onSuccess: () => toast.success('Application sent. An administrator will review it.'),
      onError: (error) => setProblem(applyServerErrors(error, form.setError, ['businessName', 'location', 'whatTheySell'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Seller application">
      <FormAlert message={problem} />
      <TextField
        label="Business name"
        autoComplete="organization"
        hint="Your shop, club or trading name. Private sellers can use their own name."
        error={errors.businessName?.message}
        {...form.register('businessName')}
      />
      <TextField
        label="Location"
        autoComplete="address-level2"
        hint="Town and country you ship from."
        error={errors.location?.message}
        {...form.register('location')}
      />
      <TextAreaField
        label="What you sell"
        rows={5}
        hint="Vehicles and systems you cover, and whether it is new old stock, used originals, rebuilt units or reproductions."
        error={errors.whatTheySell?.message}
        {...form.register('whatTheySell')}
      />
      <Button type="submit" isLoading={create.isPending}>
        Apply to sell
      </Button>
    </form>
  );
}
