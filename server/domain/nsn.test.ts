import { describe, expect, it } from 'vitest';
import { formatNsn, isNsn, parseNsn } from './nsn';

// Stock numbers below are invented; only their shape is real.

describe('parseNsn', () => {
  it('when 13 digits are typed with or without separators, then they format as 1234-56-789-0123', () => {
    for (const s of ['5315001234567', '5315-00-123-4567', '5315 00 123 4567', ' 5315.00.123.4567 ', 'NSN 5315-00-123-4567', 'nsn:5315001234567'])
      expect(formatNsn(s), s).toBe('5315-00-123-4567');
  });

  it('when parsed, then FSC, FSG, NIIN and NCB are split out', () => {
    const r = parseNsn('2530-01-234-5678');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value).toMatchObject({ fsc: '2530', fsg: '25', niin: '012345678', ncb: '01', digits: '2530012345678' });
  });

  it('when the NCB code is known, then the country is named', () => {
    const r = parseNsn('5310-99-123-4567');
    expect(r.ok && r.value.country).toBe('United Kingdom');
  });

  it('when the supply class is known, then its name is given', () => {
    const r = parseNsn('5315-00-123-4567');
    expect(r.ok && r.value.supplyClassName).toBe('Nails, Machine Keys, and Pins');
    expect(r.ok && r.value.warnings).toEqual([]);
  });

  it('when the supply class is not in our table, then it still parses with a null class name and a warning', () => {
    const r = parseNsn('9999-00-123-4567');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.supplyClassName).toBeNull();
    expect(r.value.warnings).toContain('unknown_supply_class');
  });

  it('when the NCB code is not in our table, then country is null with a warning', () => {
    const r = parseNsn('5315-45-123-4567');
    expect(r.ok && r.value.country).toBeNull();
    expect(r.ok && r.value.warnings).toContain('unknown_ncb');
  });

  it('when the length is wrong, then the error says how many digits there are', () => {
    const r = parseNsn('5315-00-123-456');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('wrong_length');
      expect(r.error.message).toContain('12');
    }
  });

  it('when only 9 digits are given, then the error hints at a NIIN alone', () => {
    const r = parseNsn('00-123-4567');
    expect(!r.ok && r.error.message).toMatch(/NIIN/);
  });

  it('when a letter is typed, then it is a non_digit error naming the letter', () => {
    const r = parseNsn('5315-OO-123-4567');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('non_digit');
      expect(r.error.message).toContain('"O"');
    }
  });

  it('when empty, then it is an empty error; isNsn is false', () => {
    const r = parseNsn('   ');
    expect(!r.ok && r.error.code).toBe('empty');
    expect(isNsn('')).toBe(false);
    expect(isNsn('5315001234567')).toBe(true);
  });

  it('when formatNsn gets an invalid number, then it throws', () => {
    expect(() => formatNsn('12')).toThrow(/13 digits/);
  });
});
