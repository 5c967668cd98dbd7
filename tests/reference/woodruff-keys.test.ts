// Checks against /work/shared/REFERENCES.md, "Woodruff keys — ASME B17.2-1967".
import { describe, expect, it } from 'vitest';
import { woodruffNominal, woodruffRow } from '../../server/domain/standards/woodruff-keys';

describe('Woodruff keys against ASME B17.2-1967', () => {
  // source: ASME B17.2-1967 key numbering rule (REFERENCES.md): 505 = 5/32 x 5/8, 606 = 3/16 x 3/4, 808 = 1/4 x 1.
  it.each([
    ['505', 5 / 32, 5 / 8, '5/32 x 5/8'],
    ['606', 3 / 16, 3 / 4, '3/16 x 3/4'],
    ['808', 1 / 4, 1, '1/4 x 1'],
  ])('when key %s is looked up by the numbering rule, then it is %s x %s in (source: ASME B17.2-1967)', (key, w, d, nominal) => {
    expect(woodruffNominal(key)).toMatchObject({ widthIn: w, diameterIn: d, nominal });
  });

  // source: ASME B17.2-1967 table rows, confirmed in Shigley (Table 7-7), Mott (Table 11-3) and Machinery's
  // Handbook 31st ed., via REFERENCES.md. Columns: width x diameter, height max/min, shaft depth, hub depth, length F.
  const rows: Array<[string, string, number, number | null, number, number, number]> = [
    ['202', '1/16 x 1/4', 0.109, 0.104, 0.0728, 0.0372, 0.248], // source: ASME B17.2-1967
    ['406', '1/8 x 3/4', 0.313, 0.308, 0.2455, 0.0685, 0.74], // source: ASME B17.2-1967
    ['505', '5/32 x 5/8', 0.25, 0.245, 0.1669, 0.0841, 0.612], // source: ASME B17.2-1967; length 0.612 from memory
    ['606', '3/16 x 3/4', 0.313, 0.308, 0.2143, 0.0997, 0.74], // source: ASME B17.2-1967
    ['608', '3/16 x 1', 0.438, 0.433, 0.3393, 0.0997, 0.992], // source: ASME B17.2-1967
    ['808', '1/4 x 1', 0.438, 0.433, 0.308, 0.131, 0.992], // source: ASME B17.2-1967
    ['810', '1/4 x 1-1/4', 0.547, null, 0.417, 0.131, 1.24], // source: ASME B17.2-1967; height given as max only
  ];

  it.each(rows)(
    'when key %s is looked up, then its table row matches (source: ASME B17.2-1967 via Shigley 7-7, Mott 11-3)',
    (key, nominal, hMax, hMin, shaft, hub, lengthF) => {
      expect(woodruffNominal(key)!.nominal).toBe(nominal);
      const row = woodruffRow(key)!;
      expect(row.heightMaxIn).toBeCloseTo(hMax, 4);
      if (hMin === null) expect(row.heightMinIn).toBeNull();
      else expect(row.heightMinIn).toBeCloseTo(hMin, 4);
      expect(row.shaftKeyseatDepthIn).toBeCloseTo(shaft, 4);
      expect(row.hubKeyseatDepthIn).toBeCloseTo(hub, 4);
      expect(row.lengthFIn).toBeCloseTo(lengthF, 3);
    },
  );

  it('when key 505 is looked up, then its length F is flagged from memory, as REFERENCES.md says', () => {
    // source: REFERENCES.md marks the 505 length F (0.612) "from memory".
    expect(woodruffRow('505')!.lengthFromMemory).toBe(true);
    expect(woodruffRow('606')!.lengthFromMemory).toBe(false);
  });
});
