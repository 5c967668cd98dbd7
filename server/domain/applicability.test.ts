import { describe, expect, it } from 'vitest';
import {
  ApplicabilityError,
  dateSpan,
  decideApplicability,
  filterByApplicability,
  formatSerial,
  overlappingApplicability,
  parseSerial,
  type Applicability,
  type ApplicabilityLine,
} from './applicability';

// Bill-of-materials lines and vehicles are invented for the tests.

interface Line extends ApplicabilityLine {
  id: string;
}
const line = (id: string, applicability: Applicability | null, callout: string | null = null, assemblyId?: string): Line => ({
  id,
  callout,
  applicability,
  ...(assemblyId ? { assemblyId } : {}),
});

describe('filterByApplicability: serial ranges', () => {
  const lines = [
    line('early', { serialFrom: 1, serialTo: 4999 }),
    line('late', { serialFrom: 5000 }),
    line('all', null),
    line('upTo', { serialTo: 7000 }),
  ];

  it('when the vehicle serial is past an early range, then the early line is excluded with a readable reason', () => {
    const r = filterByApplicability(lines, { serial: 6210 });
    expect(r.included.map((l) => l.id)).toEqual(['late', 'all', 'upTo']);
    expect(r.excluded).toEqual([{ line: lines[0], reasons: ['applies to serials 1–4,999; this vehicle is 6,210'] }]);
    expect(r.uncertain).toEqual([]);
  });

  it('when the serial is exactly on a range bound, then the line applies (bounds are inclusive)', () => {
    expect(filterByApplicability(lines, { serial: 4999 }).included.map((l) => l.id)).toContain('early');
    expect(filterByApplicability(lines, { serial: 5000 }).included.map((l) => l.id)).toEqual(['late', 'all', 'upTo']);
  });

  it('when a range is open at one end, then the reason says "from ... on" or "up to"', () => {
    const r = filterByApplicability(lines, { serial: 12000 });
    expect(r.excluded.find((x) => x.line.id === 'upTo')!.reasons[0]).toBe(
      'applies to serials up to 7,000; this vehicle is 12,000',
    );
    const r2 = filterByApplicability(lines, { serial: 10 });
    expect(r2.excluded.find((x) => x.line.id === 'late')!.reasons[0]).toBe(
      'applies to serials from 5,000 on; this vehicle is 10',
    );
  });

  it('when the vehicle serial is unknown, then ranged lines stay in with a note', () => {
    const r = filterByApplicability(lines, {});
    expect(r.included).toHaveLength(4);
    expect(r.uncertain.map((u) => u.line.id)).toEqual(['early', 'late', 'upTo']);
    expect(r.uncertain[0].notes[0]).toMatch(/serial is not recorded/);
  });

  it('when a serial range is inverted in the data, then the line stays in with a data-error note', () => {
    const d = decideApplicability({ serialFrom: 5000, serialTo: 1 }, { serial: 300 });
    expect(d.verdict).toBe('unknown');
    expect(d.notes[0]).toMatch(/inverted/);
  });
});

