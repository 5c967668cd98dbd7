import { describe, expect, it } from 'vitest';
import { importTemplate, parseCsv, parseDollars, suggestMapping } from './listing-import';

describe('CSV import helpers', () => {
  it('when dollar amounts are parsed, then cents are exact and odd shapes are refused', () => {
    expect(parseDollars('12')).toBe(1200);
    expect(parseDollars('12.5')).toBe(1250);
    expect(parseDollars('$1,234.56')).toBe(123456);
    expect(parseDollars('0.29')).toBe(29);
    for (const bad of ['', '12.345', '-3', '1e3', 'ten', '12,50.1.2']) expect(parseDollars(bad), bad).toBeNull();
  });

  it('when headers use common words, then they are mapped to our fields, each header once', () => {
    const m = suggestMapping(['Part No.', 'Item', 'Cond', 'Qty', 'Price', 'Weight', 'Mystery']);
    expect(m).toMatchObject({ part_number: 'Part No.', title: 'Item', condition: 'Cond', quantity: 'Qty', price: 'Price', weight_grams: 'Weight', description: null });
  });

  it('when the template is parsed back, then every row has every column', () => {
    const { headers, rows } = parseCsv(importTemplate());
    expect(rows).toHaveLength(2);
    for (const r of rows) expect(Object.keys(r)).toEqual(headers);
  });

  it('when a file has no header or repeats a column, then a clear error is thrown', () => {
    expect(() => parseCsv('\n\n')).toThrow(/header/);
    expect(() => parseCsv('price,Price\n1,2')).toThrow(/same name/);
  });
});
