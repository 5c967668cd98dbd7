import { TriangleAlert } from 'lucide-react';
import type { Caution } from '../api/catalog-schemas';

/** The trade's usual cautions for brake, steering and suspension parts, as the API words them. */
export function SafetyCautions({ cautions, subject }: { cautions: Caution[]; subject: string }) {
  if (cautions.length === 0) return null;
  return (
    <aside aria-label="Safety cautions" className="rounded-card border-2 border-warn/60 bg-warn-soft px-4 py-3">
      <p className="flex items-center gap-2 font-semibold text-ink">
        <TriangleAlert aria-hidden="true" className="size-5 shrink-0 text-warn" />
        Safety: {subject}
      </p>
      <ul className="mt-2 list-disc space-y-1 pl-9 text-sm text-ink-soft">
        {cautions.map((c) => (
          <li key={c.code}>{c.text}</li>
        ))}
      </ul>
      <p className="mt-2 pl-7 text-xs text-ink-muted">General guidance only: local codes and a qualified mechanic come first.</p>
    </aside>
  );
}
