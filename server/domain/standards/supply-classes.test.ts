import { describe, expect, it } from 'vitest';
import { supplyClassName, supplyGroupName } from './supply-classes';

describe('supply classes', () => {
  it('when an FSC is in the table, then its name is returned; otherwise null', () => {
    expect(supplyClassName('5310')).toBe('Nuts and Washers');
    expect(supplyClassName('1005')).toBeNull();
    expect(supplyClassName('toString')).toBeNull();
  });

  it('when a group is known, then its name (from memory) is returned', () => {
    expect(supplyGroupName('53')).toBe('Hardware and Abrasives');
    expect(supplyGroupName('99')).toBeNull();
  });
});
