import { zodResolver } from '@hookform/resolvers/zod';
import { Truck } from 'lucide-react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { shipInput, type ShipInput } from '@shared/schemas/orders';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';
import { FormAlert } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useShipSubOrder } from '../api/ship-sub-order';

/** Marks a paid sub-order shipped, with the carrier and tracking number the buyer will see. */
export function ShipForm({ subOrderId }: { subOrderId: string }) {
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<ShipInput>({ resolver: zodResolver(shipInput), defaultValues: { carrier: '', tracking: '' } });
  const ship = useShipSubOrder(subOrderId);
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    ship.mutate(values, { onError: (e) => setProblem(applyServerErrors(e, form.setError, ['carrier', 'tracking'])) });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Mark as shipped" className="space-y-4">
      <FormAlert message={problem} />
      <div className="grid gap-4 sm:grid-cols-2">
        {/* Any carrier name: freight lines and local couriers carry the heavy parts. */}
        <TextField label="Carrier" hint="For example USPS, UPS, Canada Post or a freight line" autoComplete="off" error={errors.carrier?.message} {...form.register('carrier')} />
        <TextField label="Tracking number" autoComplete="off" spellCheck={false} error={errors.tracking?.message} {...form.register('tracking')} />
      </div>
      <Button type="submit" isLoading={ship.isPending} icon={<Truck aria-hidden="true" className="size-4" />}>
        Mark as shipped
      </Button>
    </form>
  );
}
