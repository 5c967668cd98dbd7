import { Link } from 'react-router-dom';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';

export function NotFoundContent() {
  return (
    <div className="mx-auto max-w-xl py-8 text-center">
      <title>Not found · Drabyard</title>
      <p className="text-label text-drab-700 uppercase">Bin empty · 404</p>
      <h1 className="mt-2 text-3xl font-bold text-ink">We could not find that page</h1>
      <p className="mt-3 text-ink-soft">The address may be mistyped, or the page has moved. Try the catalog, or search by part number.</p>
      <div className="mt-6 flex justify-center gap-3">
        <Link to={paths.catalog.getHref()} className={buttonClasses('primary')}>
          Browse the catalog
        </Link>
        <Link to={paths.home.getHref()} className={buttonClasses('secondary')}>
          Home
        </Link>
      </div>
    </div>
  );
}

export function NotFoundRoute() {
  return <NotFoundContent />;
}
