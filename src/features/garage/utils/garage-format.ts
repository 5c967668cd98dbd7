import type { TeardownStatus } from '@shared/schemas/garage';

/*
 * Small formatters of the garage. formatCents repeats the listings feature's one-liner on purpose: a feature
 * does not import another feature's internals.
 */

export { formatCents } from '@/lib/money';

/** "42.5", "$1,234.50" -> cents, read as text so no floating point creeps in; null when not an amount. */
export function parseDollarsToCents(text: string): number | null {
  const m = text.replace(/[\s,]/g, '').replace(/^\$/, '').match(/^(\d{1,9})(?:\.(\d{0,2}))?$/);
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
}

const dateTime = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "4 Mar 2025, 14:05" from an ISO timestamp; the raw text when it does not parse. */
export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : dateTime.format(d);
}

/** Statuses whose line can put units on the needs list (server/domain/needs.ts neededForLine). */
export const needStatuses: readonly TeardownStatus[] = ['replace', 'missing', 'wrong_part'];

/** needed = quantity per assembly - usable on hand, never below zero (same rule as the server's). */
export function neededUnits(status: TeardownStatus, quantityPerAssembly: number, usableOnHand: number): number {
  return needStatuses.includes(status) ? Math.max(0, quantityPerAssembly - usableOnHand) : 0;
}

/** Short words for the status chips, so six fit on one row; the full words are the shared labels. */
export const statusShortLabels: Record<TeardownStatus, string> = {
  not_inspected: 'Not inspected',
  reuse: 'Reuse',
  refurbish: 'Refurbish',
  replace: 'Replace',
  missing: 'Missing',
  wrong_part: 'Wrong part',
};

/** Colour of each status: kept parts read calm, parts to buy read loud. */
export const statusTone: Record<TeardownStatus, { dot: string; checked: string; bar: string }> = {
  not_inspected: { dot: 'bg-rule-strong', checked: 'border-ink-muted bg-paper-sunk text-ink', bar: 'bg-rule-strong' },
  reuse: { dot: 'bg-ok', checked: 'border-ok bg-ok-soft text-ok', bar: 'bg-ok' },
  refurbish: { dot: 'bg-info', checked: 'border-info bg-info-soft text-info', bar: 'bg-info' },
  replace: { dot: 'bg-warn', checked: 'border-warn bg-warn-soft text-warn', bar: 'bg-warn' },
  missing: { dot: 'bg-danger', checked: 'border-danger bg-danger-soft text-danger', bar: 'bg-danger' },
  wrong_part: { dot: 'bg-drab-700', checked: 'border-drab-700 bg-drab-100 text-drab-900', bar: 'bg-drab-700' },
};

/** Reasons the sourcing plan gives for a need it cannot fill (server/domain/sourcing-plan.ts). */
export const unfilledReasonLabels: Record<string, string> = {
  no_listing: 'No live listing',
  not_enough_stock: 'Not enough stock',
  condition_policy: 'None in the wanted condition',
  does_not_ship: 'Does not ship to you',
};

/** Listing condition codes in a few words (the trade's terms, DOMAIN.md "Condition and originality"). */
export const conditionShortLabels: Record<string, string> = {
  nos: 'NOS',
  nors: 'NORS',
  used_original: 'Used original',
  rebuilt: 'Rebuilt',
  reproduction: 'Reproduction',
  core: 'Core',
};

/**
 * One short caution line per safety class, shown on each such checklist line (the assembly's full cautions sit
 * at the top). Source: /work/shared/DOMAIN.md "Safety rules of the trade" (common practice, no published source).
 */
export const safetyLine: Record<string, string> = {
  brake: 'Brake work: have it inspected by a qualified mechanic before road use; replace old rubber and crush washers.',
  steering: 'Steering work: have it inspected by a qualified mechanic before road use; fit new cotter pins.',
  suspension: 'Suspension work: springs store energy; support the vehicle on jack stands, never on a jack alone.',
};

/** "KV4-1234" style title of a garage vehicle: its nickname, else the model and serial. */
export function vehicleTitle(v: { nickname: string; serial: string; model: { name: string } }): string {
  return v.nickname ? v.nickname : `${v.model.name} ${v.serial}`;
}
