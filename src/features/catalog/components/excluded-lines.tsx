import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { AssemblyDetail } from '../api/catalog-schemas';

/** Lines the serial filter left out, with the server's reasons, folded away by default. */
export function ExcludedLines({ excluded }: { excluded: AssemblyDetail['excluded'] }) {
  if (excluded.length === 0) return null;
  return (
    <details className="group rounded-card border border-rule bg-paper-raised px-4 py-3 shadow-card">
      <summary className="cursor-pointer font-semibold text-ink marker:text-ink-muted">Not on this vehicle ({excluded.length})</summary>
      <ul className="mt-3 divide-y divide-rule text-sm">
        {excluded.map(({ line, reasons }) => (
          <li key={line.id} className="flex flex-wrap gap-x-3 gap-y-1 py-2">
            <span className="inline-flex size-7 items-center justify-center rounded-full border border-rule-strong font-mono text-xs font-bold text-ink-muted">
              {line.callout}
            </span>
            <span className="min-w-0 flex-1">
              <Link to={paths.catalogPart.getHref(line.part.id)} className="font-medium text-ink underline decoration-rule-strong underline-offset-3 hover:text-patina-700">
                {line.part.name}
              </Link>
              {line.part.primaryNumber ? <span className="ml-2 font-mono text-ink-muted">{line.part.primaryNumber}</span> : null}
              <span className="block text-ink-soft">{reasons.join('; ')}</span>
            </span>
          </li>
        ))}
      </ul>
    </details>
  );
}
