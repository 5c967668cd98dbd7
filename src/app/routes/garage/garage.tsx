import { Plus } from 'lucide-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useGarageVehicles } from '@/features/garage/api/get-garage-vehicles';
import { GarageNav } from '@/features/garage/components/garage-nav';
import { LoadProblem } from '@/features/garage/components/load-problem';
import { VehicleForm } from '@/features/garage/components/vehicle-form';
import { VehicleList } from '@/features/garage/components/vehicle-list';
import { vehicleTitle } from '@/features/garage/utils/garage-format';

export function GarageRoute() {
  const vehicles = useGarageVehicles();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const empty = vehicles.data?.length === 0;
  return (
    <ContentLayout
      title="Your garage"
      eyebrow="Garage"
      description="Your vehicles by model, serial and build date. Each one's checklist shows only the parts that apply to it."
      actions={
        vehicles.data && !empty && !adding ? (
          <Button onClick={() => setAdding(true)} icon={<Plus aria-hidden="true" className="size-4" />}>
            Add a vehicle
          </Button>
        ) : null
      }
    >
      <GarageNav />
      {vehicles.isPending ? (
        <PageSkeleton label="Loading your vehicles" />
      ) : vehicles.isError ? (
        <LoadProblem error={vehicles.error} what="vehicles" onRetry={() => void vehicles.refetch()} />
      ) : (
        <div className="space-y-8">
          {adding || empty ? (
            <Card>
              <h2 className="mb-1 text-xl font-semibold text-ink">Add a vehicle</h2>
              <p className="mb-5 text-sm text-ink-soft">The serial and build date decide which parts apply: early and late production differ.</p>
              <VehicleForm
                onCreated={(v) => {
                  toast.success(`${vehicleTitle(v)} is in your garage`);
                  navigate(paths.garageVehicle.getHref(v.id));
                }}
              />
              {!empty ? (
                <Button variant="ghost" className="mt-3" onClick={() => setAdding(false)}>
                  Cancel
                </Button>
              ) : null}
            </Card>
          ) : null}
          {!empty ? <VehicleList vehicles={vehicles.data} /> : null}
        </div>
      )}
    </ContentLayout>
  );
}
