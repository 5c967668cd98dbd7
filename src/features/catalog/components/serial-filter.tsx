import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { assemblyQuery } from '@shared/schemas/catalog';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/form-field';

// The server reads the last run of digits as the serial, so a serial without a digit is refused here too.
const serialInput = z.object({
  serial: assemblyQuery.shape.serial.unwrap().refine((v) => v === '' || /\d/.test(v), 'A serial number needs digits'),
});

export type SerialFilterProps = {
  /** The serial in the address, or null. */
  serial: string | null;
  onApply: (serial: string | null) => void;
  /** A message from the server about the serial (e.g. refused). */
  serverError?: string;
  serialRange?: string;
};

/** "Enter a serial to see only what applies": the value lives in the URL, so the filtered page can be shared. */
export function SerialFilter({ serial, onApply, serverError, serialRange }: SerialFilterProps) {
  const form = useForm({ resolver: zodResolver(serialInput), defaultValues: { serial: serial ?? '' } });
  const { reset } = form;
  // Back/forward or a shared link change the URL: the field follows.
  useEffect(() => reset({ serial: serial ?? '' }), [serial, reset]);

  return (
    <form
      noValidate
      role="search"
      aria-label="Filter by vehicle serial"
      onSubmit={form.handleSubmit(({ serial: value }) => onApply(value === '' ? null : value))}
      className="flex flex-wrap items-start gap-2"
    >
      <TextField
        label="Vehicle serial number"
        className="w-56"
        inputMode="text"
        autoComplete="off"
        placeholder="e.g. 4210"
        hint={serialRange}
        error={form.formState.errors.serial?.message ?? serverError}
        {...form.register('serial')}
      />
      <div className="flex gap-2 pt-7">
        <Button type="submit" size="md">
          Show what applies
        </Button>
        {serial ? (
          <Button variant="ghost" onClick={() => onApply(null)}>
            Show all lines
          </Button>
        ) : null}
      </div>
    </form>
  );
}
