/**
 * Applicability (effectivity) of bill-of-materials lines: which lines apply to one vehicle, by serial range,
 * build-date range and maker's variant. Ranges are inclusive at both ends; a missing bound is open.
 * When a vehicle fact needed to decide is unknown, the line is kept and carries a note: hiding a part that
 * may apply is worse than showing one that may not.
 */

export interface Applicability {
  serialFrom?: number | null;
  serialTo?: number | null;
  /** ISO date: YYYY, YYYY-MM or YYYY-MM-DD. */
  builtFrom?: string | null;
  builtTo?: string | null;
  /** Maker's variants the line applies to; empty or missing = all variants. */
  variants?: string[] | null;
}

export interface ApplicabilityLine {
  id?: string;
  assemblyId?: string | null;
  callout?: string | null;
  applicability?: Applicability | null;
}

export interface VehicleFacts {
  serial?: number | null;
  /** ISO date: YYYY, YYYY-MM or YYYY-MM-DD (a partly known build date). */
  buildDate?: string | null;
  variant?: string | null;
}

export type Verdict = 'applies' | 'excluded' | 'unknown';

export interface ApplicabilityDecision {
  verdict: Verdict;
  /** Why the line is excluded (verdict 'excluded'). */
  reasons: string[];
  /** Why it could not be decided (verdict 'unknown'); the line is still included. */
  notes: string[];
}

export interface FilterResult<L> {
  included: L[];
  excluded: Array<{ line: L; reasons: string[] }>;
  /** Included lines that could not be decided, with why. Each is also in `included`. */
  uncertain: Array<{ line: L; notes: string[] }>;
}

export class ApplicabilityError extends Error {
  override readonly name = 'ApplicabilityError';
}

