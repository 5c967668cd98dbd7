/**
 * Supersession resolution over a loaded subgraph (no I/O).
 *
 * An edge `from -> to` reads "from is replaced by to". Interchange (DOMAIN.md):
 * - two_way: either part fits wherever the other did;
 * - one_way: the new part fits where the old one did, not the reverse;
 * - conditional: fits only with another change, given in the edge's note.
 * One from-part with several to-parts is a kit (all members are needed together, `quantity` each); several
 * from-parts with one to-part is a consolidation. The part that ends a chain is the current number.
 *
 * Who fills a need for part P (our rule, from DOMAIN.md): P itself; anything reachable from P by steps that
 * go forward along any edge or backward along a two-way edge. A one-way or conditional step is never walked
 * backwards. Two more limits of ours on backward steps: the old part must have been replaced by that one part
 * alone (not by a kit) and one for one (quantity 1), else one old part is not a drop-in for one new part.
 * Conditions picked up on the way travel with the filler. Loops are data errors: reported, never followed twice.
 */
import { parsePartNumber, type PartNumberKind } from './part-number';

export const interchangeKinds = ['two_way', 'one_way', 'conditional'] as const;
export type Interchange = (typeof interchangeKinds)[number];

export const DEFAULT_MAX_DEPTH = 32;

export interface SupersessionEdge {
  id?: string;
  fromPartId: string;
  toPartId: string;
  interchange: Interchange;
  note?: string | null;
  quantity: number;
}

export interface PartNumberRow {
  partId: string;
  /** As printed. */
  number: string;
  key: string;
  folded: string;
  kind: PartNumberKind;
}

export interface ResolveInput {
  query: string;
  numbers: PartNumberRow[];
  /** The supersession rows, or an index built once with indexEdges() when resolving many queries. */
  edges: readonly SupersessionEdge[] | SupersessionIndex;
  maxDepth?: number;
}

export type MatchedBy = 'exact' | 'alternate_number' | 'replaced_by' | 'replaces';

export interface ResolveMatch {
  partId: string;
  /** The matching number for exact/alternate matches; otherwise the part's first listed number ('' if none). */
  number: string;
  matchedBy: MatchedBy;
  /** Weakest interchange along the path from the queried part; null for exact/alternate matches. */
  interchange: Interchange | null;
  /** The neighbour through which this part was reached. */
  viaPartId?: string;
  /** Set when this part is a member of a kit that replaced `kitOf`. */
  kitOf?: string;
  /** Steps from the queried part (0 for exact/alternate). */
  depth: number;
  /** Notes of conditional steps on the path. */
  conditions: string[];
}

export interface ChainStep {
  id?: string;
  fromPartId: string;
  toPartId: string;
  interchange: Interchange;
  note: string | null;
  quantity: number;
  /** Distance of the far end of this edge from the queried part. */
  depth: number;
  /** forward: walked from the queried part towards newer parts; backward: towards older parts. */
  direction: 'forward' | 'backward';
}

export type ProblemKind = 'loop' | 'number_on_several_parts' | 'depth_limit';

export interface SupersessionProblem {
  kind: ProblemKind;
  message: string;
  partIds: string[];
}

/** One part that, in `quantity`, fills one unit of the need on its own. */
export interface FillerPart {
  partId: string;
  quantity: number;
  interchange: Interchange;
  conditions: string[];
  depth: number;
  /** Part ids from the needed part to this one. */
  path: string[];
}

export interface KitMember {
  partId: string;
  /** How many of this member one unit of the need takes. */
  quantity: number;
  /** Single parts that fill this member (itself first), quantities already scaled to the whole need. */
  alternatives: FillerPart[];
}

/** One way to fill one unit of a need: a single part (kitOf null) or every member of a kit together. */
export interface FillerSet {
  kitOf: string | null;
  parts: KitMember[];
  interchange: Interchange;
  conditions: string[];
  depth: number;
}

export interface FillerResult {
  partId: string;
  /** Parts that fill the need alone (the part itself first). Kit members are not here: see fillerSets. */
  fillers: string[];
  fillerSets: FillerSet[];
  problems: SupersessionProblem[];
}

export interface ResolveResult {
  query: string;
  key: string;
  matches: ResolveMatch[];
  chain: ChainStep[];
  current: string[];
  fillers: string[];
  fillerSets: FillerSet[];
  problems: SupersessionProblem[];
}

