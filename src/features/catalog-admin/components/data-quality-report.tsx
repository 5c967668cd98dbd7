import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Badge } from '@/components/ui/badge';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useDataQuality } from '../api/get-data-quality';

const linkClass = 'font-medium text-patina-700 underline decoration-patina-300 underline-offset-3 hover:decoration-patina-600';

function Section({ title, count, description, children }: { title: string; count: number; description: string; children: ReactNode }) {
  const id = `dq-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;
  return (
    <section aria-labelledby={id} className="rounded-card border border-rule bg-paper-raised p-5 shadow-card">
      <div className="mb-1 flex items-center gap-3">
        <h2 id={id} className="text-lg font-bold text-ink">
          {title}
        </h2>
        <Badge tone={count === 0 ? 'ok' : 'warn'}>{count === 0 ? 'none' : String(count)}</Badge>
      </div>
      <p className="mb-3 text-sm text-ink-muted">{description}</p>
      {count === 0 ? <p className="text-sm text-ok">Nothing to fix.</p> : children}
    </section>
  );
}

function PartLinks({ ids, labels }: { ids: string[]; labels?: string[] }) {
  return (
    <span className="inline-flex flex-wrap gap-x-3 gap-y-1">
      {ids.map((id, i) => (
        <span key={id}>
          <Link to={paths.admin.catalog.getHref(id)} className={linkClass}>
            {labels?.[i] ?? `part ${i + 1}`}
          </Link>{' '}
          <Link to={paths.catalogPart.getHref(id)} className="text-xs text-ink-muted hover:underline" aria-label={`Public page of ${labels?.[i] ?? `part ${i + 1}`}`}>
            (public page)
          </Link>
        </span>
      ))}
    </span>
  );
}

/** What in the catalog needs an administrator's attention, each item linked to where it is fixed. */
export function DataQualityReport() {
  const q = useDataQuality();
  if (q.isPending) return <PageSkeleton label="Checking the catalog" />;
  if (q.isError) {
    return (
      <Notice tone="danger" role="alert" title="We could not run the checks">
        <p>{q.error.message}</p>
        <button type="button" className={buttonClasses('secondary', 'sm', 'mt-3')} onClick={() => void q.refetch()}>
          Try again
        </button>
      </Notice>
    );
  }
  const { loops, numbersOnSeveralParts, partsInNoAssembly, overlappingLines } = q.data;
  return (
    <div className="space-y-6">
      <Section title="Supersession loops" count={loops.length} description="Parts that replace each other in a circle. Remove one of the steps so the chain has an end.">
        <ul className="space-y-3 text-sm">
          {loops.map((l) => (
            <li key={l.partIds.join()}>
              <p className="text-ink">{l.message}</p>
              <p className="mt-1">
                Edit: <PartLinks ids={l.partIds} labels={l.numbers} />
              </p>
            </li>
          ))}
        </ul>
      </Section>

      <Section
        title="Numbers on several parts"
        count={numbersOnSeveralParts.length}
        description="The same number (after normalising) carried by different parts. Sometimes right (a hardware standard), often a duplicate part."
      >
        <table className="w-full border-collapse text-left text-sm">
          <thead className="text-label text-ink-muted uppercase">
            <tr>
              <th scope="col" className="py-1.5 pr-3">Number</th>
              <th scope="col" className="py-1.5">Parts</th>
            </tr>
          </thead>
          <tbody>
            {numbersOnSeveralParts.map((n) => (
              <tr key={n.key} className="border-t border-rule align-top">
                <th scope="row" className="py-2 pr-3 font-mono font-semibold text-ink">
                  {n.printed}
                </th>
                <td className="py-2">
                  <PartLinks ids={n.partIds} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </Section>

      <Section
        title="Parts in no assembly"
        count={partsInNoAssembly.count}
        description="Parts on no parts list. Replacement parts reached only through supersession are expected here; others may be strays."
      >
        {partsInNoAssembly.sample.length < partsInNoAssembly.count ? (
          <p className="mb-2 text-sm text-ink-muted">
            The first {partsInNoAssembly.sample.length} of {partsInNoAssembly.count}:
          </p>
        ) : null}
        <ul className="columns-1 gap-6 text-sm sm:columns-2">
          {partsInNoAssembly.sample.map((p) => (
            <li key={p.id} className="break-inside-avoid py-0.5">
              <Link to={paths.admin.catalog.getHref(p.id)} className={linkClass}>
                {p.name}
              </Link>{' '}
              {p.primaryNumber ? <span className="font-mono text-xs text-ink-muted">{p.primaryNumber}</span> : null}
            </li>
          ))}
        </ul>
      </Section>

      <Section
        title="Overlapping lines"
        count={overlappingLines.length}
        description="Two lines with the same callout that can both apply to one vehicle: usually an early/late split with a gap or overlap in the serials."
      >
        <ul className="space-y-2 text-sm">
          {overlappingLines.map((o) => (
            <li key={o.lineIds.join()}>
              <span className="text-ink">{o.message}</span>{' '}
              <Link to={paths.admin.catalogAssemblies.getHref({ assembly: o.assemblyId })} className={linkClass}>
                Edit the lines
              </Link>{' '}
              <Link to={paths.catalogAssembly.getHref(o.assemblyId)} className="text-xs text-ink-muted hover:underline">
                (public page)
              </Link>
            </li>
          ))}
        </ul>
      </Section>
    </div>
  );
}
