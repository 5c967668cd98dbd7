import { ShoppingBag } from 'lucide-react';
import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Badge } from '@/components/ui/badge';
import { buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { usePart } from '../api/get-part';
import { categoryLabel } from '../utils/catalog-format';
import { CatalogCrumbs } from './catalog-crumbs';
import { PartNumbers } from './part-numbers';
import { PartSpecs } from './part-specs';
import { QueryProblem } from './query-problem';
import { SafetyCautions } from './safety-cautions';
import { SupersessionChain } from './supersession-chain';

/** A part: its numbers, supersession chain, specifications, where it is used and its live listings. */
export function PartView({ id }: { id: string }) {
  const query = usePart(id);
  if (query.isPending) return <PageSkeleton label="Loading the part" />;
  if (query.isError) {
    return (
      <ContentLayout title="Part" eyebrow="Catalog">
        <QueryProblem error={query.error} what="part" onRetry={() => void query.refetch()} />
      </ContentLayout>
    );
  }
  const { part, numbers, usedIn, chain, cautions, liveListings } = query.data;
  const firstUse = usedIn[0];
  const headline = numbers[0]?.numbers[0]?.printed;

  return (
    <>
      <CatalogCrumbs
        trail={[
          { label: 'Catalog', to: paths.catalog.getHref() },
          ...(firstUse
            ? [
                { label: firstUse.vehicleName, to: paths.catalogVehicle.getHref(firstUse.vehicleSlug) },
                { label: firstUse.name, to: paths.catalogAssembly.getHref(firstUse.assemblyId) },
              ]
            : []),
          { label: part.name },
        ]}
      />
      <ContentLayout
        title={part.name}
        eyebrow={[categoryLabel(part.category), headline].filter(Boolean).join(' · ')}
        description={part.description || undefined}
        actions={
          <Link to={paths.partListings.getHref(part.id)} className={buttonClasses(liveListings > 0 ? 'primary' : 'secondary')}>
            <ShoppingBag aria-hidden="true" className="size-4" />
            {liveListings === 1 ? '1 live listing' : `${liveListings} live listings`}
          </Link>
        }
      >
        {part.safetyClass !== 'none' || part.restricted ? (
          <div className="mb-6 flex flex-wrap gap-2">
            {part.safetyClass !== 'none' ? <Badge tone="warn">{part.safetyClass} part</Badge> : null}
            {part.restricted ? <Badge tone="danger">Restricted: extra review when listed</Badge> : null}
          </div>
        ) : null}
        <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <div className="min-w-0 space-y-6">
            {cautions.length ? <SafetyCautions cautions={cautions} subject={`${part.safetyClass} part`} /> : null}
            <Card>
              <h2 className="mb-1 text-xl font-bold text-ink">Numbers</h2>
              <p className="mb-2 text-sm text-ink-muted">One part usually carries several numbers. Any of them finds it.</p>
              <PartNumbers groups={numbers} />
            </Card>
          </div>
          <div className="min-w-0 space-y-6">
            <Card>
              <h2 className="mb-3 text-xl font-bold text-ink">Specifications</h2>
              <PartSpecs part={part} />
            </Card>
            <Card>
              <h2 className="mb-3 text-xl font-bold text-ink">Used in</h2>
              {usedIn.length === 0 ? (
                <Notice tone="info">Not on any assembly's parts list.</Notice>
              ) : (
                <ul className="space-y-2 text-sm">
                  {usedIn.map((u) => (
                    <li key={`${u.assemblyId}-${u.callout}`}>
                      <Link to={paths.catalogAssembly.getHref(u.assemblyId)} className="font-medium text-patina-700 hover:underline">
                        {u.name}
                      </Link>{' '}
                      <span className="text-ink-muted">
                        ({u.code}), callout {u.callout}, qty {u.quantity}
                      </span>
                      <span className="block text-xs text-ink-muted">{u.vehicleName}</span>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
          </div>
        </div>
        {/* Full width: a chain grows sideways, one column per generation. */}
        <Card className="mt-6">
          <h2 className="mb-1 text-xl font-bold text-ink">Supersession</h2>
          <p className="mb-4 text-sm text-ink-muted">Which numbers this part replaced and what replaced it.</p>
          <SupersessionChain chain={chain} partId={part.id} />
        </Card>
      </ContentLayout>
    </>
  );
}
