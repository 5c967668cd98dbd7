import { Printer } from 'lucide-react';
import { useState } from 'react';
import { labelLayoutIds, type LabelLayoutId } from '@shared/schemas/garage';
import { buttonClasses } from '@/components/ui/button';
import { apiPaths } from '@/config/paths';
import { env } from '@/config/env';
import { SelectField } from '@/components/ui/form-field';

// Names as the label service gives them (server/services/labels.ts LABEL_LAYOUTS).
const layoutNames: Record<LabelLayoutId, string> = {
  'tag-50x30': 'Tags 50 × 30 mm, 4 × 9 on A4 (cut out)',
  'letter-3x10': 'Labels 66 × 25 mm, 3 × 10 on US Letter',
  'strip-100x40': 'Strips 100 × 40 mm, 2 × 7 on A4',
};

/** Bag-and-tag labels of the assembly's lines as a printable PDF, on one of several sheet layouts. */
export function LabelsPanel({ vehicleId, assemblyId }: { vehicleId: string; assemblyId: string }) {
  const [layout, setLayout] = useState<LabelLayoutId>('tag-50x30');
  const href = `${env.VITE_API_BASE_URL}${apiPaths.garage.labels(vehicleId, assemblyId, layout)}`;
  return (
    <section aria-labelledby="labels-title" className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
      <h2 id="labels-title" className="text-lg font-semibold text-ink">
        Bag-and-tag labels
      </h2>
      <p className="mt-1 text-sm text-ink-soft">One label per line: part number, name, callout, assembly, serial and a QR code to the part page.</p>
      <div className="mt-3 flex flex-wrap items-end gap-3">
        <SelectField label="Sheet layout" className="min-w-64 flex-1" value={layout} onChange={(e) => setLayout(e.target.value as LabelLayoutId)}>
          {labelLayoutIds.map((id) => (
            <option key={id} value={id}>
              {layoutNames[id]}
            </option>
          ))}
        </SelectField>
        <a href={href} target="_blank" rel="noreferrer" className={buttonClasses('secondary', 'md')}>
          <Printer aria-hidden="true" className="size-4" />
          Open labels (PDF)
        </a>
      </div>
    </section>
  );
}
