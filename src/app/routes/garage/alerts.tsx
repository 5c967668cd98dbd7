import { ContentLayout } from '@/components/layouts/content-layout';
import { Card } from '@/components/ui/card';
import { AlertForm, AlertList } from '@/features/garage/components/alerts-panel';
import { GarageNav } from '@/features/garage/components/garage-nav';

export function GarageAlertsRoute() {
  return (
    <ContentLayout
      title="Wanted alerts"
      eyebrow="Garage"
      description="Watch a part number in the condition you want, up to a price. When a matching listing goes live you get a notice here and an e-mail."
    >
      <GarageNav />
      <div className="space-y-6">
        <Card>
          <h2 className="mb-3 text-lg font-semibold text-ink">Watch a part</h2>
          <AlertForm />
        </Card>
        <AlertList />
      </div>
    </ContentLayout>
  );
}
