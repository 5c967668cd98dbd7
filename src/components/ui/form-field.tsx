import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

const controlClasses =
  'block w-full rounded-tag border bg-paper-raised px-3 text-base text-ink placeholder:text-ink-muted ' +
  'shadow-[inset_0_1px_0_rgb(28_32_39/0.04)] focus-visible:border-patina-500';

type FieldShellProps = {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
  /** Keeps the label for screen readers only (compact rows). */
  hideLabel?: boolean;
};

function FieldShell({ id, label, hint, error, children, className, hideLabel = false }: FieldShellProps) {
  return (
    <div className={className}>
      <label htmlFor={id} className={cn('mb-1.5 block text-sm font-semibold text-ink', hideLabel && 'sr-only')}>
        {label}
      </label>
      {children}
      {hint ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-muted">
          {hint}
        </p>
      ) : null}
      {/* Always present so screen readers announce an error when it appears. */}
      <p id={`${id}-error`} aria-live="polite" className="mt-1 text-sm font-medium text-danger empty:mt-0">
        {error}
      </p>
    </div>
  );
}

function describedBy(id: string, hint: unknown, error: unknown): string | undefined {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean);
  return ids.length ? ids.join(' ') : undefined;
}

export type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

export function TextField({ label, hint, error, className, ref, ...props }: TextFieldProps) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      <input
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={cn(controlClasses, 'h-10', error ? 'border-danger' : 'border-rule-strong')}
        {...props}
      />
    </FieldShell>
  );
}

export type TextAreaFieldProps = Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
};

export function TextAreaField({ label, hint, error, className, ref, rows = 4, ...props }: TextAreaFieldProps) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      <textarea
        id={id}
        ref={ref}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={cn(controlClasses, 'py-2', error ? 'border-danger' : 'border-rule-strong')}
        {...props}
      />
    </FieldShell>
  );
}

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
  hideLabel?: boolean;
};

/** A labelled native select in the look of the text fields. */
export function SelectField({ label, hint, error, className, ref, hideLabel, children, ...props }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className} hideLabel={hideLabel}>
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={cn('block h-10 w-full rounded-tag border bg-paper-raised px-2.5 text-base text-ink focus-visible:border-patina-500', error ? 'border-danger' : 'border-rule-strong')}
        {...props}
      >
        {children}
      </select>
    </FieldShell>
  );
}
