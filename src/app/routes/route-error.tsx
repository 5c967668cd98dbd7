import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { NotFoundContent } from './not-found';

function describe(error: unknown): { notFound: boolean; title: string; message: string } {
  if ((isRouteErrorResponse(error) && error.status === 404) || (isApiError(error) && error.status === 404)) {
    return { notFound: true, title: 'Not found', message: '' };
  }
  if (isApiError(error) && error.status === 403) {
    return { notFound: false, title: 'Not allowed', message: error.message };
  }
  if (isApiError(error) && error.status === 0) {
    return { notFound: false, title: 'You seem to be offline', message: error.message };
  }
  // A new deploy can remove the chunk an old tab still points to; a reload fetches the new one.
  if (error instanceof Error && /dynamically imported module|Importing a module script failed/i.test(error.message)) {
    return { notFound: false, title: 'Drabyard was updated', message: 'Reload the page to get the latest version.' };
  }
  return { notFound: false, title: 'This page ran into a problem', message: 'Try again. If it keeps happening, come back a little later.' };
}

/** Error boundary for pages: renders inside the site layout. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const { notFound, title, message } = describe(error);
  if (notFound) return <NotFoundContent />;
  return (
    <div className="mx-auto max-w-xl py-8">
      <title>{`${title} · Drabyard`}</title>
      <h1 className="mb-4 text-2xl font-bold text-ink">{title}</h1>
      <Notice tone="danger" role="alert" title={message} />
      <div className="mt-6 flex gap-3">
        <button type="button" className={buttonClasses('primary')} onClick={() => window.location.reload()}>
          Reload
        </button>
        <Link to={paths.home.getHref()} className={buttonClasses('secondary')}>
          Home
        </Link>
      </div>
    </div>
  );
}

/** Error boundary for the layout itself: nothing around it can be trusted, so it stands alone. */
export function RootErrorBoundary() {
  const error = useRouteError();
  const { title, message } = describe(error);
  return (
    <main className="mx-auto flex min-h-dvh max-w-lg flex-col justify-center gap-4 px-6">
      <title>{`${title} · Drabyard`}</title>
      <p className="text-label text-drab-700 uppercase">Drabyard</p>
      <h1 className="text-2xl font-bold text-ink">{title}</h1>
      <p role="alert" className="text-ink-soft">
        {message || 'Something went wrong.'}
      </p>
      <div className="flex gap-3">
        <button type="button" className={buttonClasses('primary')} onClick={() => window.location.reload()}>
          Reload
        </button>
        <a href={paths.home.getHref()} className={buttonClasses('secondary')}>
          Home
        </a>
      </div>
    </main>
  );
}
