import { describe, expect, it } from 'vitest';
import { brakeFluid, compatible, parseBrakeFluidGrade } from './brake-fluids';

describe('brake fluids', () => {
  it('when a grade is typed loosely, then it parses to the canonical grade', () => {
    expect(['dot3', 'DOT-4', 'Dot 5', 'dot 5.1', ' DOT5.1 '].map(parseBrakeFluidGrade)).toEqual(['DOT 3', 'DOT 4', 'DOT 5', 'DOT 5.1', 'DOT 5.1']);
    expect(parseBrakeFluidGrade('DOT 6')).toBeNull();
    expect(brakeFluid('mineral')).toBeNull();
  });

  it('when silicone DOT 5 meets any glycol grade, then they are not compatible (common practice)', () => {
    for (const g of ['DOT 3', 'DOT 4', 'DOT 5.1']) {
      expect(compatible('DOT 5', g).compatible, g).toBe(false);
      expect(compatible(g, 'DOT 5').compatible, g).toBe(false);
    }
    expect(compatible('DOT 5', 'DOT 3').reason).toMatch(/flush/);
    expect(compatible('DOT 5', 'DOT 3').source).toMatch(/common practice/);
  });

  it('when two glycol grades meet, or a grade meets itself, then they are compatible', () => {
    expect(compatible('DOT 3', 'DOT 4').compatible).toBe(true);
    expect(compatible('DOT 4', 'DOT 5.1').reason).toMatch(/lower grade/);
    expect(compatible('DOT 5', 'dot5').compatible).toBe(true);
  });

  it('when a grade is unknown, then compatible throws', () => {
    expect(() => compatible('DOT 3', 'ATF')).toThrow(/ATF/);
  });
});
