// Checks against /work/shared/REFERENCES.md, "Unified inch threads — ASME B1.1".
import { describe, expect, it } from 'vitest';
import { basicPitchDiameter, threadFigures } from '../../server/domain/standards/unified-threads';

describe('Unified inch threads against ASME B1.1', () => {
  // source: ASME B1.1 via REFERENCES.md — size, major diameter (in), basic pitch diameter (in).
  const rows: Array<[string, number, number]> = [
    ['1/4-20 UNC', 0.25, 0.2175], // source: ASME B1.1
    ['1/4-28 UNF', 0.25, 0.2268], // source: ASME B1.1
    ['5/16-18 UNC', 0.3125, 0.2764], // source: ASME B1.1
    ['5/16-24 UNF', 0.3125, 0.2854], // source: ASME B1.1
    ['3/8-16 UNC', 0.375, 0.3344], // source: ASME B1.1
    ['3/8-24 UNF', 0.375, 0.3479], // source: ASME B1.1
    ['7/16-20 UNF', 0.4375, 0.405], // source: ASME B1.1
    ['1/2-13 UNC', 0.5, 0.45], // source: ASME B1.1
    ['1/2-20 UNF', 0.5, 0.4675], // source: ASME B1.1
  ];

  it.each(rows)('when %s is parsed, then major is %s in and basic pitch diameter %s in (source: ASME B1.1)', (size, major, pitchDia) => {
    const f = threadFigures(size);
    expect(f.majorIn).toBeCloseTo(major, 4);
    expect(f.basicPitchDiameterIn).toBe(pitchDia);
    expect(f.designation).toBe(size);
  });

  it.each(rows)('when %s is typed without its series, then the series from the table is named (source: ASME B1.1)', (size) => {
    const [bare, series] = size.split(' ');
    expect(threadFigures(bare).series).toBe(series);
  });

  it('when the formula is applied, then E = D - 0.649519 / n to within 1e-4 of the table (source: ASME B1.1)', () => {
    // source: ASME B1.1 via REFERENCES.md — E = D - 0.649519 / n; 3/8-24: 0.3750 -> 0.3479.
    expect(basicPitchDiameter(0.375, 24)).toBeCloseTo(0.3479, 4);
    expect(basicPitchDiameter(0.5, 13)).toBeCloseTo(0.45, 4);
  });
});