export class SupersessionInputError extends Error {
  override readonly name = 'SupersessionInputError';
}

/** Adjacency built once from the edges; pass it to fillersForPart when calling many times. */
export interface SupersessionIndex {
  readonly out: ReadonlyMap<string, readonly SupersessionEdge[]>;
  readonly in: ReadonlyMap<string, readonly SupersessionEdge[]>;
  readonly edges: readonly SupersessionEdge[];
}

const rank: Record<Interchange, number> = { two_way: 2, one_way: 1, conditional: 0 };

function weakest(a: Interchange, b: Interchange): Interchange {
  return rank[a] <= rank[b] ? a : b;
}

const NO_NOTE_CONDITION = 'fits only with another change (no note recorded)';

function withCondition(conditions: string[], e: SupersessionEdge): string[] {
  if (e.interchange !== 'conditional') return conditions;
  const note = e.note?.trim() || NO_NOTE_CONDITION;
  return conditions.includes(note) ? conditions : [...conditions, note];
}

/** Builds the adjacency maps; checks each edge and drops repeated (from, to) pairs, keeping the first. */
export function indexEdges(edges: readonly SupersessionEdge[]): SupersessionIndex {
  const out = new Map<string, SupersessionEdge[]>();
  const inn = new Map<string, SupersessionEdge[]>();
  const kept: SupersessionEdge[] = [];
  for (const e of edges) {
    if (!e.fromPartId || !e.toPartId) throw new SupersessionInputError('A supersession row needs both part ids.');
    if (!(e.interchange in rank)) {
      throw new SupersessionInputError(`Unknown interchange "${String(e.interchange)}" on a supersession row.`);
    }
    if (!Number.isInteger(e.quantity) || e.quantity < 1) {
      throw new SupersessionInputError(
        `Supersession quantity must be a whole number of 1 or more; got ${String(e.quantity)}.`,
      );
    }
    let o = out.get(e.fromPartId);
    if (!o) out.set(e.fromPartId, (o = []));
    // A part has few successors, so a scan beats building a key per edge.
    else if (o.some((x) => x.toPartId === e.toPartId)) continue;
    kept.push(e);
    o.push(e);
    let i = inn.get(e.toPartId);
    if (!i) inn.set(e.toPartId, (i = []));
    i.push(e);
  }
  return { out, in: inn, edges: kept };
}

function asIndex(edges: readonly SupersessionEdge[] | SupersessionIndex): SupersessionIndex {
  return Array.isArray(edges) ? indexEdges(edges) : (edges as SupersessionIndex);
}

const EMPTY: readonly SupersessionEdge[] = [];

/** Strongly connected groups (Tarjan, iterative so deep chains cannot overflow the stack). */
function stronglyConnected(nodes: Iterable<string>, next: (n: string) => readonly string[]): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const groups: string[][] = [];
  let counter = 0;
  for (const root of nodes) {
    if (index.has(root)) continue;
    const work: Array<{ node: string; children: readonly string[]; i: number }> = [];
    const open = (n: string) => {
      index.set(n, counter);
      low.set(n, counter);
      counter++;
      stack.push(n);
      onStack.add(n);
      work.push({ node: n, children: next(n), i: 0 });
    };
    open(root);
    while (work.length > 0) {
      const top = work[work.length - 1];
      if (top.i < top.children.length) {
        const c = top.children[top.i++];
        if (!index.has(c)) open(c);
        else if (onStack.has(c)) low.set(top.node, Math.min(low.get(top.node)!, index.get(c)!));
        continue;
      }
      work.pop();
      if (work.length > 0) {
        const parent = work[work.length - 1].node;
        low.set(parent, Math.min(low.get(parent)!, low.get(top.node)!));
      }
      if (low.get(top.node) === index.get(top.node)) {
        const group: string[] = [];
        let n: string;
        do {
          n = stack.pop()!;
          onStack.delete(n);
          group.push(n);
        } while (n !== top.node);
        groups.push(group);
      }
    }
  }
  return groups;
}

function loopsAmong(index: SupersessionIndex, nodes: Iterable<string>, within?: ReadonlySet<string>): string[][] {
  const next = (n: string) => {
    const targets = (index.out.get(n) ?? EMPTY).map((e) => e.toPartId);
    return within ? targets.filter((t) => within.has(t)) : targets;
  };
  return stronglyConnected(nodes, next)
    .filter((g) => g.length > 1 || (index.out.get(g[0]) ?? EMPTY).some((e) => e.toPartId === g[0]))
    .map((g) => g.sort())
    .sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
}

