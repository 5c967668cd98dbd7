import { describe, expect, it } from 'vitest';
import { partNumberKeys, PartNumberError, type PartNumberKind } from './part-number';
import {
  fillersForPart,
  findLoops,
  indexEdges,
  resolve,
  SupersessionInputError,
  type Interchange,
  type PartNumberRow,
  type SupersessionEdge,
} from './supersession';

// Parts and numbers are invented for the tests (fictional maker "Gorsk", numbers GK-...).

const num = (partId: string, number: string, kind: PartNumberKind = 'maker'): PartNumberRow => {
  const { key, folded } = partNumberKeys(number);
  return { partId, number, key, folded, kind };
};
const edge = (
  fromPartId: string,
  toPartId: string,
  interchange: Interchange = 'two_way',
  quantity = 1,
  note: string | null = null,
): SupersessionEdge => ({ fromPartId, toPartId, interchange, quantity, note });

/** One number per part: part "A" carries "GK-A". */
const numbersFor = (...ids: string[]) => ids.map((id) => num(id, `GK-${id}`));

const byPart = (r: ReturnType<typeof resolve>) => Object.fromEntries(r.matches.map((m) => [m.partId, m]));

describe('resolve: matching the typed number', () => {
  it('when the typed number equals a stored key, then the part matches exactly', () => {
    const r = resolve({ query: 'gk a', numbers: numbersFor('A'), edges: [] });
    expect(r.key).toBe('GKA');
    expect(r.matches).toEqual([
      { partId: 'A', number: 'GK-A', matchedBy: 'exact', interchange: null, depth: 0, conditions: [] },
    ]);
    expect(r.current).toEqual(['A']);
    expect(r.fillers).toEqual(['A']);
  });

  it('when the number matches only through O/0 I/1 folding, then the part is an alternate_number match', () => {
    const r = resolve({ query: 'GK-7O4I2', numbers: [num('P', 'GK-70412')], edges: [] });
    expect(r.matches).toHaveLength(1);
    expect(r.matches[0]).toMatchObject({ partId: 'P', matchedBy: 'alternate_number', number: 'GK-70412' });
  });

  it('when one part matches exactly and another only by folding, then both are listed and only the exact one is walked', () => {
    const numbers = [num('X', 'GK-7O1'), num('Y', 'GK-701'), num('Z', 'GK-900')];
    const r = resolve({ query: 'GK-7O1', numbers, edges: [edge('Y', 'Z')] });
    expect(byPart(r).X.matchedBy).toBe('exact');
    expect(byPart(r).Y.matchedBy).toBe('alternate_number');
    expect(byPart(r).Z).toBeUndefined();
    expect(r.fillers).toEqual(['X']);
  });

  it('when a part carries several numbers, then it is matched once with the number that matched', () => {
    const numbers = [num('A', 'GK-100'), num('A', '2530-00-123-4567', 'nsn')];
    const r = resolve({ query: '2530001234567', numbers, edges: [] });
    expect(r.matches).toHaveLength(1);
    expect(r.matches[0].number).toBe('2530-00-123-4567');
  });

  it('when one number is stored on several parts, then both match and a number_on_several_parts problem is raised', () => {
    const numbers = [num('A', 'GK-5'), num('B', 'GK-5')];
    const r = resolve({ query: 'GK-5', numbers, edges: [] });
    expect(r.matches.map((m) => m.matchedBy)).toEqual(['exact', 'exact']);
    expect(r.problems).toHaveLength(1);
    expect(r.problems[0]).toMatchObject({ kind: 'number_on_several_parts', partIds: ['A', 'B'] });
    expect(r.problems[0].message).toContain('GK-5');
  });

  it('when nothing matches, then every list is empty', () => {
    const r = resolve({ query: 'NOPE-1', numbers: numbersFor('A'), edges: [edge('A', 'B')] });
    expect(r).toMatchObject({ matches: [], chain: [], current: [], fillers: [], fillerSets: [], problems: [] });
  });

  it('when the query is empty, then it throws a PartNumberError', () => {
    expect(() => resolve({ query: ' - ', numbers: [], edges: [] })).toThrow(PartNumberError);
  });
});

