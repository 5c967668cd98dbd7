import type { ReactNode } from 'react';

/** Narrow, centred card for the sign-in family of pages. */
export function AuthLayout({ title, description, children, footer }: { title: string; description?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="mx-auto w-full max-w-md py-4">
      <title>{`${title} · Drabyard`}</title>
      <div className="rounded-card border border-rule bg-paper-raised p-6 shadow-card sm:p-8">
        <h1 className="text-2xl font-bold text-ink">{title}</h1>
        {description ? <div className="mt-2 text-sm text-ink-soft">{description}</div> : null}
        <div className="mt-6">{children}</div>
      </div>
      {footer ? <div className="mt-4 space-y-1 text-center text-sm text-ink-soft">{footer}</div> : null}
    </div>
  );
}
