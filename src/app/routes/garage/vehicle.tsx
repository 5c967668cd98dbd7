import { ClipboardList, Route, Trash2 } from 'lucide-react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { toast } from 'sonner';
import { originalityTargetLabels } from '@shared/schemas/garage';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Badge } from '@/components/ui/badge';
import { Button, buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useDeleteGarageVehicle } from '@/features/garage/api/delete-garage-vehicle';
import { useGarageVehicle } from '@/features/garage/api/get-garage-vehicle';
import { GarageCrumbs } from '@/features/garage/components/garage-crumbs';
import { GarageNav } from '@/features/garage/components/garage-nav';
import { LoadProblem } from '@/features/garage/components/load-problem';
import { ProgressBar } from '@/features/garage/components/progress-bar';
import { TeardownLog } from '@/features/garage/components/teardown-log';
import { VehicleSystems } from '@/features/garage/components/vehicle-systems';
import { vehicleTitle } from '@/features/garage/utils/garage-format';

export function GarageVehicleRoute() {
  const { id = '' } = useParams();
  const detail = useGarageVehicle(id);
  const remove = useDeleteGarageVehicle();
  const navigate = useNavigate();

  if (detail.isPending) return <PageSkeleton label="Loading the vehicle" />;
  if (detail.isError) {
    return (
      <ContentLayout title="Vehicle" eyebrow="Garage">
        <LoadProblem error={detail.error} what="vehicle" onRetry={() => void detail.refetch()} />
      </ContentLayout>
    );
  }
  const { vehicle, progress } = detail.data;
  const title = vehicleTitle(vehicle);
  const onRemove = () => {
    if (!window.confirm(`Remove ${title} from your garage, with its checklist, photos, log and wants?`)) return;
    remove.mutate(vehicle.id, {
      onSuccess: () => {
        toast.success(`${title} removed`);
        navigate(paths.garage.getHref());
      },
      onError: (e) => toast.error(e.message),
    });
  };

  return (
    <>
      <GarageCrumbs items={[{ label: 'Garage', to: paths.garage.getHref() }, { label: title }]} />
      <ContentLayout
        title={title}
        eyebrow={vehicle.model.name}
        description={
          <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span>
              Serial <span className="font-mono">{vehicle.serial}</span>
              {vehicle.buildDate ? ` · built ${vehicle.buildDate}` : ' · build date not recorded'}
              {vehicle.variant ? ` · variant ${vehicle.variant}` : ''}
            </span>
            <Badge tone="drab">{originalityTargetLabels[vehicle.originalityTarget]}</Badge>
          </span>
        }
        actions={
          <>
            <Link to={paths.garageNeeds.getHref(vehicle.id)} className={buttonClasses('secondary')}>
              <ClipboardList aria-hidden="true" className="size-4" />
              Needs list
            </Link>
            <Link to={paths.garagePlan.getHref(vehicle.id)} className={buttonClasses('primary')}>
              <Route aria-hidden="true" className="size-4" />
              Sourcing plan
            </Link>
          </>
        }
      >
        <GarageNav />
        <div className="space-y-8">
          <section aria-labelledby="overall-title" className="rounded-card border border-rule bg-paper-raised p-4 shadow-card">
            <h2 id="overall-title" className="mb-2 text-label text-drab-700 uppercase">
              Teardown of the whole vehicle
            </h2>
            <ProgressBar label={`Teardown progress of ${title}`} progress={progress} showLegend />
          </section>
          <section aria-labelledby="systems-title">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="systems-title" className="text-xl font-semibold text-ink">
                Checklists by system
              </h2>
              <Link to={paths.catalogVehicle.getHref(vehicle.model.slug)} className="text-sm font-medium text-patina-700 hover:underline">
                This model in the catalog
              </Link>
            </div>
            <VehicleSystems detail={detail.data} />
          </section>
          <TeardownLog vehicleId={vehicle.id} limit={12} />
          <div className="border-t border-rule pt-6">
            <Button variant="danger" size="sm" onClick={onRemove} isLoading={remove.isPending} icon={<Trash2 aria-hidden="true" className="size-4" />}>
              Remove this vehicle
            </Button>
          </div>
        </div>
      </ContentLayout>
    </>
  );
}
