/**
 * National Stock Numbers.
 * source: NATO Codification System, via REFERENCES.md — NSN = Federal Supply Class (4 digits) + NIIN
 * (9 digits), printed 1234-56-789-0123; NIIN = 2-digit National Codification Bureau code + 7 digits;
 * the first two FSC digits are the Federal Supply Group.
 */
import { supplyClassName, supplyGroupName } from './standards/supply-classes';

export const NCB_SOURCE = 'NATO codification publications, via REFERENCES.md';

/** National Codification Bureau codes -> country. source: NATO codification publications, via REFERENCES.md */
export const ncbCountries: Readonly<Record<string, string>> = {
  '00': 'United States',
  '01': 'United States',
  '12': 'Germany',
  '13': 'Belgium',
  '14': 'France',
  '15': 'Italy',
  '20': 'Canada',
  '21': 'Canada',
  '22': 'Denmark',
  '30': 'Japan',
  '66': 'Australia',
  '99': 'United Kingdom',
};

export interface Nsn {
  /** The 13 digits, no separators. */
  digits: string;
  /** Printed form 1234-56-789-0123. */
  formatted: string;
  fsc: string;
  fsg: string;
  niin: string;
  ncb: string;
  country: string | null;
  supplyClassName: string | null;
  supplyGroupName: string | null;
  /** Things worth telling the person that do not make the number invalid. */
  warnings: Array<'unknown_supply_class' | 'unknown_ncb'>;
}

export type NsnErrorCode = 'empty' | 'non_digit' | 'wrong_length';

export class NsnError extends Error {
  override readonly name = 'NsnError';
  constructor(
    readonly code: NsnErrorCode,
    message: string,
  ) {
    super(message);
  }
}

export type NsnResult = { ok: true; value: Nsn } | { ok: false; error: NsnError };

/** Parses an NSN typed in any shape: 13 digits with or without hyphens, spaces or dots, optional "NSN" prefix. */
export function parseNsn(input: string): NsnResult {
  const s = input.trim().replace(/^NSN[:\s]*/i, '');
  if (s === '') return { ok: false, error: new NsnError('empty', 'Type the 13 digits of the stock number.') };
  const bad = s.replace(/[\s\-.]/g, '').match(/[^0-9]/);
  if (bad) {
    return {
      ok: false,
      error: new NsnError('non_digit', `A stock number has digits only; "${bad[0]}" is not a digit.`),
    };
  }
  const digits = s.replace(/[^0-9]/g, '');
  if (digits.length !== 13) {
    const hint = digits.length === 9 ? ' Nine digits look like a NIIN alone: add the 4-digit supply class.' : '';
    return {
      ok: false,
      error: new NsnError('wrong_length', `A stock number has 13 digits; this one has ${digits.length}.${hint}`),
    };
  }
  const fsc = digits.slice(0, 4);
  const niin = digits.slice(4);
  const ncb = niin.slice(0, 2);
  const fsg = fsc.slice(0, 2);
  const country = Object.hasOwn(ncbCountries, ncb) ? ncbCountries[ncb] : null;
  const className = supplyClassName(fsc);
  const warnings: Nsn['warnings'] = [];
  if (className === null) warnings.push('unknown_supply_class');
  if (country === null) warnings.push('unknown_ncb');
  return {
    ok: true,
    value: {
      digits,
      formatted: `${fsc}-${niin.slice(0, 2)}-${niin.slice(2, 5)}-${niin.slice(5)}`,
      fsc,
      fsg,
      niin,
      ncb,
      country,
      supplyClassName: className,
      supplyGroupName: supplyGroupName(fsg),
      warnings,
    },
  };
}

/** Formats as 1234-56-789-0123; throws NsnError on invalid input. */
export function formatNsn(input: string): string {
  const r = parseNsn(input);
  if (!r.ok) throw r.error;
  return r.value.formatted;
}

export function isNsn(input: string): boolean {
  return parseNsn(input).ok;
}
