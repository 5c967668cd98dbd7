import { ComingSoon } from '@/components/layouts/coming-soon';

export function CatalogRoute() {
  return (
    <ComingSoon title="Catalog" eyebrow="Vehicle · system · assembly">
      <p>Browse by vehicle model, then system and assembly, down to each line of the parts list.</p>
    </ComingSoon>
  );
}
