import { describe, expect, it } from 'vitest';
import { layoutChain } from './chain-layout';

const edge = (fromPartId: string, toPartId: string) => ({ fromPartId, toPartId });

describe('layoutChain', () => {
  it('when parts replace each other in a line, then each is one column right of the one it replaces', () => {
    const l = layoutChain(['c', 'a', 'b'], [edge('a', 'b'), edge('b', 'c')]);
    expect([...l.position.entries()].sort()).toEqual([
      ['a', { column: 0, row: 0 }],
      ['b', { column: 1, row: 0 }],
      ['c', { column: 2, row: 0 }],
    ]);
    expect(l.back).toEqual([]);
  });

  it('when one part is replaced by a kit, then the members share the next column and are listed as a kit', () => {
    const l = layoutChain(['old', 'cup', 'boot', 'spring'], [edge('old', 'cup'), edge('old', 'boot'), edge('old', 'spring')]);
    expect(l.columns).toBe(2);
    expect(l.rows).toBe(3);
    expect(l.kits).toEqual([{ fromPartId: 'old', members: ['cup', 'boot', 'spring'] }]);
  });

  it('when two parts are consolidated into one, then the new part sits right of both', () => {
    const l = layoutChain(['left', 'right', 'either'], [edge('left', 'either'), edge('right', 'either')]);
    expect(l.position.get('either')).toEqual({ column: 1, row: 0 });
    expect(l.position.get('right')).toEqual({ column: 0, row: 1 });
  });

  it('when the data loops, then the layout ends and the closing edge is set aside as a back edge', () => {
    const l = layoutChain(['a', 'b', 'c'], [edge('a', 'b'), edge('b', 'c'), edge('c', 'a')]);
    expect(l.back).toEqual([edge('c', 'a')]);
    expect(l.forward).toHaveLength(2);
    expect(l.columns).toBe(3);
  });
});
