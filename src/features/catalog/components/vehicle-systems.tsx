import { Image } from 'lucide-react';
import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Badge } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import type { AssemblyNode } from '../api/catalog-schemas';
import { useVehicle } from '../api/get-vehicle';
import { CatalogCrumbs } from './catalog-crumbs';
import { QueryProblem } from './query-problem';

/** One vehicle model: its systems, each with its assemblies and sub-assemblies. */
export function VehicleSystems({ slug }: { slug: string }) {
  const query = useVehicle(slug);
  if (query.isPending) return <PageSkeleton label="Loading the vehicle" />;
  if (query.isError) {
    return (
      <ContentLayout title="Vehicle" eyebrow="Catalog">
        <QueryProblem error={query.error} what="vehicle" onRetry={() => void query.refetch()} />
      </ContentLayout>
    );
  }
  const { vehicle, variants, systems } = query.data;
  return (
    <>
      <CatalogCrumbs trail={[{ label: 'Catalog', to: paths.catalog.getHref() }, { label: vehicle.name }]} />
      <ContentLayout
        title={vehicle.name}
        eyebrow={`${vehicle.maker} · ${vehicle.yearFrom}–${vehicle.yearTo}`}
        description={
          <>
            <p>{vehicle.description}</p>
            <p className="mt-1 text-sm text-ink-muted">
              Serials {vehicle.serialPrefix}
              {vehicle.serialFrom} to {vehicle.serialPrefix}
              {vehicle.serialTo}
            </p>
          </>
        }
      >
        <div className="space-y-6">
          {variants.length ? (
            <section aria-labelledby="variants" className="flex flex-wrap items-baseline gap-x-6 gap-y-2 rounded-card border border-rule bg-paper-sunk/50 px-4 py-3 text-sm">
              <h2 id="variants" className="text-label text-drab-700 uppercase">
                Variants
              </h2>
              <ul className="flex flex-wrap gap-x-6 gap-y-2">
                {variants.map((v) => (
                  <li key={v.code} title={v.description || undefined}>
                    <Badge tone="drab">{v.code}</Badge> <span className="font-semibold text-ink">{v.name}</span>
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          <div className="grid items-start gap-5 md:grid-cols-2">
            {systems.map((s) => (
              <section key={s.slug} aria-labelledby={`system-${s.slug}`} className="rounded-card border border-rule bg-paper-raised p-5 shadow-card">
                <h2 id={`system-${s.slug}`} className="mb-3 text-lg font-bold text-ink">
                  {s.name}
                </h2>
                <AssemblyTree nodes={s.assemblies} />
              </section>
            ))}
          </div>
        </div>
      </ContentLayout>
    </>
  );
}

function AssemblyTree({ nodes, nested = false }: { nodes: AssemblyNode[]; nested?: boolean }) {
  return (
    <ul className={nested ? 'mt-1 ml-6 border-l border-rule pl-3' : 'divide-y divide-rule'}>
      {nodes.map((a) => (
        <li key={a.id} className={nested ? 'py-1' : 'py-2'}>
          <div className="flex flex-wrap items-baseline gap-x-3">
            <span className="w-14 shrink-0 font-mono text-xs text-ink-muted">{a.code}</span>
            <Link to={paths.catalogAssembly.getHref(a.id)} className="font-medium text-patina-700 underline decoration-patina-300 underline-offset-3 hover:decoration-patina-600">
              {a.name}
            </Link>
            <span className="text-xs text-ink-muted">{a.lineCount} lines</span>
            {a.hasDiagram ? (
              <span className="inline-flex items-center gap-1 text-xs text-drab-700">
                <Image aria-hidden="true" className="size-3.5" /> diagram
              </span>
            ) : null}
          </div>
          {a.children.length ? <AssemblyTree nodes={a.children} nested /> : null}
        </li>
      ))}
    </ul>
  );
}
