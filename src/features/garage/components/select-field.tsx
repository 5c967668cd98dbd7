import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
  /** Keeps the label for screen readers only (compact rows). */
  hideLabel?: boolean;
};

/** A labelled native select in the house style of components/ui/form-field. */
export function SelectField({ label, hint, error, className, ref, hideLabel = false, children, ...props }: SelectFieldProps) {
  const id = useId();
  const described = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className={cn('mb-1.5 block text-sm font-semibold text-ink', hideLabel && 'sr-only')}>
        {label}
      </label>
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={cn(
          'block h-10 w-full rounded-tag border bg-paper-raised px-2.5 text-base text-ink focus-visible:border-patina-500',
          error ? 'border-danger' : 'border-rule-strong',
        )}
        {...props}
      >
        {children}
      </select>
      {hint ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm font-medium text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
