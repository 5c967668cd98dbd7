import { useId, useState, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';

export type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  error?: string;
  hint?: ReactNode;
  ref?: Ref<HTMLSelectElement>;
  children: ReactNode;
};

/** A labelled select in the look of the shared text fields. */
export function SelectField({ label, error, hint, className, ref, children, ...props }: SelectFieldProps) {
  const id = useId();
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1.5 block text-sm font-semibold text-ink">
        {label}
      </label>
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={cn('block h-10 w-full rounded-tag border bg-paper-raised px-2 text-base text-ink', error ? 'border-danger' : 'border-rule-strong')}
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

/** A destructive action that asks once more in place (no browser dialog). */
export function ConfirmButton({ label, confirmLabel, onConfirm, isPending }: { label: string; confirmLabel: string; onConfirm: () => void; isPending?: boolean }) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button size="sm" variant="danger" onClick={() => setAsking(true)}>
        {label}
      </Button>
    );
  }
  return (
    <span className="inline-flex items-center gap-2" role="group" aria-label={`Confirm: ${label}`}>
      <Button size="sm" variant="danger" isLoading={isPending} onClick={onConfirm}>
        {confirmLabel}
      </Button>
      <Button size="sm" variant="ghost" onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}

// The categories the server accepts (server/domain/standards/part-specs.ts); offered as suggestions only,
// the server has the last word.
export const PART_CATEGORIES = [
  'brake_hose', 'brake_line', 'brake_fitting', 'wheel_cylinder', 'wheel_cylinder_kit', 'wheel_cylinder_cup', 'master_cylinder',
  'master_cylinder_kit', 'brake_boot', 'brake_shoe', 'brake_drum', 'brake_spring', 'brake_fluid', 'steering_gear', 'tie_rod_end',
  'drag_link', 'steering_knuckle', 'leaf_spring', 'spring_shackle', 'shock_absorber', 'clamp', 'clip', 'fastener', 'nut', 'washer',
  'sealing_washer', 'woodruff_key', 'cotter_pin', 'pin', 'seal', 'gasket', 'bearing', 'bushing', 'spring', 'bracket', 'pedal',
  'linkage', 'cable', 'hose', 'lamp', 'switch', 'gauge', 'wiring', 'housing', 'shaft', 'gear', 'filter', 'weapon_mount', 'generic',
] as const;

export function CategoryOptions({ id }: { id: string }) {
  return (
    <datalist id={id}>
      {PART_CATEGORIES.map((c) => (
        <option key={c} value={c} />
      ))}
    </datalist>
  );
}
