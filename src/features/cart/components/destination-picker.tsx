import { useId } from 'react';
import type { Destination } from '@shared/schemas/orders';
import { countryChoices, destinationFromParam, destinationToParam } from '../utils/destination';

/** "Ship to": a country, or pickup from every seller (at their shop or a show). */
export function DestinationPicker({ value, onChange, disabled }: { value: Destination; onChange: (d: Destination) => void; disabled?: boolean }) {
  const id = useId();
  const current = destinationToParam(value);
  const known = current === 'pickup' || countryChoices.some((c) => c.code === current);
  return (
    <div>
      <label htmlFor={id} className="mb-1.5 block text-sm font-semibold text-ink">
        Ship to
      </label>
      <select
        id={id}
        value={current}
        disabled={disabled}
        onChange={(e) => onChange(destinationFromParam(e.target.value))}
        className="block h-10 w-full rounded-tag border border-rule-strong bg-paper-raised px-3 text-base text-ink"
      >
        {countryChoices.map((c) => (
          <option key={c.code} value={c.code}>
            {c.name}
          </option>
        ))}
        {known ? null : <option value={current}>{current}</option>}
        <option value="pickup">Pickup from each seller</option>
      </select>
    </div>
  );
}
