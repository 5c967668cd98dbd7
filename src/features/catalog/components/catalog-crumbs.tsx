import { ChevronRight } from 'lucide-react';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';

/** Where a page sits in the catalog: Catalog › vehicle › assembly. The last crumb is the page itself. */
export function CatalogCrumbs({ trail }: { trail: Array<{ label: string; to?: string }> }) {
  return (
    <nav aria-label="Breadcrumb" className="mb-4 text-sm">
      <ol className="flex flex-wrap items-center gap-1 text-ink-muted">
        {trail.map((c, i) => (
          <Fragment key={`${c.label}-${i}`}>
            {i > 0 ? <ChevronRight aria-hidden="true" className="size-3.5" /> : null}
            <li>
              {c.to ? (
                <Link to={c.to} className="hover:text-patina-700 hover:underline">
                  {c.label}
                </Link>
              ) : (
                <span aria-current="page" className="text-ink-soft">
                  {c.label}
                </span>
              )}
            </li>
          </Fragment>
        ))}
      </ol>
    </nav>
  );
}
