import { Download, Printer, Route } from 'lucide-react';
import { Link, useParams } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { PageSkeleton } from '@/components/layouts/page-skeleton';
import { Button, buttonClasses } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { apiPaths, paths } from '@/config/paths';
import { env } from '@/config/env';
import { useGarageVehicle } from '@/features/garage/api/get-garage-vehicle';
import { useNeeds } from '@/features/garage/api/get-needs';
import { GarageCrumbs } from '@/features/garage/components/garage-crumbs';
import { LoadProblem } from '@/features/garage/components/load-problem';
import { NeedsTable } from '@/features/garage/components/needs-table';
import { WantForm } from '@/features/garage/components/want-form';
import { vehicleTitle } from '@/features/garage/utils/garage-format';

// On paper only the list itself: the shell's header and footer, the crumbs, buttons and forms stay on screen.
const printChrome = 'print:[body:has(&)_header]:hidden print:[body:has(&)_footer]:hidden print:[body:has(&)_main]:p-0';

export function GarageNeedsRoute() {
  const { id = '' } = useParams();
  const needs = useNeeds(id);
  const vehicle = useGarageVehicle(id);
  const title = vehicle.data ? vehicleTitle(vehicle.data.vehicle) : 'Vehicle';

  if (needs.isPending) return <PageSkeleton label="Loading the needs list" />;
  if (needs.isError) {
    return (
      <ContentLayout title="Needs list" eyebrow="Garage">
        <LoadProblem error={needs.error} what="needs list" onRetry={() => void needs.refetch()} />
      </ContentLayout>
    );
  }
  const list = needs.data;
  return (
    <div className={printChrome}>
      <GarageCrumbs items={[{ label: 'Garage', to: paths.garage.getHref() }, { label: title, to: paths.garageVehicle.getHref(id) }, { label: 'Needs list' }]} />
      <ContentLayout
        title="Needs list"
        eyebrow={title}
        description="Lines marked replace, missing or wrong part (needed = quantity per assembly − usable on hand), plus wants added by hand."
        actions={
          <>
            <Button variant="secondary" className="print:hidden" onClick={() => window.print()} icon={<Printer aria-hidden="true" className="size-4" />}>
              Print
            </Button>
            <a href={`${env.VITE_API_BASE_URL}${apiPaths.garage.needsCsv(id)}`} download className={buttonClasses('secondary', 'md', 'print:hidden')}>
              <Download aria-hidden="true" className="size-4" />
              CSV
            </a>
            <Link to={paths.garagePlan.getHref(id)} className={buttonClasses('primary', 'md', 'print:hidden')}>
              <Route aria-hidden="true" className="size-4" />
              Sourcing plan
            </Link>
          </>
        }
      >
        <p className="mb-4 hidden text-sm print:block">
          Serial {list.serial} · printed {new Date().toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' })}
        </p>
        <div className="space-y-6">
          {list.notInspectedLines > 0 ? (
            <Notice tone="info" className="print:hidden">
              {list.notInspectedLines} checklist line{list.notInspectedLines === 1 ? ' is' : 's are'} not inspected yet and may hide more needs.
            </Notice>
          ) : null}
          {list.needs.length === 0 ? (
            <Notice tone="info" role="status" title="Nothing to find yet">
              Mark checklist lines replace or missing, or add a want below.
            </Notice>
          ) : (
            <NeedsTable vehicleId={id} list={list} />
          )}
          <Card className="print:hidden">
            <h2 className="mb-3 text-lg font-semibold text-ink">Add a want by hand</h2>
            <WantForm vehicleId={id} />
          </Card>
        </div>
      </ContentLayout>
    </div>
  );
}
