// Checks against /work/shared/REFERENCES.md, "Cotter pins — ASME B18.8.1".
import { describe, expect, it } from 'vitest';
import { cotterPin } from '../../server/domain/standards/cotter-pins';

describe('Cotter pins against ASME B18.8.1', () => {
  // source: ASME B18.8.1 via REFERENCES.md — nominal (in), shank max (in), recommended hole (in).
  const rows: Array<[string, number, number]> = [
    ['1/16', 0.06, 0.078], // source: ASME B18.8.1
    ['3/32', 0.09, 0.109], // source: ASME B18.8.1
    ['1/8', 0.12, 0.141], // source: ASME B18.8.1
    ['5/32', 0.15, 0.172], // source: ASME B18.8.1
    ['3/16', 0.176, 0.203], // source: ASME B18.8.1
    ['1/4', 0.225, 0.266], // source: ASME B18.8.1
    ['5/16', 0.28, 0.312], // source: ASME B18.8.1
    ['3/8', 0.335, 0.375], // source: ASME B18.8.1
  ];

  it.each(rows)('when nominal %s in is looked up, then shank max is %s and hole %s (source: ASME B18.8.1)', (nominal, shank, hole) => {
    const r = cotterPin(nominal)!;
    expect(r.shankMaxIn).toBeCloseTo(shank, 3);
    expect(r.recommendedHoleIn).toBeCloseTo(hole, 3);
    expect(r.source).toMatch(/ASME B18\.8\.1/);
  });

  it.each(rows)('when nominal %s is checked, then the recommended hole is larger than the shank (source: ASME B18.8.1)', (nominal) => {
    const r = cotterPin(nominal)!;
    expect(r.recommendedHoleIn).toBeGreaterThan(r.shankMaxIn);
  });
});
