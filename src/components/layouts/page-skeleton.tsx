import { Skeleton } from '@/components/ui/skeleton';

/** Placeholder while a page's code or data loads. */
export function PageSkeleton({ label = 'Loading page' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="space-y-6">
      <span className="sr-only">{label}…</span>
      <Skeleton className="h-9 w-2/5" />
      <Skeleton className="h-4 w-3/5" />
      <div className="grid gap-4 sm:grid-cols-2">
        <Skeleton className="h-32" />
        <Skeleton className="h-32" />
      </div>
      <Skeleton className="h-4 w-4/5" />
      <Skeleton className="h-4 w-2/3" />
    </div>
  );
}

/** Whole-screen placeholder used before the router has rendered anything (first load). */
export function AppSkeleton() {
  return (
    <div className="flex min-h-dvh flex-col">
      <div className="border-b border-rule bg-paper-raised/80">
        <div className="h-1 bg-patina-600" />
        <div className="mx-auto flex max-w-6xl items-center gap-6 px-4 py-3 sm:px-6">
          <span className="text-xl font-[820] tracking-[-0.03em] text-ink">Drabyard</span>
          <Skeleton className="h-10 flex-1" />
          <Skeleton className="h-9 w-32" />
        </div>
      </div>
      <div className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        <PageSkeleton />
      </div>
    </div>
  );
}