/**
 * Every supersession loop in the data, for the data-quality report. Each inner list is one group of parts
 * that all reach each other (sorted ids); a part replaced by itself is a group of one.
 */
export function findLoops(edges: readonly SupersessionEdge[]): string[][] {
  const index = indexEdges(edges);
  const nodes = new Set<string>();
  for (const e of index.edges) {
    nodes.add(e.fromPartId);
    nodes.add(e.toPartId);
  }
  return loopsAmong(index, nodes);
}

function loopProblems(groups: string[][], label: (id: string) => string): SupersessionProblem[] {
  return groups.map((g) => ({
    kind: 'loop' as const,
    message:
      g.length === 1
        ? `Supersession loop: ${label(g[0])} is recorded as replaced by itself. Fix the supersession rows.`
        : `Supersession loop: ${g.map(label).join(', ')} replace each other in a circle. Fix the supersession rows.`,
    partIds: g,
  }));
}

function depthProblem(partIds: string[], maxDepth: number, label: (id: string) => string): SupersessionProblem {
  return {
    kind: 'depth_limit',
    message: `Stopped following supersessions after ${maxDepth} steps at ${partIds.map(label).join(', ')}; the chain may go on.`,
    partIds,
  };
}

interface WalkState {
  partId: string;
  quantity: number;
  interchange: Interchange;
  conditions: string[];
  depth: number;
  path: string[];
}

/** Single fillers of `start` (itself first) and the kits met on the way (not expanded here). */
function singleClosure(
  start: string,
  index: SupersessionIndex,
  maxDepth: number,
): { singles: WalkState[]; kits: Array<{ at: WalkState; edges: readonly SupersessionEdge[] }>; limited: string[] } {
  const first: WalkState = { partId: start, quantity: 1, interchange: 'two_way', conditions: [], depth: 0, path: [start] };
  const singles: WalkState[] = [first];
  const kits: Array<{ at: WalkState; edges: readonly SupersessionEdge[] }> = [];
  const limited: string[] = [];
  const seen = new Set([start]);
  const visit = (s: WalkState, partId: string, quantity: number, interchange: Interchange, conditions: string[]) => {
    if (seen.has(partId)) return;
    seen.add(partId);
    singles.push({ partId, quantity, interchange, conditions, depth: s.depth + 1, path: [...s.path, partId] });
  };
  for (let q = 0; q < singles.length; q++) {
    const s = singles[q];
    const outs = index.out.get(s.partId) ?? EMPTY;
    const backs = (index.in.get(s.partId) ?? EMPTY).filter(
      (e) => e.interchange === 'two_way' && e.quantity === 1 && (index.out.get(e.fromPartId)?.length ?? 0) === 1,
    );
    if (outs.length + backs.length === 0) continue;
    if (s.depth >= maxDepth) {
      // Only a real cut-off counts: neighbours already seen (a loop, the way back) are not lost.
      const lost = outs.length > 1 || outs.some((e) => !seen.has(e.toPartId)) || backs.some((e) => !seen.has(e.fromPartId));
      if (lost) limited.push(s.partId);
      continue;
    }
    if (outs.length === 1) {
      const e = outs[0];
      visit(s, e.toPartId, s.quantity * e.quantity, weakest(s.interchange, e.interchange), withCondition(s.conditions, e));
    } else if (outs.length > 1) {
      kits.push({ at: s, edges: outs });
    }
    for (const e of backs) visit(s, e.fromPartId, s.quantity, s.interchange, s.conditions);
  }
  return { singles, kits, limited };
}

/** A walk state as a filler; for kit members, `base` is the path to the member, whose terms carry over. */
function toFillerPart(
  s: WalkState,
  base?: { quantity: number; interchange: Interchange; conditions: string[]; path: string[] },
): FillerPart {
  if (!base) {
    return { partId: s.partId, quantity: s.quantity, interchange: s.interchange, conditions: s.conditions, depth: s.depth, path: s.path };
  }
  const conditions = [...base.conditions];
  for (const c of s.conditions) if (!conditions.includes(c)) conditions.push(c);
  return {
    partId: s.partId,
    quantity: s.quantity * base.quantity,
    interchange: weakest(base.interchange, s.interchange),
    conditions,
    depth: s.depth + base.path.length - 1,
    path: [...base.path.slice(0, -1), ...s.path],
  };
}

