import { Link, useParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { buttonClasses } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useGarageVehicle } from '@/features/garage/api/get-garage-vehicle';
import { GarageCrumbs } from '@/features/garage/components/garage-crumbs';
import { SourcingPlanner } from '@/features/garage/components/sourcing-plan';
import { vehicleTitle } from '@/features/garage/utils/garage-format';

export function GaragePlanRoute() {
  const { id = '' } = useParams();
  const vehicle = useGarageVehicle(id);
  const title = vehicle.data ? vehicleTitle(vehicle.data.vehicle) : 'Vehicle';
  return (
    <>
      <GarageCrumbs items={[{ label: 'Garage', to: paths.garage.getHref() }, { label: title, to: paths.garageVehicle.getHref(id) }, { label: 'Sourcing plan' }]} />
      <ContentLayout
        title="Sourcing plan"
        eyebrow={title}
        description="Live listings across sellers that cover the needs list at the lowest landed cost."
        actions={
          <Link to={paths.garageNeeds.getHref(id)} className={buttonClasses('secondary')}>
            Needs list
          </Link>
        }
      >
        <SourcingPlanner vehicleId={id} />
      </ContentLayout>
    </>
  );
}