/** Groups thousands with commas (fixed, not the server's locale) so reasons read the same everywhere. */
export function formatSerial(n: number): string {
  const sign = n < 0 ? '-' : '';
  return sign + String(Math.abs(Math.trunc(n))).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * Our rule for printed serial numbers: the last run of digits is the serial, leading zeros dropped
 * ("AX-06210" -> 6210, "G503-12345" -> 12345, "20345-B" -> 20345). Null when there is no digit or the
 * number is too large to hold exactly.
 */
export function parseSerial(printed: string): number | null {
  const runs = printed.match(/[0-9]+/g);
  if (!runs) return null;
  const n = Number(runs[runs.length - 1]);
  return Number.isSafeInteger(n) ? n : null;
}

interface DayRange {
  first: string;
  last: string;
}

const DATE_RE = /^(\d{4})(?:-(\d{2})(?:-(\d{2}))?)?$/;

/** A partial ISO date as the span of days it covers: "1943" = 1943-01-01..1943-12-31. */
export function dateSpan(value: string): DayRange {
  const m = DATE_RE.exec(value.trim());
  if (!m) throw new ApplicabilityError(`"${value}" is not a date; use YYYY, YYYY-MM or YYYY-MM-DD.`);
  const [, y, mo, d] = m;
  const year = Number(y);
  if (mo === undefined) return { first: `${y}-01-01`, last: `${y}-12-31` };
  const month = Number(mo);
  if (month < 1 || month > 12) throw new ApplicabilityError(`"${value}" has no month ${mo}.`);
  const days = new Date(Date.UTC(year, month, 0)).getUTCDate();
  if (d === undefined) return { first: `${y}-${mo}-01`, last: `${y}-${mo}-${String(days)}` };
  const day = Number(d);
  if (day < 1 || day > days) throw new ApplicabilityError(`"${value}" is not a day of that month.`);
  return { first: `${y}-${mo}-${d}`, last: `${y}-${mo}-${d}` };
}

const norm = (v: string) => v.trim().toUpperCase();

function serialText(a: Applicability): string {
  const from = a.serialFrom ?? null;
  const to = a.serialTo ?? null;
  if (from !== null && to !== null) return `serials ${formatSerial(from)}–${formatSerial(to)}`;
  if (from !== null) return `serials from ${formatSerial(from)} on`;
  return `serials up to ${formatSerial(to!)}`;
}

function builtText(a: Applicability): string {
  const from = a.builtFrom ?? null;
  const to = a.builtTo ?? null;
  if (from !== null && to !== null) return `vehicles built ${from} to ${to}`;
  if (from !== null) return `vehicles built from ${from} on`;
  return `vehicles built up to ${to!}`;
}

/** Decides one line's applicability for one vehicle. Throws ApplicabilityError on malformed dates or serial. */
export function decideApplicability(a: Applicability | null | undefined, v: VehicleFacts): ApplicabilityDecision {
  const reasons: string[] = [];
  const notes: string[] = [];
  if (v.serial !== null && v.serial !== undefined && !Number.isFinite(v.serial)) {
    throw new ApplicabilityError('The vehicle serial must be a number; use parseSerial() on a printed serial.');
  }
  if (!a) return { verdict: 'applies', reasons, notes };

  const sFrom = a.serialFrom ?? null;
  const sTo = a.serialTo ?? null;
  if (sFrom !== null || sTo !== null) {
    if (sFrom !== null && sTo !== null && sFrom > sTo) {
      notes.push(`the serial range ${formatSerial(sFrom)}–${formatSerial(sTo)} is inverted (a data error), so it cannot be checked`);
    } else if (v.serial === null || v.serial === undefined) {
      notes.push(`applies to ${serialText(a)}; this vehicle's serial is not recorded`);
    } else if ((sFrom !== null && v.serial < sFrom) || (sTo !== null && v.serial > sTo)) {
      reasons.push(`applies to ${serialText(a)}; this vehicle is ${formatSerial(v.serial)}`);
    }
  }

  const bFrom = a.builtFrom ?? null;
  const bTo = a.builtTo ?? null;
  if (bFrom !== null || bTo !== null) {
    const lo = bFrom !== null ? dateSpan(bFrom).first : null;
    const hi = bTo !== null ? dateSpan(bTo).last : null;
    if (lo !== null && hi !== null && lo > hi) {
      notes.push(`the build-date range ${bFrom} to ${bTo} is inverted (a data error), so it cannot be checked`);
    } else if (!v.buildDate) {
      notes.push(`applies to ${builtText(a)}; this vehicle's build date is not recorded`);
    } else {
      const built = dateSpan(v.buildDate);
      const outside = (lo !== null && built.last < lo) || (hi !== null && built.first > hi);
      const inside = (lo === null || built.first >= lo) && (hi === null || built.last <= hi);
      if (outside) reasons.push(`applies to ${builtText(a)}; this vehicle was built ${v.buildDate.trim()}`);
      else if (!inside) {
        notes.push(`applies to ${builtText(a)}; this vehicle's build date ${v.buildDate.trim()} is not exact enough to tell`);
      }
    }
  }

  const variants = (a.variants ?? []).map((x) => x.trim()).filter((x) => x !== '');
  if (variants.length > 0) {
    const list = variants.join(', ');
    if (!v.variant || v.variant.trim() === '') {
      notes.push(`applies to variant ${list}; this vehicle's variant is not recorded`);
    } else if (!variants.some((x) => norm(x) === norm(v.variant!))) {
      reasons.push(`applies to variant ${list}; this vehicle is ${v.variant.trim()}`);
    }
  }

  if (reasons.length > 0) return { verdict: 'excluded', reasons, notes };
  return { verdict: notes.length > 0 ? 'unknown' : 'applies', reasons, notes };
}

/** Filters bill-of-materials lines for one vehicle. Lines keep their order. */
export function filterByApplicability<L extends ApplicabilityLine>(lines: readonly L[], vehicle: VehicleFacts): FilterResult<L> {
  const result: FilterResult<L> = { included: [], excluded: [], uncertain: [] };
  for (const line of lines) {
    const d = decideApplicability(line.applicability, vehicle);
    if (d.verdict === 'excluded') {
      result.excluded.push({ line, reasons: d.reasons });
      continue;
    }
    result.included.push(line);
    if (d.verdict === 'unknown') result.uncertain.push({ line, notes: d.notes });
  }
  return result;
}

export interface ApplicabilityOverlap<L> {
  callout: string;
  lines: [L, L];
  message: string;
}

interface Span {
  lo: number | string | null;
  hi: number | string | null;
}

function overlaps(a: Span, b: Span): boolean {
  // Open bounds reach to infinity; bounds are compared as numbers or as ISO day strings, never mixed.
  if (a.hi !== null && b.lo !== null && a.hi < b.lo) return false;
  if (b.hi !== null && a.lo !== null && b.hi < a.lo) return false;
  return true;
}

function spans(a: Applicability | null | undefined) {
  return {
    serial: { lo: a?.serialFrom ?? null, hi: a?.serialTo ?? null },
    built: {
      lo: a?.builtFrom ? dateSpan(a.builtFrom).first : null,
      hi: a?.builtTo ? dateSpan(a.builtTo).last : null,
    },
    variants: (a?.variants ?? []).map(norm).filter((x) => x !== ''),
  };
}

/**
 * Data-quality check: pairs of lines with the same callout (on the same assembly, when lines carry one)
 * whose applicability overlaps — some vehicle would get both lines for one callout. Lines without a callout
 * are skipped.
 */
export function overlappingApplicability<L extends ApplicabilityLine>(lines: readonly L[]): Array<ApplicabilityOverlap<L>> {
  const groups = new Map<string, L[]>();
  for (const line of lines) {
    const callout = line.callout?.trim();
    if (!callout) continue;
    const k = `${line.assemblyId ?? ''}\u0000${callout.toUpperCase()}`;
    let g = groups.get(k);
    if (!g) groups.set(k, (g = []));
    g.push(line);
  }
  const found: Array<ApplicabilityOverlap<L>> = [];
  for (const g of groups.values()) {
    const s = g.map((l) => spans(l.applicability));
    for (let i = 0; i < g.length; i++) {
      for (let j = i + 1; j < g.length; j++) {
        const a = s[i];
        const b = s[j];
        if (!overlaps(a.serial, b.serial) || !overlaps(a.built, b.built)) continue;
        const shared =
          a.variants.length === 0 ? b.variants : b.variants.length === 0 ? a.variants : a.variants.filter((x) => b.variants.includes(x));
        if (a.variants.length > 0 && b.variants.length > 0 && shared.length === 0) continue;
        const callout = g[i].callout!.trim();
        const who = shared.length > 0 ? `variant ${shared.join(', ')}` : 'all variants';
        found.push({
          callout,
          lines: [g[i], g[j]],
          message: `Callout ${callout}: two lines apply to the same vehicles (${who}); narrow their serial, date or variant ranges.`,
        });
      }
    }
  }
  return found;
}
