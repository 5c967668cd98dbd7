import { MapPin } from 'lucide-react';
import type { ShipTo } from '@shared/schemas/orders';

/** A postal address laid out as on a parcel label (name, street lines, city line, country), under a small label. */
export function PostalAddress({ address, label }: { address: ShipTo; label: string }) {
  const cityLine = [address.city, [address.state, address.postalCode].filter(Boolean).join(' ')].filter(Boolean).join(', ');
  return (
    <div className="flex gap-2 text-sm">
      <MapPin aria-hidden="true" className="mt-0.5 size-4 shrink-0 text-drab-700" />
      <div>
        <p className="text-label text-ink-muted uppercase">{label}</p>
        <address className="leading-snug not-italic">
          {[address.name, address.line1, address.line2, cityLine, address.country]
            .filter((x): x is string => Boolean(x))
            .map((line, i) => (
              <span key={i} className="block">
                {line}
              </span>
            ))}
        </address>
      </div>
    </div>
  );
}
