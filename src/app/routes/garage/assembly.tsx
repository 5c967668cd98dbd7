import { Link, useParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useChecklist } from '@/features/garage/api/get-checklist';
import { useGarageVehicle } from '@/features/garage/api/get-garage-vehicle';
import { GarageCrumbs } from '@/features/garage/components/garage-crumbs';
import { LabelsPanel } from '@/features/garage/components/labels-panel';
import { LoadProblem } from '@/features/garage/components/load-problem';
import { TeardownChecklist } from '@/features/garage/components/teardown-checklist';
import { TeardownLog } from '@/features/garage/components/teardown-log';
import { vehicleTitle } from '@/features/garage/utils/garage-format';

export function GarageAssemblyRoute() {
  const { id = '', assemblyId = '' } = useParams();
  const checklist = useChecklist(id, assemblyId);
  // For the crumbs only; the checklist does not wait for it.
  const vehicle = useGarageVehicle(id);
  const title = vehicle.data ? vehicleTitle(vehicle.data.vehicle) : 'Vehicle';

  if (checklist.isPending) return <PageSkeleton label="Loading the checklist" />;
  if (checklist.isError) {
    return (
      <ContentLayout title="Checklist" eyebrow="Garage">
        <LoadProblem error={checklist.error} what="checklist" onRetry={() => void checklist.refetch()} />
      </ContentLayout>
    );
  }
  const c = checklist.data;
  return (
    <>
      <GarageCrumbs
        items={[
          { label: 'Garage', to: paths.garage.getHref() },
          { label: title, to: paths.garageVehicle.getHref(id) },
          ...(c.parent ? [{ label: c.parent.name, to: paths.garageAssembly.getHref(id, c.parent.id) }] : []),
          { label: c.assembly.name },
        ]}
      />
      <ContentLayout
        title={c.assembly.name}
        eyebrow={`${c.system.name} · teardown checklist`}
        description={
          <>
            Lines that apply to serial <span className="font-mono">{c.serial}</span>. Mark each piece as you take it off.
          </>
        }
        actions={
          <>
            <Link to={paths.catalogAssembly.getHref(c.assembly.id, { serial: c.serial })} className={buttonClasses('ghost')}>
              In the catalog
            </Link>
            <Link to={paths.garageNeeds.getHref(id)} className={buttonClasses('secondary')}>
              Needs list
            </Link>
          </>
        }
      >
        {c.children.length ? (
          <nav aria-label="Sub-assemblies" className="mb-5 flex flex-wrap items-center gap-2 text-sm">
            <span className="text-ink-muted">Sub-assemblies:</span>
            {c.children.map((ch) => (
              <Link key={ch.id} to={paths.garageAssembly.getHref(id, ch.id)} className={buttonClasses('secondary', 'sm')}>
                {ch.name}
              </Link>
            ))}
          </nav>
        ) : null}
        <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_18rem]">
          <TeardownChecklist checklist={c} />
          <aside className="space-y-5">
            <LabelsPanel vehicleId={id} assemblyId={c.assembly.id} />
            <TeardownLog vehicleId={id} limit={6} compact />
          </aside>
        </div>
      </ContentLayout>
    </>
  );
}
