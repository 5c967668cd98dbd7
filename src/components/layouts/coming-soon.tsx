import { Hammer } from 'lucide-react';
import type { ReactNode } from 'react';
import { ContentLayout } from './content-layout';

/** Placeholder for a page still being built. */
export function ComingSoon({ title, eyebrow, children }: { title: string; eyebrow?: string; children?: ReactNode }) {
  return (
    <ContentLayout title={title} eyebrow={eyebrow}>
      <div className="flex max-w-2xl gap-4 rounded-card border border-dashed border-rule-strong bg-paper-raised p-6">
        <Hammer aria-hidden="true" className="size-6 shrink-0 text-drab-500" />
        <div className="space-y-2 text-ink-soft">
          <p className="font-semibold text-ink">Coming soon</p>
          {children}
        </div>
      </div>
    </ContentLayout>
  );
}
