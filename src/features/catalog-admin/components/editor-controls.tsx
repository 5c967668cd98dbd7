import { useState } from 'react';
import { Button } from '@/components/ui/button';

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
