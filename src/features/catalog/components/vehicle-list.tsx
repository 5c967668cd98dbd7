import { ChevronRight, Truck } from 'lucide-react';
import { Link } from 'react-router-dom';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useVehicles } from '../api/get-vehicles';
import { formatSerial } from '../utils/catalog-format';
import { QueryProblem } from './query-problem';

/** Every vehicle model in the catalog, as cards leading to its systems and assemblies. */
export function VehicleList() {
  const vehicles = useVehicles();
  if (vehicles.isPending) return <PageSkeleton label="Loading vehicle models" />;
  if (vehicles.isError) return <QueryProblem error={vehicles.error} what="vehicle models" onRetry={() => void vehicles.refetch()} />;
  if (vehicles.data.length === 0) {
    return (
      <Notice tone="info" role="status" title="No vehicle models yet">
        Administrators add vehicle models and their assemblies.
      </Notice>
    );
  }
  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {vehicles.data.map((v) => (
        <li key={v.id}>
          <Link
            to={paths.catalogVehicle.getHref(v.slug)}
            className="group flex h-full gap-4 rounded-card border border-rule bg-paper-raised p-5 shadow-card hover:border-patina-300"
          >
            <Truck aria-hidden="true" className="mt-1 size-7 shrink-0 text-drab-500" />
            <span className="min-w-0 flex-1">
              <span className="block text-label text-drab-700 uppercase">
                {v.maker} · {v.yearFrom}–{v.yearTo}
              </span>
              <span className="mt-1 block text-lg font-semibold text-ink group-hover:text-patina-700">{v.name}</span>
              <span className="mt-1 block text-sm text-ink-soft">{v.description}</span>
              <span className="mt-3 block text-xs text-ink-muted">
                Serials {v.serialPrefix}
                {formatSerial(v.serialFrom)}–{v.serialPrefix}
                {formatSerial(v.serialTo)} · {v.assemblyCount} assemblies
              </span>
            </span>
            <ChevronRight aria-hidden="true" className="size-5 self-center text-ink-muted" />
          </Link>
        </li>
      ))}
    </ul>
  );
}