function fillersWithIndex(
  partId: string,
  index: SupersessionIndex,
  maxDepth: number,
): { result: FillerResult; limited: string[] } {
  const { singles, kits, limited } = singleClosure(partId, index, maxDepth);
  const sets: FillerSet[] = singles.map((s) => {
    const part = toFillerPart(s);
    return {
      kitOf: null,
      parts: [{ partId: s.partId, quantity: s.quantity, alternatives: [part] }],
      interchange: s.interchange,
      conditions: s.conditions,
      depth: s.depth,
    };
  });
  for (const { at, edges } of kits) {
    let interchange = at.interchange;
    let conditions = at.conditions;
    const parts: KitMember[] = edges.map((e) => {
      interchange = weakest(interchange, e.interchange);
      conditions = withCondition(conditions, e);
      const quantity = at.quantity * e.quantity;
      const base = {
        quantity,
        interchange: weakest(at.interchange, e.interchange),
        conditions: withCondition(at.conditions, e),
        path: [...at.path, e.toPartId],
      };
      const member = singleClosure(e.toPartId, index, Math.max(0, maxDepth - at.depth - 1));
      limited.push(...member.limited);
      // Nested kits inside a kit member are not expanded: such data is rare and the member itself still fills.
      return { partId: e.toPartId, quantity, alternatives: member.singles.map((m) => toFillerPart(m, base)) };
    });
    sets.push({ kitOf: at.partId, parts, interchange, conditions, depth: at.depth + 1 });
  }
  return {
    result: { partId, fillers: singles.map((s) => s.partId), fillerSets: sets, problems: [] },
    limited,
  };
}

/**
 * What can fill a need for `partId`: single parts (`fillers`, with quantity and conditions in `fillerSets`)
 * and kits (`fillerSets` with `kitOf` set). Pass a prebuilt index when calling for many parts.
 */
export function fillersForPart(
  partId: string,
  edges: readonly SupersessionEdge[] | SupersessionIndex,
  options: { maxDepth?: number } = {},
): FillerResult {
  const index = asIndex(edges);
  const maxDepth = options.maxDepth ?? DEFAULT_MAX_DEPTH;
  const { result, limited } = fillersWithIndex(partId, index, maxDepth);
  const reached = new Set<string>();
  for (const set of result.fillerSets) for (const m of set.parts) for (const a of m.alternatives) reached.add(a.partId);
  const problems = loopProblems(loopsAmong(index, reached, reached), (id) => id);
  if (limited.length > 0) problems.push(depthProblem([...new Set(limited)], maxDepth, (id) => id));
  return { ...result, problems };
}

