// Checks against /work/shared/REFERENCES.md, "Brake fluids — FMVSS No. 116 (49 CFR 571.116)".
import { describe, expect, it } from 'vitest';
import { brakeFluid, compatible } from '../../server/domain/standards/brake-fluids';

describe('Brake fluids against FMVSS No. 116', () => {
  // source: FMVSS No. 116 (49 CFR 571.116) via REFERENCES.md — dry and wet equilibrium reflux boiling point minimums.
  const rows: Array<[string, number, number, number, number]> = [
    ['DOT 3', 205, 401, 140, 284], // source: FMVSS No. 116
    ['DOT 4', 230, 446, 155, 311], // source: FMVSS No. 116; wet 155 C per NHTSA interpretation 12089
    ['DOT 5', 260, 500, 180, 356], // source: FMVSS No. 116
    ['DOT 5.1', 260, 500, 180, 356], // source: FMVSS No. 116
  ];

  it.each(rows)('when %s is looked up, then dry min is %s C / %s F and wet min %s C / %s F (source: FMVSS No. 116)', (grade, dc, df, wc, wf) => {
    expect(brakeFluid(grade)).toMatchObject({ dryBoilingMinC: dc, dryBoilingMinF: df, wetBoilingMinC: wc, wetBoilingMinF: wf });
  });

  it('when colours are read, then DOT 3, 4, 5.1 are colourless to amber and DOT 5 is purple (source: FMVSS No. 116 S5.1.14)', () => {
    // source: FMVSS No. 116 S5.1.14 via REFERENCES.md.
    for (const g of ['DOT 3', 'DOT 4', 'DOT 5.1']) expect(brakeFluid(g)!.colour, g).toBe('colourless to amber');
    expect(brakeFluid('DOT 5')!.colour).toBe('purple');
  });

  it('when bases are read, then DOT 5 is silicone and the others glycol (source: FMVSS No. 116 via REFERENCES.md)', () => {
    // source: REFERENCES.md — "DOT 5 (silicone base)"; DOT 3, 4, 5.1 are the glycol grades.
    expect(brakeFluid('DOT 5')!.base).toBe('silicone');
    for (const g of ['DOT 3', 'DOT 4', 'DOT 5.1']) expect(brakeFluid(g)!.base, g).toBe('glycol');
  });

  it('when DOT 5 meets a glycol grade, then they must not mix (common practice, per REFERENCES.md)', () => {
    // source: REFERENCES.md — "DOT 5 must not be mixed with the glycol grades (common practice)".
    expect(compatible('DOT 5', 'DOT 4').compatible).toBe(false);
    expect(compatible('DOT 5.1', 'DOT 5').compatible).toBe(false);
  });

  it('when grades are compared, then each higher grade meets at least the lower grade minimums (source: FMVSS No. 116)', () => {
    const [d3, d4, d5] = ['DOT 3', 'DOT 4', 'DOT 5'].map((g) => brakeFluid(g)!);
    expect(d4.dryBoilingMinC).toBeGreaterThan(d3.dryBoilingMinC);
    expect(d5.wetBoilingMinC).toBeGreaterThan(d4.wetBoilingMinC);
  });

  it('when Celsius and Fahrenheit minimums are compared, then they agree to within a degree', () => {
    for (const [grade, dc, df, wc, wf] of rows) {
      expect(Math.abs((dc * 9) / 5 + 32 - df), grade).toBeLessThanOrEqual(1);
      expect(Math.abs((wc * 9) / 5 + 32 - wf), grade).toBeLessThanOrEqual(1);
    }
  });
});
