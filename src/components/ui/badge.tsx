import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type BadgeTone = 'neutral' | 'drab' | 'accent' | 'ok' | 'warn' | 'danger';

const tones: Record<BadgeTone, string> = {
  neutral: 'border-rule-strong bg-paper-raised text-ink-soft',
  drab: 'border-drab-300 bg-drab-100 text-drab-900',
  accent: 'border-patina-300 bg-patina-50 text-patina-800',
  ok: 'border-ok/40 bg-ok-soft text-ok',
  warn: 'border-warn/40 bg-warn-soft text-warn',
  danger: 'border-danger/40 bg-danger-soft text-danger',
};

/** A small tag-shaped label (roles, states). */
export function Badge({ tone = 'neutral', children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span className={cn('inline-flex items-center rounded-tag border px-2 py-0.5 text-label uppercase', tones[tone], className)}>
      {children}
    </span>
  );
}