describe('resolve: chains', () => {
  // A -> B -> C -> D -> E: five numbers, four steps.
  const chain5 = [edge('A', 'B'), edge('B', 'C', 'one_way'), edge('C', 'D'), edge('D', 'E')];
  const numbers = numbersFor('A', 'B', 'C', 'D', 'E');

  it('when a chain has four steps, then every later part is replaced_by with depth and via, and the last is current', () => {
    const r = resolve({ query: 'GK-A', numbers, edges: chain5 });
    const m = byPart(r);
    expect(['B', 'C', 'D', 'E'].map((id) => m[id].matchedBy)).toEqual(Array(4).fill('replaced_by'));
    expect(m.E).toMatchObject({ depth: 4, viaPartId: 'D', number: 'GK-E' });
    expect(r.current).toEqual(['E']);
    expect(r.chain.map((s) => [s.fromPartId, s.toPartId, s.depth, s.direction])).toEqual([
      ['A', 'B', 1, 'forward'],
      ['B', 'C', 2, 'forward'],
      ['C', 'D', 3, 'forward'],
      ['D', 'E', 4, 'forward'],
    ]);
  });

  it('when one step of a chain is one-way, then the interchange of later parts is one_way (the weakest on the path)', () => {
    const m = byPart(resolve({ query: 'GK-A', numbers, edges: chain5 }));
    expect(m.B.interchange).toBe('two_way');
    expect(m.C.interchange).toBe('one_way');
    expect(m.E.interchange).toBe('one_way');
  });

  it('when the middle of a chain is queried, then older parts are listed as replaces', () => {
    const r = resolve({ query: 'GK-C', numbers, edges: chain5 });
    const m = byPart(r);
    expect(m.A).toMatchObject({ matchedBy: 'replaces', depth: 2, viaPartId: 'B' });
    expect(m.B.matchedBy).toBe('replaces');
    expect(m.E.matchedBy).toBe('replaced_by');
    expect(r.current).toEqual(['E']);
    expect(r.chain.filter((s) => s.direction === 'backward').map((s) => s.fromPartId)).toEqual(['B', 'A']);
  });

  it('when a chain step has an edge id and note, then the chain step carries them', () => {
    const edges: SupersessionEdge[] = [{ id: 'e1', fromPartId: 'A', toPartId: 'B', interchange: 'one_way', quantity: 1, note: 'later casting' }];
    const r = resolve({ query: 'GK-A', numbers, edges });
    expect(r.chain[0]).toEqual({
      id: 'e1',
      fromPartId: 'A',
      toPartId: 'B',
      interchange: 'one_way',
      note: 'later casting',
      quantity: 1,
      depth: 1,
      direction: 'forward',
    });
  });
});

