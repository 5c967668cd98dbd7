import { ChevronRight, ClipboardCheck, ListChecks, NotebookPen, Store } from 'lucide-react';
import { Link } from 'react-router-dom';
import { ContentLayout } from '@/components/layouts/content-layout';
import { paths } from '@/config/paths';

const sections = [
  {
    to: paths.admin.sellerApplications.getHref(),
    Icon: Store,
    title: 'Seller applications',
    text: 'Approve or reject people who want to sell.',
  },
  {
    to: paths.admin.listings.getHref(),
    Icon: ListChecks,
    title: 'Listing review',
    text: 'Approve, send back or reject listings waiting for review; approve unflagged ones in bulk.',
  },
  {
    to: paths.admin.catalog.getHref(),
    Icon: NotebookPen,
    title: 'Catalog editor',
    text: 'Parts and their numbers, supersessions, assemblies and parts-list lines.',
  },
  {
    to: paths.admin.catalogQuality.getHref(),
    Icon: ClipboardCheck,
    title: 'Catalog data quality',
    text: 'Supersession loops, numbers on several parts, unused parts, overlapping lines.',
  },
];

export function AdminIndexRoute() {
  return (
    <ContentLayout title="Admin" eyebrow="Administration" description="Keep the catalog right and the marketplace honest.">
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {sections.map(({ to, Icon, title, text }) => (
          <li key={to}>
            <Link
              to={to}
              className="group flex h-full items-start gap-4 rounded-card border border-rule bg-paper-raised p-5 shadow-card hover:border-patina-300"
            >
              <Icon aria-hidden="true" className="size-6 shrink-0 text-patina-600" />
              <span className="flex-1">
                <span className="block font-semibold text-ink group-hover:text-patina-700">{title}</span>
                <span className="mt-1 block text-sm text-ink-soft">{text}</span>
              </span>
              <ChevronRight aria-hidden="true" className="size-5 text-ink-muted" />
            </Link>
          </li>
        ))}
      </ul>
    </ContentLayout>
  );
}
