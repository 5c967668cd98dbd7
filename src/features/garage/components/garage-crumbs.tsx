import { ChevronRight } from 'lucide-react';
import { Link } from 'react-router-dom';

/** Where a garage page sits: Garage / vehicle / assembly. The last crumb is the current page. */
export function GarageCrumbs({ items }: { items: Array<{ label: string; to?: string }> }) {
  return (
    <nav aria-label="Breadcrumb" className="mb-3 print:hidden">
      <ol className="flex flex-wrap items-center gap-1 text-sm text-ink-muted">
        {items.map((c, i) => (
          <li key={`${i}-${c.label}`} className="flex items-center gap-1">
            {i > 0 ? <ChevronRight aria-hidden="true" className="size-3.5" /> : null}
            {c.to ? (
              <Link to={c.to} className="hover:text-ink hover:underline">
                {c.label}
              </Link>
            ) : (
              <span aria-current="page" className="text-ink-soft">
                {c.label}
              </span>
            )}
          </li>
        ))}
      </ol>
    </nav>
  );
}
