import type { ReactNode } from 'react';

export type ContentLayoutProps = {
  title: string;
  /** Small uppercase line above the title, like the stencil on a parts bin. */
  eyebrow?: string;
  description?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
};

/** A page: sets the document title and renders the page heading. */
export function ContentLayout({ title, eyebrow, description, actions, children }: ContentLayoutProps) {
  return (
    <>
      <title>{`${title} · Drabyard`}</title>
      <div className="mb-8 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-5">
        <div className="max-w-3xl">
          {eyebrow ? <p className="mb-1 text-label text-drab-700 uppercase">{eyebrow}</p> : null}
          <h1 className="text-3xl font-bold text-ink">{title}</h1>
          {description ? <div className="mt-2 text-base text-ink-soft">{description}</div> : null}
        </div>
        {actions ? <div className="flex gap-2">{actions}</div> : null}
      </div>
      {children}
    </>
  );
}
