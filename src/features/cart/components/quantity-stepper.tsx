import { Minus, Plus } from 'lucide-react';
import { useId, useRef, useState, type KeyboardEvent } from 'react';
import { cn } from '@/lib/cn';

type Props = {
  /** The item's title, for the controls' accessible names. */
  title: string;
  quantity: number;
  /** Units that can be bought now; the stepper never offers more. */
  available: number;
  disabled?: boolean;
  onChange: (quantity: number) => void;
};

const stepClasses =
  'inline-flex size-8 items-center justify-center text-ink-soft hover:bg-paper-sunk hover:text-ink disabled:cursor-not-allowed disabled:opacity-40';

/**
 * − [n] + for a cart line, capped by stock: "+" stops at what is available and a typed number above it is
 * brought down to it (the server caps again; this only saves a round trip and says why).
 */
export function QuantityStepper({ title, quantity, available, disabled = false, onChange }: Props) {
  const inputRef = useRef<HTMLInputElement>(null);
  const hintId = useId();
  const [capNote, setCapNote] = useState<string | null>(null);
  const max = Math.max(available, 0);

  const commit = (wanted: number) => {
    if (!Number.isFinite(wanted)) wanted = quantity;
    let next = Math.max(1, Math.trunc(wanted));
    if (next > max) {
      setCapNote(`Only ${max} available`);
      next = max;
    } else {
      setCapNote(null);
    }
    if (inputRef.current) inputRef.current.value = String(next);
    if (next >= 1 && next !== quantity) onChange(next);
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') {
      e.preventDefault();
      commit(Number(e.currentTarget.value));
    }
  };

  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
      <div className={cn('inline-flex items-center overflow-hidden rounded-tag border border-rule-strong bg-paper-raised', disabled && 'opacity-60')}>
        <button type="button" className={stepClasses} aria-label={`One fewer: ${title}`} disabled={disabled || quantity <= 1} onClick={() => commit(Math.min(quantity, max + 1) - 1)}>
          <Minus aria-hidden="true" className="size-4" />
        </button>
        <input
          ref={inputRef}
          // Remount when the server's quantity changes, so the field shows it.
          key={quantity}
          type="number"
          inputMode="numeric"
          min={1}
          max={max}
          defaultValue={quantity}
          disabled={disabled}
          aria-label={`Quantity: ${title}`}
          aria-describedby={hintId}
          onBlur={(e) => commit(Number(e.currentTarget.value))}
          onKeyDown={onKeyDown}
          className="h-8 w-12 border-x border-rule bg-paper-raised text-center text-sm tabular-nums text-ink [appearance:textfield] [&::-webkit-inner-spin-button]:appearance-none [&::-webkit-outer-spin-button]:appearance-none"
        />
        <button type="button" className={stepClasses} aria-label={`One more: ${title}`} disabled={disabled || quantity >= max} onClick={() => commit(quantity + 1)}>
          <Plus aria-hidden="true" className="size-4" />
        </button>
      </div>
      <span id={hintId} aria-live="polite" className={cn('text-xs', capNote ? 'font-medium text-warn' : 'text-ink-muted')}>
        {capNote ?? `${max} available`}
      </span>
    </div>
  );
}
