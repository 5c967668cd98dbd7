import { TriangleAlert } from 'lucide-react';
import type { Checklist } from '../api/garage-schemas';
import { ChecklistLineItem } from './checklist-line';
import { ProgressBar } from './progress-bar';

/** The teardown checklist of one assembly: progress, the assembly's safety cautions, every applicable line. */
export function TeardownChecklist({ checklist }: { checklist: Checklist }) {
  const { assembly, vehicleId } = checklist;
  return (
    <div className="space-y-5">
      <div className="grid gap-4 rounded-card border border-rule bg-paper-raised p-4 shadow-card sm:grid-cols-2">
        <div>
          <p className="mb-1 text-label text-drab-700 uppercase">This assembly</p>
          <ProgressBar label={`Progress of ${assembly.name}`} progress={checklist.progress} showLegend />
        </div>
        <div>
          <p className="mb-1 text-label text-drab-700 uppercase">Whole vehicle</p>
          <ProgressBar label="Progress of the whole vehicle" progress={checklist.vehicleProgress} />
        </div>
      </div>

      {checklist.cautions.length ? (
        <details className="rounded-card border-2 border-warn/60 bg-warn-soft px-4 py-3">
          <summary className="flex cursor-pointer items-center gap-2 font-semibold text-ink">
            <TriangleAlert aria-hidden="true" className="size-5 shrink-0 text-warn" />
            Safety on this assembly ({checklist.cautions.length})
          </summary>
          <ul className="mt-2 list-disc space-y-1 pl-9 text-sm text-ink-soft">
            {checklist.cautions.map((c) => (
              <li key={c.code}>{c.text}</li>
            ))}
          </ul>
          <p className="mt-2 pl-7 text-xs text-ink-muted">General guidance only: local codes and a qualified mechanic come first.</p>
        </details>
      ) : null}

      {checklist.lines.length === 0 ? (
        <p className="text-ink-soft">No line of this assembly applies to serial {checklist.serial}.</p>
      ) : (
        <ol aria-label={`Checklist of ${assembly.name}`} className="space-y-3">
          {checklist.lines.map((line) => (
            <ChecklistLineItem key={line.id} vehicleId={vehicleId} assemblyId={assembly.id} line={line} />
          ))}
        </ol>
      )}

      {checklist.excluded.length ? (
        <details className="rounded-card border border-rule bg-paper-sunk/50 px-4 py-3">
          <summary className="cursor-pointer text-sm font-semibold text-ink-soft">Not on this vehicle ({checklist.excluded.length})</summary>
          <ul className="mt-2 space-y-1.5 text-sm text-ink-soft">
            {checklist.excluded.map((x) => (
              <li key={x.line.id}>
                <span className="font-mono">{x.line.part.primaryNumber ?? '—'}</span> {x.line.part.name} (callout {x.line.callout}):{' '}
                <span className="text-ink-muted">{x.reasons.join('; ')}</span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