/** Resolves a typed number to its parts, the supersession chain both ways, current numbers and fillers. */
export function resolve(input: ResolveInput): ResolveResult {
  const parsed = parsePartNumber(input.query);
  if (!parsed.ok) throw parsed.error;
  const { key, folded } = parsed.value;
  const maxDepth = input.maxDepth ?? DEFAULT_MAX_DEPTH;
  const index = asIndex(input.edges);

  const firstNumberOf = new Map<string, string>();
  for (const n of input.numbers) if (!firstNumberOf.has(n.partId)) firstNumberOf.set(n.partId, n.number);
  const firstNumber = (id: string) => firstNumberOf.get(id) ?? '';
  const label = (id: string) => {
    const n = firstNumber(id);
    return n ? `${n} (part ${id})` : `part ${id}`;
  };

  const matches: ResolveMatch[] = [];
  const matched = new Set<string>();
  const exact: string[] = [];
  const alternate: string[] = [];
  for (const n of input.numbers) {
    if (n.key === key && !matched.has(n.partId)) {
      matched.add(n.partId);
      exact.push(n.partId);
      matches.push({ partId: n.partId, number: n.number, matchedBy: 'exact', interchange: null, depth: 0, conditions: [] });
    }
  }
  for (const n of input.numbers) {
    if (n.folded === folded && !matched.has(n.partId)) {
      matched.add(n.partId);
      alternate.push(n.partId);
      matches.push({
        partId: n.partId,
        number: n.number,
        matchedBy: 'alternate_number',
        interchange: null,
        depth: 0,
        conditions: [],
      });
    }
  }

  const problems: SupersessionProblem[] = [];
  if (exact.length > 1) {
    problems.push({
      kind: 'number_on_several_parts',
      message: `The number ${parsed.value.display} is recorded on ${exact.length} parts: ${exact.map(label).join('; ')}.`,
      partIds: [...exact],
    });
  }

  // Walk from the exact parts; only when nothing matched exactly, from the O/0 I/1 look-alikes.
  const seeds = exact.length > 0 ? exact : alternate;
  const chain: ChainStep[] = [];
  const limited = new Set<string>();

  /**
   * One breadth-first walk from the seeds, forward (to replacements: quantities multiply, a step to several
   * parts is a kit) or backward (to the parts replaced). Every part reached becomes a match once; every edge
   * walked is a chain step, except a backward edge already walked forward (inside a loop).
   */
  const walk = (direction: 'forward' | 'backward', walkedForward: ReadonlySet<string> | null) => {
    const fwd = direction === 'forward';
    const edgesOf = (id: string) => (fwd ? index.out : index.in).get(id) ?? EMPTY;
    const far = (e: SupersessionEdge) => (fwd ? e.toPartId : e.fromPartId);
    const seen = new Set<string>(seeds);
    const queue: WalkState[] = seeds.map((p) => ({ partId: p, quantity: 1, interchange: 'two_way', conditions: [], depth: 0, path: [p] }));
    for (let q = 0; q < queue.length; q++) {
      const s = queue[q];
      const edges = edgesOf(s.partId);
      if (edges.length === 0) continue;
      if (s.depth >= maxDepth) {
        if (edges.some((e) => !seen.has(far(e)))) limited.add(s.partId);
        continue;
      }
      for (const e of edges) {
        const to = far(e);
        if (fwd || !walkedForward?.has(to)) chain.push(step(e, s.depth + 1, direction));
        if (seen.has(to)) continue;
        seen.add(to);
        const next: WalkState = {
          partId: to,
          quantity: fwd ? s.quantity * e.quantity : 1,
          interchange: weakest(s.interchange, e.interchange),
          conditions: withCondition(s.conditions, e),
          depth: s.depth + 1,
          path: [...s.path, to],
        };
        queue.push(next);
        if (matched.has(to)) continue;
        matched.add(to);
        matches.push({
          partId: to,
          number: firstNumber(to),
          matchedBy: fwd ? 'replaced_by' : 'replaces',
          interchange: next.interchange,
          viaPartId: s.partId,
          ...(fwd && edges.length > 1 ? { kitOf: s.partId } : {}),
          depth: next.depth,
          conditions: next.conditions,
        });
      }
    }
    return { seen, queue };
  };
  const forward = walk('forward', null);
  const current = forward.queue.filter((s) => (index.out.get(s.partId) ?? EMPTY).length === 0).map((s) => s.partId);
  const backward = walk('backward', forward.seen);

  // Fillers of every seed, merged: a need for the number is met by a filler of any part carrying it.
  const fillers: string[] = [];
  const fillerSets: FillerSet[] = [];
  const seenSingle = new Set<string>();
  const seenKit = new Set<string>();
  for (const seed of seeds) {
    const { result, limited: l } = fillersWithIndex(seed, index, maxDepth);
    for (const id of l) limited.add(id);
    for (const set of result.fillerSets) {
      const id = set.kitOf ?? set.parts[0].partId;
      const seen = set.kitOf ? seenKit : seenSingle;
      if (seen.has(id)) continue;
      seen.add(id);
      fillerSets.push(set);
      if (!set.kitOf) fillers.push(id);
    }
  }

  const reached = new Set<string>([...forward.seen, ...backward.seen]);
  for (const set of fillerSets) for (const m of set.parts) for (const a of m.alternatives) reached.add(a.partId);
  problems.push(...loopProblems(loopsAmong(index, reached, reached), label));
  if (limited.size > 0) problems.push(depthProblem([...limited], maxDepth, label));

  return { query: input.query, key, matches, chain, current, fillers, fillerSets, problems };
}

function step(e: SupersessionEdge, depth: number, direction: ChainStep['direction']): ChainStep {
  return {
    ...(e.id !== undefined ? { id: e.id } : {}),
    fromPartId: e.fromPartId,
    toPartId: e.toPartId,
    interchange: e.interchange,
    note: e.note ?? null,
    quantity: e.quantity,
    depth,
    direction,
  };
}
