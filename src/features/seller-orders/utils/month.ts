/** "2026-03" of a date, in UTC (statements run on UTC months, like the server). */
export function monthOf(date: Date): string {
  return `${date.getUTCFullYear()}-${String(date.getUTCMonth() + 1).padStart(2, '0')}`;
}

export function isMonth(text: string | null | undefined): text is string {
  return !!text && /^\d{4}-(0[1-9]|1[0-2])$/.test(text);
}

/** The month `delta` months after `month` ("2026-01", -1 -> "2025-12"). */
export function shiftMonth(month: string, delta: number): string {
  const [y, m] = month.split('-').map(Number);
  return monthOf(new Date(Date.UTC(y, m - 1 + delta, 1)));
}

const monthName = new Intl.DateTimeFormat('en-US', { month: 'long', year: 'numeric', timeZone: 'UTC' });

/** "March 2026". */
export function monthLabel(month: string): string {
  const [y, m] = month.split('-').map(Number);
  return monthName.format(new Date(Date.UTC(y, m - 1, 1)));
}
