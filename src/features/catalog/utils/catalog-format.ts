import { partNumberKindLabels } from '@shared/schemas/catalog';
import type { Applicability } from '../api/catalog-schemas';

/** Serials grouped with commas, as the server writes them in its reasons ("5,000"). */
export function formatSerial(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** "Serials 1,001–4,999 · built from 1953-06 · variants W" — or "All" when the line has no limits. */
export function applicabilityText(a: Applicability): string {
  const parts: string[] = [];
  if (a.serialFrom !== null && a.serialTo !== null) parts.push(`Serials ${formatSerial(a.serialFrom)}–${formatSerial(a.serialTo)}`);
  else if (a.serialFrom !== null) parts.push(`Serials from ${formatSerial(a.serialFrom)}`);
  else if (a.serialTo !== null) parts.push(`Serials up to ${formatSerial(a.serialTo)}`);
  if (a.builtFrom && a.builtTo) parts.push(`built ${a.builtFrom} to ${a.builtTo}`);
  else if (a.builtFrom) parts.push(`built from ${a.builtFrom}`);
  else if (a.builtTo) parts.push(`built up to ${a.builtTo}`);
  if (a.variants?.length) parts.push(`${a.variants.length > 1 ? 'variants' : 'variant'} ${a.variants.join(', ')}`);
  if (!parts.length) return 'All';
  const text = parts.join(' · ');
  return text[0].toUpperCase() + text.slice(1);
}

/** Callouts sort as numbers where they are numbers ("2" before "10"), then by text ("4A" after "4"). */
export function compareCallouts(a: string, b: string): number {
  return a.localeCompare(b, 'en', { numeric: true, sensitivity: 'base' });
}

export function numberKindLabel(kind: string): string {
  return (partNumberKindLabels as Record<string, string>)[kind] ?? kind;
}

/** "master_cylinder" -> "Master cylinder". */
export function categoryLabel(category: string): string {
  const text = category.replace(/_/g, ' ');
  return text[0]?.toUpperCase() + text.slice(1);
}

export function formatGrams(g: number): string {
  return g >= 1000 ? `${(g / 1000).toLocaleString('en-GB', { maximumFractionDigits: 2 })} kg` : `${g} g`;
}
