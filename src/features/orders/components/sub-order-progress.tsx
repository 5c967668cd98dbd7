import { Check, X } from 'lucide-react';
import type { SubOrderDto } from '@shared/schemas/orders';
import { cn } from '@/lib/cn';
import { subOrderSteps, type ProgressStep } from '../utils/order-states';

const marker: Record<ProgressStep['status'], { Icon: typeof Check | null; box: string; text: string }> = {
  done: { Icon: Check, box: 'border-ok bg-ok text-white', text: 'text-ink' },
  current: { Icon: Check, box: 'border-patina-600 bg-patina-600 text-white', text: 'font-semibold text-ink' },
  upcoming: { Icon: null, box: 'border-2 border-rule-strong bg-paper-raised', text: 'text-ink-muted' },
  stopped: { Icon: X, box: 'border-danger bg-danger text-white', text: 'font-semibold text-danger' },
};

const statusWords: Record<ProgressStep['status'], string> = { done: 'done', current: 'where it stands', upcoming: 'not yet', stopped: 'stopped here' };

/** paid -> shipped -> delivered for one seller's part, as a row of tag-like steps. */
export function SubOrderProgress({ subOrder, label }: { subOrder: SubOrderDto; label: string }) {
  const steps = subOrderSteps(subOrder);
  return (
    <ol aria-label={label} className="flex flex-wrap items-start gap-x-2 gap-y-3">
      {steps.map((step, i) => {
        const m = marker[step.status];
        return (
          <li
            key={step.key}
            data-step={step.key}
            data-status={step.status}
            aria-current={step.status === 'current' || step.status === 'stopped' ? 'step' : undefined}
            className="flex items-start gap-2"
          >
            {i > 0 ? <span aria-hidden="true" className={cn('mt-3 h-px w-6 sm:w-10', step.status === 'upcoming' ? 'bg-rule-strong' : 'bg-ok')} /> : null}
            <span className={cn('mt-0.5 inline-flex size-5 shrink-0 items-center justify-center rounded-full border', m.box)}>
              {m.Icon ? <m.Icon aria-hidden="true" className="size-3" strokeWidth={3} /> : null}
            </span>
            <span className="flex flex-col">
              <span className={cn('text-sm', m.text)}>
                {step.label}
                <span className="sr-only"> ({statusWords[step.status]})</span>
              </span>
              {step.detail ? <span className="text-xs text-ink-muted">{step.detail}</span> : null}
            </span>
          </li>
        );
      })}
    </ol>
  );
}
