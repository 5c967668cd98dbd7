import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { isApiError } from '@/lib/api-client';

/** A failed load: "not found" for a 404 (another user's vehicle reads the same), else the message and a retry. */
export function LoadProblem({ error, what, onRetry }: { error: Error; what: string; onRetry: () => void }) {
  if (isApiError(error) && error.status === 404) {
    return (
      <Notice tone="warn" role="alert" title={`We could not find this ${what}`}>
        It may have been removed, or it belongs to another garage.
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
