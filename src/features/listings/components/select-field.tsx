import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
};

/** A labelled select in the look of TextField. */
export function SelectField({ label, hint, error, className, ref, children, ...props }: SelectFieldProps) {
  const id = useId();
  const described = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1.5 block text-sm font-semibold text-ink">
        {label}
      </label>
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={cn('block h-10 w-full rounded-tag border bg-paper-raised px-3 text-base text-ink', error ? 'border-danger' : 'border-rule-strong')}
        {...props}
      >
        {children}
      </select>
      {hint ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      <p id={`${id}-error`} aria-live="polite" className="mt-1 text-sm font-medium text-danger empty:mt-0">
        {error}
      </p>
    </div>
  );
}