describe('filterByApplicability: build dates and variants', () => {
  it('when the vehicle was built after the range, then the line is excluded naming both dates', () => {
    const d = decideApplicability({ builtFrom: '1942-01-01', builtTo: '1943-06-30' }, { buildDate: '1944-02-10' });
    expect(d).toEqual({
      verdict: 'excluded',
      reasons: ['applies to vehicles built 1942-01-01 to 1943-06-30; this vehicle was built 1944-02-10'],
      notes: [],
    });
  });

  it('when only the build month is known and the range ends inside that month, then it cannot be decided', () => {
    const d = decideApplicability({ builtTo: '1943-06-15' }, { buildDate: '1943-06' });
    expect(d.verdict).toBe('unknown');
    expect(d.notes[0]).toMatch(/not exact enough/);
  });

  it('when only the build year is known and the year lies wholly inside the range, then the line applies', () => {
    expect(decideApplicability({ builtFrom: '1942', builtTo: '1944-12' }, { buildDate: '1943' }).verdict).toBe('applies');
  });

  it('when a range bound is only a year, then it covers the whole year at either end', () => {
    expect(decideApplicability({ builtTo: '1943' }, { buildDate: '1943-12-31' }).verdict).toBe('applies');
    expect(decideApplicability({ builtFrom: '1943' }, { buildDate: '1943-01-01' }).verdict).toBe('applies');
  });

  it('when the variant differs, then the line is excluded; matching ignores case and spaces', () => {
    const a = { variants: ['GK-2A', 'GK-2B'] };
    expect(decideApplicability(a, { variant: ' gk-2b ' }).verdict).toBe('applies');
    expect(decideApplicability(a, { variant: 'GK-3' }).reasons).toEqual(['applies to variant GK-2A, GK-2B; this vehicle is GK-3']);
    expect(decideApplicability(a, {}).verdict).toBe('unknown');
    expect(decideApplicability({ variants: [] }, { variant: 'GK-3' }).verdict).toBe('applies');
  });

  it('when several facts rule a line out, then every reason is given', () => {
    const d = decideApplicability({ serialTo: 100, variants: ['X'] }, { serial: 200, variant: 'Y' });
    expect(d.reasons).toHaveLength(2);
  });

  it('when one fact excludes and another is unknown, then the line is excluded', () => {
    const d = decideApplicability({ serialTo: 100, builtTo: '1943' }, { serial: 200 });
    expect(d.verdict).toBe('excluded');
    expect(d.notes).toHaveLength(1);
  });

  it('when a date is malformed, then an ApplicabilityError says which value', () => {
    expect(() => decideApplicability({ builtFrom: '6/1943' }, { buildDate: '1943' })).toThrow(ApplicabilityError);
    expect(() => dateSpan('1943-02-30')).toThrow(/not a day/);
    expect(() => dateSpan('1943-13')).toThrow(/no month/);
  });

  it('when the vehicle serial is not a number, then an ApplicabilityError points to parseSerial', () => {
    expect(() => decideApplicability(null, { serial: Number.NaN })).toThrow(/parseSerial/);
  });

  it('when dateSpan gets a month, then it spans the month including leap days', () => {
    expect(dateSpan('1944-02')).toEqual({ first: '1944-02-01', last: '1944-02-29' });
    expect(dateSpan('1943-02')).toEqual({ first: '1943-02-01', last: '1943-02-28' });
  });
});

describe('parseSerial and formatSerial', () => {
  it('when a printed serial has a prefix, then the last run of digits is the serial (our rule)', () => {
    expect(parseSerial('AX-06210')).toBe(6210);
    expect(parseSerial('G503-12345')).toBe(12345);
    expect(parseSerial('20345-B')).toBe(20345);
    expect(parseSerial(' 42 ')).toBe(42);
  });

  it('when a serial has no digits or too many, then it is null', () => {
    expect(parseSerial('unknown')).toBeNull();
    expect(parseSerial('9'.repeat(20))).toBeNull();
  });

  it('when a serial is formatted, then thousands are grouped with commas', () => {
    expect([formatSerial(6210), formatSerial(999), formatSerial(1234567)]).toEqual(['6,210', '999', '1,234,567']);
  });
});

describe('overlappingApplicability', () => {
  it('when two lines of one callout overlap in serials, then the pair is reported', () => {
    const lines = [line('a', { serialFrom: 1, serialTo: 5000 }, '12'), line('b', { serialFrom: 4000 }, '12')];
    const o = overlappingApplicability(lines);
    expect(o).toHaveLength(1);
    expect(o[0].lines.map((l) => l.id)).toEqual(['a', 'b']);
    expect(o[0].message).toMatch(/Callout 12/);
  });

  it('when ranges only touch end to start, then there is no overlap', () => {
    const lines = [line('a', { serialTo: 4999 }, '12'), line('b', { serialFrom: 5000 }, '12')];
    expect(overlappingApplicability(lines)).toEqual([]);
  });

  it('when serials overlap but the variants differ, then there is no overlap', () => {
    const lines = [line('a', { serialTo: 5000, variants: ['X'] }, '3'), line('b', { serialTo: 5000, variants: ['Y'] }, '3')];
    expect(overlappingApplicability(lines)).toEqual([]);
  });

  it('when one line is for all variants and another for one, then they overlap for that variant', () => {
    const lines = [line('a', null, '3'), line('b', { variants: ['gk-2a'] }, '3')];
    expect(overlappingApplicability(lines)[0].message).toMatch(/GK-2A/);
  });

  it('when build dates do not overlap, then there is no overlap even if serials do', () => {
    const lines = [line('a', { builtTo: '1943-06' }, '7'), line('b', { builtFrom: '1943-07-01' }, '7')];
    expect(overlappingApplicability(lines)).toEqual([]);
  });

  it('when lines differ in callout or assembly, or have none, then they are not compared', () => {
    const lines = [line('a', null, '1', 'asm1'), line('b', null, '1', 'asm2'), line('c', null, '2', 'asm1'), line('d', null), line('e', null)];
    expect(overlappingApplicability(lines)).toEqual([]);
  });
});