describe('resolve and fillersForPart: who fills a need', () => {
  it('when the query part is replaced one-way, then the new part fills the old need but not the reverse', () => {
    const edges = [edge('OLD', 'NEW', 'one_way')];
    const numbers = numbersFor('OLD', 'NEW');
    expect(resolve({ query: 'GK-OLD', numbers, edges }).fillers).toEqual(['OLD', 'NEW']);
    // A one-way step is never walked backwards: the old part does not fill a need for the new one.
    const r = resolve({ query: 'GK-NEW', numbers, edges });
    expect(r.fillers).toEqual(['NEW']);
    expect(byPart(r).OLD.matchedBy).toBe('replaces');
  });

  it('when the query part is replaced two-way, then the old part fills a need for the new one', () => {
    const edges = [edge('OLD', 'NEW', 'two_way')];
    expect(resolve({ query: 'GK-NEW', numbers: numbersFor('OLD', 'NEW'), edges }).fillers).toEqual(['NEW', 'OLD']);
  });

  it('when a backward walk meets a one-way step, then it stops there', () => {
    // A -one-> B -two-> C: a need for C is met by C and B, never A.
    const edges = [edge('A', 'B', 'one_way'), edge('B', 'C', 'two_way')];
    expect(fillersForPart('C', edges).fillers).toEqual(['C', 'B']);
  });

  it('when a step is conditional, then the filler carries the note as a condition, and later ones keep it', () => {
    const edges = [edge('A', 'B', 'conditional', 1, 'use with the later pedal bracket GK-88'), edge('B', 'C', 'two_way')];
    const f = fillersForPart('A', edges);
    expect(f.fillers).toEqual(['A', 'B', 'C']);
    const c = f.fillerSets.find((s) => s.parts[0].partId === 'C')!;
    expect(c.interchange).toBe('conditional');
    expect(c.conditions).toEqual(['use with the later pedal bracket GK-88']);
    expect(c.parts[0].alternatives[0].path).toEqual(['A', 'B', 'C']);
  });

  it('when a conditional step has no note, then the condition still says another change is needed', () => {
    const f = fillersForPart('A', [edge('A', 'B', 'conditional')]);
    expect(f.fillerSets[1].conditions[0]).toMatch(/another change/);
  });

  it('when a conditional step is met backwards, then it is not walked', () => {
    expect(fillersForPart('B', [edge('A', 'B', 'conditional', 1, 'x')]).fillers).toEqual(['B']);
  });

  it('when one old part is replaced by a kit, then the kit is one filler set with every member and quantity', () => {
    const edges = [edge('CYL', 'BODY', 'one_way', 1), edge('CYL', 'CUP', 'one_way', 2), edge('CYL', 'BOOT', 'one_way', 2)];
    const r = resolve({ query: 'GK-CYL', numbers: numbersFor('CYL', 'BODY', 'CUP', 'BOOT'), edges });
    // Kit members never fill the need alone.
    expect(r.fillers).toEqual(['CYL']);
    const kit = r.fillerSets.find((s) => s.kitOf === 'CYL')!;
    expect(kit.parts.map((p) => [p.partId, p.quantity])).toEqual([
      ['BODY', 1],
      ['CUP', 2],
      ['BOOT', 2],
    ]);
    expect(kit.interchange).toBe('one_way');
    expect(byPart(r).CUP).toMatchObject({ matchedBy: 'replaced_by', kitOf: 'CYL' });
    expect(r.current.sort()).toEqual(['BODY', 'BOOT', 'CUP']);
  });

  it('when a kit member is itself superseded, then the member lists its replacement as an alternative with scaled quantity', () => {
    const edges = [edge('CYL', 'BODY'), edge('CYL', 'CUP', 'two_way', 2), edge('CUP', 'CUP2', 'one_way', 1)];
    const kit = fillersForPart('CYL', edges).fillerSets.find((s) => s.kitOf)!;
    const cup = kit.parts.find((p) => p.partId === 'CUP')!;
    expect(cup.alternatives.map((a) => [a.partId, a.quantity, a.interchange])).toEqual([
      ['CUP', 2, 'two_way'],
      ['CUP2', 2, 'one_way'],
    ]);
    expect(cup.alternatives[1].path).toEqual(['CYL', 'CUP', 'CUP2']);
  });

  it('when a kit step is conditional, then the kit and its members carry the condition', () => {
    const edges = [edge('A', 'K1', 'conditional', 1, 'drill the flange'), edge('A', 'K2', 'two_way', 1)];
    const kit = fillersForPart('A', edges).fillerSets.find((s) => s.kitOf === 'A')!;
    expect(kit.interchange).toBe('conditional');
    expect(kit.conditions).toEqual(['drill the flange']);
    expect(kit.parts[0].alternatives[0].conditions).toEqual(['drill the flange']);
  });

  it('when a kit member is queried, then the kitted-away part is not a filler even on two-way rows', () => {
    const edges = [edge('CYL', 'BODY'), edge('CYL', 'CUP')];
    expect(fillersForPart('CUP', edges).fillers).toEqual(['CUP']);
  });

  it('when several parts are consolidated into one, then each old need is filled by the new part', () => {
    const edges = [edge('L', 'ONE', 'one_way'), edge('R', 'ONE', 'one_way')];
    const numbers = numbersFor('L', 'R', 'ONE');
    expect(resolve({ query: 'GK-L', numbers, edges }).fillers).toEqual(['L', 'ONE']);
    expect(resolve({ query: 'GK-R', numbers, edges }).fillers).toEqual(['R', 'ONE']);
    const r = resolve({ query: 'GK-ONE', numbers, edges });
    expect(r.matches.filter((m) => m.matchedBy === 'replaces').map((m) => m.partId)).toEqual(['L', 'R']);
    expect(r.fillers).toEqual(['ONE']);
  });

  it('when consolidation is two-way, then a sibling old part fills the need too (transitive interchange)', () => {
    const edges = [edge('L', 'ONE', 'two_way'), edge('R', 'ONE', 'two_way')];
    expect(fillersForPart('L', edges).fillers).toEqual(['L', 'ONE', 'R']);
  });

  it('when a replacement takes two of the new part for one old one, then quantities multiply along the chain', () => {
    const edges = [edge('A', 'B', 'one_way', 2), edge('B', 'C', 'one_way', 3)];
    const f = fillersForPart('A', edges);
    expect(f.fillerSets.map((s) => [s.parts[0].partId, s.parts[0].quantity])).toEqual([
      ['A', 1],
      ['B', 2],
      ['C', 6],
    ]);
  });

  it('when a two-way step carries a quantity, then it is not walked backwards', () => {
    expect(fillersForPart('B', [edge('A', 'B', 'two_way', 2)]).fillers).toEqual(['B']);
  });

  it('when fillersForPart is given a prebuilt index, then the answer is the same as with the edges', () => {
    const edges = [edge('A', 'B'), edge('B', 'C', 'one_way')];
    expect(fillersForPart('A', indexEdges(edges))).toEqual(fillersForPart('A', edges));
  });

  it('when the query number is on two parts, then fillers of both are merged without repeats', () => {
    const numbers = [num('A', 'GK-5'), num('B', 'GK-5')];
    const r = resolve({ query: 'GK-5', numbers, edges: [edge('A', 'C', 'one_way'), edge('B', 'C', 'one_way')] });
    expect(r.fillers).toEqual(['A', 'C', 'B']);
  });
});

