import { ContentLayout } from '@/components/layouts/content-layout';
import { GarageNav } from '@/features/garage/components/garage-nav';
import { NoticesList } from '@/features/garage/components/notices-list';

export function GarageNoticesRoute() {
  return (
    <ContentLayout title="Notices" eyebrow="Garage" description="Wanted parts that were listed, newest first.">
      <GarageNav />
      <NoticesList />
    </ContentLayout>
  );
}
