// Lays a supersession component out left (older) to right (newer): each part sits one column right of the
// newest part it replaces. An edge that closes a loop (a data error) is kept aside as a back edge, so a loop
// is still drawn, once, and the layout always ends.

export type LayoutEdge = { id?: string; fromPartId: string; toPartId: string };

export type ChainLayout<E extends LayoutEdge> = {
  /** Column and row of every part id. */
  position: Map<string, { column: number; row: number }>;
  columns: number;
  rows: number;
  /** Edges drawn left to right. */
  forward: E[];
  /** Edges that point back into a loop. */
  back: E[];
  /** Kits: a part replaced by several parts at once, with the members in the order drawn. */
  kits: Array<{ fromPartId: string; members: string[] }>;
};

export function layoutChain<E extends LayoutEdge>(partIds: readonly string[], edges: readonly E[]): ChainLayout<E> {
  const ids = [...new Set([...partIds, ...edges.flatMap((e) => [e.fromPartId, e.toPartId])])];
  const out = new Map<string, E[]>(ids.map((id) => [id, []]));
  const incoming = new Map<string, number>(ids.map((id) => [id, 0]));
  for (const e of edges) {
    out.get(e.fromPartId)!.push(e);
    incoming.set(e.toPartId, incoming.get(e.toPartId)! + 1);
  }

  // Depth-first from the oldest parts (no predecessor), then from whatever a pure loop left unvisited; an edge
  // to a part still on the stack closes a loop.
  const back = new Set<E>();
  const state = new Map<string, 'open' | 'done'>();
  const visit = (start: string) => {
    const stack: Array<{ id: string; next: number }> = [{ id: start, next: 0 }];
    state.set(start, 'open');
    while (stack.length) {
      const top = stack[stack.length - 1];
      const edgesOut = out.get(top.id)!;
      if (top.next >= edgesOut.length) {
        state.set(top.id, 'done');
        stack.pop();
        continue;
      }
      const e = edgesOut[top.next++];
      const s = state.get(e.toPartId);
      if (s === 'open') back.add(e);
      else if (s === undefined) {
        state.set(e.toPartId, 'open');
        stack.push({ id: e.toPartId, next: 0 });
      }
    }
  };
  for (const id of ids) if (incoming.get(id) === 0 && !state.has(id)) visit(id);
  for (const id of ids) if (!state.has(id)) visit(id);

  const forward = edges.filter((e) => !back.has(e));
  // Longest path from the oldest parts, in topological order of the loop-free edges.
  const indegree = new Map<string, number>(ids.map((id) => [id, 0]));
  for (const e of forward) indegree.set(e.toPartId, indegree.get(e.toPartId)! + 1);
  const column = new Map<string, number>(ids.map((id) => [id, 0]));
  const queue = ids.filter((id) => indegree.get(id) === 0);
  const order: string[] = [];
  while (queue.length) {
    const id = queue.shift()!;
    order.push(id);
    for (const e of forward) {
      if (e.fromPartId !== id) continue;
      column.set(e.toPartId, Math.max(column.get(e.toPartId)!, column.get(id)! + 1));
      indegree.set(e.toPartId, indegree.get(e.toPartId)! - 1);
      if (indegree.get(e.toPartId) === 0) queue.push(e.toPartId);
    }
  }

  // Rows: column by column, each part under the parts it replaces, so kit members stay side by side.
  const position = new Map<string, { column: number; row: number }>();
  const columns = ids.length ? Math.max(...column.values()) + 1 : 0;
  let rows = 0;
  for (let c = 0; c < columns; c++) {
    const inColumn = order.filter((id) => column.get(id) === c);
    const anchor = (id: string) => {
      const preds = forward.filter((e) => e.toPartId === id && position.has(e.fromPartId)).map((e) => position.get(e.fromPartId)!.row);
      return preds.length ? Math.min(...preds) : Number.POSITIVE_INFINITY;
    };
    const firstPred = (id: string) => forward.find((e) => e.toPartId === id)?.fromPartId ?? '';
    inColumn
      .map((id, i) => ({ id, i, anchor: anchor(id), pred: firstPred(id) }))
      .sort((a, b) => a.anchor - b.anchor || a.pred.localeCompare(b.pred) || a.i - b.i)
      .forEach(({ id }, row) => position.set(id, { column: c, row }));
    rows = Math.max(rows, inColumn.length);
  }

  const kits = ids
    .map((id) => ({ fromPartId: id, members: (out.get(id) ?? []).filter((e) => !back.has(e)).map((e) => e.toPartId) }))
    .filter((k) => k.members.length > 1)
    .map((k) => ({ ...k, members: [...k.members].sort((a, b) => position.get(a)!.row - position.get(b)!.row) }));

  return { position, columns, rows, forward, back: [...back], kits };
}