describe('loops and depth', () => {
  it('when a chain loops back on itself, then resolve terminates and reports the loop with its parts', () => {
    const edges = [edge('A', 'B'), edge('B', 'C'), edge('C', 'A'), edge('C', 'D')];
    const r = resolve({ query: 'GK-A', numbers: numbersFor('A', 'B', 'C', 'D'), edges });
    const loop = r.problems.find((p) => p.kind === 'loop')!;
    expect(loop.partIds).toEqual(['A', 'B', 'C']);
    expect(loop.message).toContain('GK-B');
    expect(r.current).toEqual(['D']);
    expect(r.matches.map((m) => m.partId).sort()).toEqual(['A', 'B', 'C', 'D']);
    // Each edge is listed once even though it is in a loop.
    expect(r.chain).toHaveLength(4);
  });

  it('when a part is recorded as replaced by itself, then that is a loop of one', () => {
    const r = resolve({ query: 'GK-A', numbers: numbersFor('A'), edges: [edge('A', 'A')] });
    expect(r.problems).toEqual([expect.objectContaining({ kind: 'loop', partIds: ['A'] })]);
    expect(r.current).toEqual([]);
  });

  it('when fillersForPart meets a loop, then it terminates, lists each part once and reports the loop', () => {
    const f = fillersForPart('A', [edge('A', 'B', 'one_way'), edge('B', 'A', 'one_way')]);
    expect(f.fillers).toEqual(['A', 'B']);
    expect(f.problems.map((p) => p.kind)).toEqual(['loop']);
  });

  it('when a chain is longer than the depth limit, then the walk stops there with a depth_limit problem', () => {
    const ids = Array.from({ length: 41 }, (_, i) => `P${i}`);
    const edges = ids.slice(1).map((id, i) => edge(ids[i], id, 'one_way'));
    const r = resolve({ query: 'GK-P0', numbers: numbersFor(...ids), edges });
    expect(r.matches).toHaveLength(33);
    expect(r.current).toEqual([]);
    const p = r.problems.find((x) => x.kind === 'depth_limit')!;
    expect(p.partIds).toEqual(['P32']);
    expect(p.message).toMatch(/32 steps/);
  });

  it('when maxDepth is set lower, then the walk honours it', () => {
    const edges = [edge('A', 'B'), edge('B', 'C'), edge('C', 'D')];
    const r = resolve({ query: 'GK-A', numbers: numbersFor('A', 'B', 'C', 'D'), edges, maxDepth: 2 });
    expect(r.matches.map((m) => m.partId)).toEqual(['A', 'B', 'C']);
    expect(r.problems.map((p) => p.kind)).toEqual(['depth_limit']);
    expect(fillersForPart('A', edges, { maxDepth: 2 }).fillers).toEqual(['A', 'B', 'C']);
  });
});

