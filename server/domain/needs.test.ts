import { describe, expect, it } from 'vitest';
import { computeNeeds, neededForLine, type TeardownLine } from './needs';

const line = (over: Partial<TeardownLine>): TeardownLine => ({
  lineId: 'BOM-1',
  partId: 'PART-A',
  qtyPerAssembly: 4,
  status: 'replace',
  usableOnHand: 0,
  ...over,
});

describe('neededForLine', () => {
  it('when a line is replace or missing, then the shortfall against the quantity per assembly is needed', () => {
    expect(neededForLine(line({ status: 'replace', usableOnHand: 1 }))).toBe(3);
    expect(neededForLine(line({ status: 'missing' }))).toBe(4);
  });

  it('when a wrong part was found, then it counts as a replacement', () => {
    expect(neededForLine(line({ status: 'wrong_part', qtyPerAssembly: 2 }))).toBe(2);
  });

  it('when more usable pieces are on hand than the line calls for, then nothing is needed', () => {
    expect(neededForLine(line({ usableOnHand: 6 }))).toBe(0);
  });

  it('when a line is reused, refurbished or not inspected, then it needs nothing', () => {
    for (const status of ['reuse', 'refurbish', 'not_inspected'] as const) expect(neededForLine(line({ status }))).toBe(0);
  });
});

describe('computeNeeds', () => {
  it('when the same part is short on several lines and wanted by hand, then one need sums them and keeps every reference', () => {
    const r = computeNeeds(
      [
        line({ lineId: 'BOM-1', partId: 'PART-A', qtyPerAssembly: 4, usableOnHand: 1 }),
        line({ lineId: 'BOM-2', partId: 'PART-B', status: 'reuse' }),
        line({ lineId: 'BOM-3', partId: 'PART-A', qtyPerAssembly: 2, status: 'missing' }),
        line({ lineId: 'BOM-4', partId: 'PART-C', qtyPerAssembly: 1, status: 'wrong_part' }),
        line({ lineId: 'BOM-5', partId: 'PART-D', status: 'not_inspected' }),
      ],
      [
        { partId: 'PART-A', quantity: 1, wantId: 'W-1' },
        { partId: 'PART-E', quantity: 2 },
      ],
    );
    expect(r.needs).toEqual([
      {
        partId: 'PART-A',
        quantity: 6,
        sources: [
          { kind: 'teardown', lineId: 'BOM-1', status: 'replace', quantity: 3 },
          { kind: 'teardown', lineId: 'BOM-3', status: 'missing', quantity: 2 },
          { kind: 'manual', wantId: 'W-1', quantity: 1 },
        ],
      },
      { partId: 'PART-C', quantity: 1, sources: [{ kind: 'teardown', lineId: 'BOM-4', status: 'wrong_part', quantity: 1 }] },
      { partId: 'PART-E', quantity: 2, sources: [{ kind: 'manual', quantity: 2 }] },
    ]);
    expect(r.notInspectedLineIds).toEqual(['BOM-5']);
  });

  it('when nothing is short, then there are no needs', () => {
    expect(computeNeeds([line({ usableOnHand: 4 })]).needs).toEqual([]);
  });

  it('when input is bad, then a RangeError names it', () => {
    expect(() => computeNeeds([line({ lineId: 'X' }), line({ lineId: 'X' })])).toThrow(/twice/);
    expect(() => computeNeeds([line({ qtyPerAssembly: 0 })])).toThrow(/qtyPerAssembly/);
    expect(() => computeNeeds([line({ usableOnHand: -1 })])).toThrow(/usableOnHand/);
    expect(() => computeNeeds([line({ status: 'lost' as never })])).toThrow(/status/);
    expect(() => computeNeeds([], [{ partId: 'P', quantity: 1.5 }])).toThrow(/quantity/);
  });
});
