import { describe, expect, it } from 'vitest';
import {
  checkConditionGrade,
  conditionCodes,
  conditions,
  describeCondition,
  isAgedStock,
  isCondition,
  isOriginal,
  isPeriodManufacture,
  meetsGrade,
  rubberUseCodes,
  rubberUses,
  usedGradeCodes,
  usedGrades,
  type Condition,
} from './conditions';

describe('conditions', () => {
  it('when listing every condition, then each has a label and an explanation paragraph', () => {
    for (const code of conditionCodes) {
      expect(conditions[code].code).toBe(code);
      expect(conditions[code].label.length).toBeGreaterThan(2);
      expect(conditions[code].explanation.length).toBeGreaterThan(80);
    }
  });

  it('when asking which conditions are original, then NOS, used, rebuilt and core are and NORS and reproduction are not', () => {
    const originals = conditionCodes.filter((c) => isOriginal(c));
    expect(originals).toEqual(['nos', 'used_original', 'rebuilt', 'core']);
  });

  it('when asking which conditions are period manufacture, then only reproduction is not', () => {
    expect(conditionCodes.filter((c) => !isPeriodManufacture(c))).toEqual(['reproduction']);
  });

  it('when asking which conditions are aged stock, then rebuilt and reproduction are not', () => {
    expect(conditionCodes.filter((c) => isAgedStock(c))).toEqual(['nos', 'nors', 'used_original', 'core']);
  });

  it('when given an unknown condition, then a clear error is thrown', () => {
    expect(() => isOriginal('mint' as Condition)).toThrow(/Unknown listing condition: "mint"/);
    expect(isCondition('mint')).toBe(false);
    expect(isCondition('nos')).toBe(true);
  });
});

describe('used-original grades', () => {
  it('when listing the grades, then there are five, ranked 1 to 5 in order, each explained', () => {
    expect(usedGradeCodes.map((g) => usedGrades[g].rank)).toEqual([1, 2, 3, 4, 5]);
    for (const g of usedGradeCodes) expect(usedGrades[g].explanation.length).toBeGreaterThan(40);
  });

  it('when a used original has no grade, then the check asks for one', () => {
    expect(checkConditionGrade('used_original', undefined)).toMatchObject({ ok: false, code: 'grade_required' });
    expect(checkConditionGrade('used_original', 'honest')).toEqual({ ok: true });
  });

  it('when a non-used condition carries a grade, then the check refuses it', () => {
    expect(checkConditionGrade('nos', 'ready')).toMatchObject({ ok: false, code: 'grade_not_allowed' });
    expect(checkConditionGrade('reproduction', null)).toEqual({ ok: true });
  });

  it('when describing a graded used original, then the grade label follows the condition label', () => {
    expect(describeCondition('used_original', 'weathered')).toBe('Used original: Weathered');
    expect(describeCondition('nors')).toBe('New old replacement stock (NORS)');
  });

  it('when comparing grades, then a better or equal grade meets the minimum and a worse one does not', () => {
    expect(meetsGrade('ready', 'honest')).toBe(true);
    expect(meetsGrade('honest', 'honest')).toBe(true);
    expect(meetsGrade('donor', 'hard_used')).toBe(false);
  });
});

describe('rubber use options', () => {
  it('when listing rubber use options, then serviceable and display-only are explained', () => {
    expect(rubberUseCodes).toEqual(['serviceable', 'display_only']);
    expect(rubberUses.display_only.label).toMatch(/display/i);
    expect(rubberUses.display_only.explanation).toMatch(/ages even unused/);
  });
});
