import { describe, expect, it } from 'vitest';
import { formatCents, neededUnits, parseDollarsToCents, vehicleTitle } from './garage-format';

describe('garage formatters', () => {
  it('when a line is marked replace or missing, then needed is quantity minus usable on hand, never below zero', () => {
    expect(neededUnits('replace', 4, 1)).toBe(3);
    expect(neededUnits('missing', 2, 0)).toBe(2);
    expect(neededUnits('wrong_part', 2, 5)).toBe(0);
  });

  it('when a line is kept or not yet inspected, then it needs nothing', () => {
    expect(neededUnits('reuse', 4, 0)).toBe(0);
    expect(neededUnits('refurbish', 4, 0)).toBe(0);
    expect(neededUnits('not_inspected', 4, 0)).toBe(0);
  });

  it('when dollars are typed, then they turn into exact cents or null', () => {
    expect(parseDollarsToCents('$1,234.5')).toBe(123450);
    expect(parseDollarsToCents('40')).toBe(4000);
    expect(parseDollarsToCents('4.999')).toBeNull();
    expect(formatCents(123450)).toBe('$1,234.50');
  });

  it('when a vehicle has no nickname, then its title is model and serial', () => {
    expect(vehicleTitle({ nickname: '', serial: 'KV4-2044', model: { name: 'Kestrelvale KV-4' } })).toBe('Kestrelvale KV-4 KV4-2044');
    expect(vehicleTitle({ nickname: 'Old Patience', serial: 'KV4-2044', model: { name: 'Kestrelvale KV-4' } })).toBe('Old Patience');
  });
});
