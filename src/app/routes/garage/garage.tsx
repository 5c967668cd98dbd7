import { ComingSoon } from '@/components/layouts/coming-soon';

export function GarageRoute() {
  return (
    <ComingSoon title="Garage" eyebrow="Your vehicles">
      <p>Record your vehicles by model, serial and build date, track each teardown, and turn what is missing into a needs list.</p>
    </ComingSoon>
  );
}
