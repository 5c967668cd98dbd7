import type { ShipTo } from '@shared/schemas/orders';

/** A postal address laid out as on a parcel label: name, street lines, city line, country. */
export function PostalAddress({ address, className }: { address: ShipTo; className?: string }) {
  const cityLine = [address.city, [address.state, address.postalCode].filter(Boolean).join(' ')].filter(Boolean).join(', ');
  return (
    <address className={className ?? 'text-sm leading-snug not-italic'}>
      {[address.name, address.line1, address.line2, cityLine, address.country]
        .filter((x): x is string => Boolean(x))
        .map((line, i) => (
          <span key={i} className="block">
            {line}
          </span>
        ))}
    </address>
  );
}
