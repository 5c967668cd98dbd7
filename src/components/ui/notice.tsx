import type { ReactNode } from 'react';
import { CircleAlert, CircleCheck, Info, TriangleAlert } from 'lucide-react';
import { cn } from '@/lib/cn';

export type NoticeTone = 'info' | 'ok' | 'warn' | 'danger';

const tones: Record<NoticeTone, { box: string; Icon: typeof Info }> = {
  info: { box: 'border-info/40 bg-info-soft text-info', Icon: Info },
  ok: { box: 'border-ok/40 bg-ok-soft text-ok', Icon: CircleCheck },
  warn: { box: 'border-warn/40 bg-warn-soft text-warn', Icon: TriangleAlert },
  danger: { box: 'border-danger/40 bg-danger-soft text-danger', Icon: CircleAlert },
};

export type NoticeProps = {
  tone?: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  /** 'alert' for errors that need attention now, 'status' for results; none for static text. */
  role?: 'alert' | 'status';
  className?: string;
};

export function Notice({ tone = 'info', title, children, role, className }: NoticeProps) {
  const { box, Icon } = tones[tone];
  return (
    <div role={role} className={cn('flex gap-3 rounded-card border px-4 py-3', box, className)}>
      <Icon aria-hidden="true" className="mt-0.5 size-5 shrink-0" />
      <div className="min-w-0 space-y-1 text-sm text-ink">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="text-ink-soft">{children}</div> : null}
      </div>
    </div>
  );
}

/** Form-level error (e.g. a refused sign-in). Rendered only when there is a message, as an alert. */
export function FormAlert({ message }: { message?: string | null }) {
  if (!message) return null;
  return <Notice tone="danger" role="alert" title={message} />;
}