describe('depth limit edge cases', () => {
  it('when the walk reaches the limit on a part whose neighbours are already seen, then no depth_limit is reported', () => {
    // A <-> B two-way: from B at the limit, the only way on is back to A, already seen.
    expect(fillersForPart('A', [edge('A', 'B')], { maxDepth: 1 }).problems).toEqual([]);
  });
});

describe('findLoops', () => {
  it('when the data has two separate loops and clean chains, then both loops are returned, sorted', () => {
    const edges = [edge('B', 'A'), edge('A', 'B'), edge('X', 'Y'), edge('Y', 'Z'), edge('Z', 'X'), edge('M', 'N'), edge('Q', 'Q')];
    expect(findLoops(edges)).toEqual([['A', 'B'], ['Q'], ['X', 'Y', 'Z']]);
  });

  it('when there is no loop, then the list is empty, also for a diamond (consolidation after a kit)', () => {
    expect(findLoops([edge('A', 'B'), edge('A', 'C'), edge('B', 'D'), edge('C', 'D')])).toEqual([]);
  });

  it('when a chain is very long, then the loop search does not overflow the stack', () => {
    const edges = Array.from({ length: 50_000 }, (_, i) => edge(`N${i}`, `N${i + 1}`));
    edges.push(edge('N50000', 'N0'));
    expect(findLoops(edges)[0]).toHaveLength(50_001);
  });
});

describe('input checks and speed', () => {
  it('when a supersession row has a bad quantity or interchange, then it throws SupersessionInputError', () => {
    expect(() => indexEdges([edge('A', 'B', 'two_way', 0)])).toThrow(SupersessionInputError);
    expect(() => indexEdges([edge('A', 'B', 'two_way', 1.5)])).toThrow(/whole number/);
    expect(() => indexEdges([{ ...edge('A', 'B'), interchange: 'sideways' as Interchange }])).toThrow(/sideways/);
  });

  it('when the same row is recorded twice, then it counts once (not as a kit)', () => {
    const f = fillersForPart('A', [edge('A', 'B'), edge('A', 'B')]);
    expect(f.fillerSets.every((s) => s.kitOf === null)).toBe(true);
    expect(f.fillers).toEqual(['A', 'B']);
  });

  it('when there are a few thousand edges, then one resolve on a small chain takes well under a millisecond', () => {
    const edges: SupersessionEdge[] = [];
    const numbers: PartNumberRow[] = [];
    for (let i = 0; i < 1000; i++) {
      edges.push(edge(`a${i}`, `b${i}`, 'one_way'), edge(`b${i}`, `c${i}`), edge(`c${i}`, `d${i}`, 'conditional', 1, 'n'));
      numbers.push(num(`a${i}`, `GK-${i}A`));
    }
    const index = indexEdges(edges);
    const t0 = performance.now();
    for (let i = 0; i < 200; i++) fillersForPart(`a${i}`, index);
    expect((performance.now() - t0) / 200).toBeLessThan(1);
    const t1 = performance.now();
    for (let i = 0; i < 20; i++) resolve({ query: `GK-${i}A`, numbers: numbers.slice(i, i + 1), edges: edges.slice(i * 3, i * 3 + 3) });
    expect((performance.now() - t1) / 20).toBeLessThan(1);
  });
});
