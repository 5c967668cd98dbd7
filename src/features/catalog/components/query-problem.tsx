import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { isApiError } from '@/lib/api-client';

/** A failed catalog load: "not found" says so plainly; anything else offers a retry. */
export function QueryProblem({ error, what, onRetry }: { error: Error; what: string; onRetry: () => void }) {
  if (isApiError(error) && error.status === 404) {
    return (
      <Notice tone="info" role="status" title={`We could not find that ${what}`}>
        <p>It may have been removed or merged into another entry. Start again from the catalog.</p>
      </Notice>
    );
  }
  return (
    <Notice tone="danger" role="alert" title={`We could not load the ${what}`}>
      <p>{error.message}</p>
      <button type="button" className={buttonClasses('secondary', 'sm', 'mt-3')} onClick={onRetry}>
        Try again
      </button>
    </Notice>
  );
}
