import { describe, expect, it } from 'vitest';
import { basicPitchDiameter, formatInchFraction, parseInches, parseThread, threadFigures } from './unified-threads';

describe('parseInches', () => {
  it('when inches are printed as fractions, mixed numbers or decimals, then they parse to numbers', () => {
    expect(parseInches('3/16')).toBe(0.1875);
    expect(parseInches('1-1/4')).toBe(1.25);
    expect(parseInches('1 1/4')).toBe(1.25);
    expect(parseInches('3/16"')).toBe(0.1875);
    expect(parseInches('3/16 in')).toBe(0.1875);
    expect(parseInches('.25')).toBe(0.25);
    expect(parseInches(0.5)).toBe(0.5);
  });

  it('when the value is not a positive length, then it is null', () => {
    for (const v of ['', 'abc', '0', '3/0', '-1', 0, -2, Number.NaN]) expect(parseInches(v), String(v)).toBeNull();
  });
});

describe('formatInchFraction', () => {
  it('when a value is a power-of-two fraction, then it prints as the reduced fraction', () => {
    expect([0.15625, 0.625, 1.25, 1, 0.75].map(formatInchFraction)).toEqual(['5/32', '5/8', '1-1/4', '1', '3/4']);
  });

  it('when no fraction up to 1/64 fits, then it prints as a decimal', () => {
    expect(formatInchFraction(0.19)).toBe('0.19');
  });
});

describe('parseThread', () => {
  it('when the series is typed, then it is kept; when not, it is named from the pitch', () => {
    expect(parseThread('3/8-24 UNF')).toMatchObject({ ok: true, value: { designation: '3/8-24 UNF', majorIn: 0.375, tpi: 24 } });
    expect(parseThread('1/4-20')).toMatchObject({ ok: true, value: { designation: '1/4-20 UNC', series: 'UNC' } });
    expect(parseThread('7/16 - 24')).toMatchObject({ ok: true, value: { designation: '7/16-24', series: null } });
  });

  it('when a numbered size is typed, then its major diameter comes from the formula and is marked from memory', () => {
    const r = parseThread('#10-32');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.majorIn).toBeCloseTo(0.19, 6);
    expect(r.value).toMatchObject({ size: '#10', series: 'UNF', majorFromMemory: true });
    expect(parseThread('No. 10-24 UNC-2A')).toMatchObject({ ok: true, value: { series: 'UNC', fitClass: '2A' } });
  });

  it('when a whole-inch size is typed, then it parses', () => {
    expect(parseThread('1-8 UNC')).toMatchObject({ ok: true, value: { majorIn: 1, tpi: 8, designation: '1-8 UNC' } });
  });

  it('when the typed series does not match the pitch, then it is an error naming the right pitch', () => {
    const r = parseThread('3/8-24 UNC');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/16 threads per inch/);
  });

  it('when the text is not a thread, then it is an error', () => {
    for (const s of ['M8x1.25', 'three eighths', '#14-20', '3/8']) expect(parseThread(s).ok, s).toBe(false);
  });
});

describe('basicPitchDiameter and threadFigures', () => {
  it('when major or pitch is not positive, then it throws', () => {
    expect(() => basicPitchDiameter(0, 20)).toThrow(RangeError);
    expect(() => basicPitchDiameter(0.25, 0)).toThrow(RangeError);
  });

  it('when figures are asked for a bad designation, then it throws', () => {
    expect(() => threadFigures('nonsense')).toThrow(RangeError);
  });

  it('when figures are asked, then pitch is 1/n and the pitch diameter is rounded to 4 places', () => {
    const f = threadFigures('1/2-13');
    expect(f.pitchIn).toBeCloseTo(1 / 13, 10);
    expect(String(f.basicPitchDiameterIn).split('.')[1].length).toBeLessThanOrEqual(4);
  });
});
