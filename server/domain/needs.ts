/*
 * Needs arithmetic: what a restorer still has to buy, from a teardown checklist plus manual wants.
 */

export const teardownStatuses = ['not_inspected', 'reuse', 'refurbish', 'replace', 'missing', 'wrong_part'] as const;
export type TeardownStatus = (typeof teardownStatuses)[number];

export interface TeardownLine {
  lineId: string;
  partId: string;
  qtyPerAssembly: number;
  status: TeardownStatus;
  /** Correct, usable pieces of this part already in hand for this line. */
  usableOnHand: number;
}

export interface ManualWant {
  partId: string;
  quantity: number;
  /** Optional reference the caller keeps (e.g. a wants-list row id). */
  wantId?: string;
}

export type NeedSource =
  | { kind: 'teardown'; lineId: string; status: 'replace' | 'missing' | 'wrong_part'; quantity: number }
  | { kind: 'manual'; wantId?: string; quantity: number };

export interface Need {
  partId: string;
  quantity: number;
  sources: NeedSource[];
}

export interface NeedsResult {
  needs: Need[];
  /** Lines nobody has looked at yet: they may hide needs, so the UI should say so. */
  notInspectedLineIds: string[];
}

function fail(message: string): never {
  throw new RangeError(message);
}

function checkCount(value: number, name: string, allowZero: boolean): void {
  if (!Number.isSafeInteger(value) || value < (allowZero ? 0 : 1)) {
    fail(`${name} must be ${allowZero ? 'a non-negative' : 'a positive'} integer, got ${value}`);
  }
}

/** Units one teardown line asks for; reuse, refurbish and not yet inspected lines ask for none. */
export function neededForLine(line: TeardownLine): number {
  switch (line.status) {
    case 'replace':
    case 'missing':
    // A wrong part found in the assembly (an earlier repair's mistake) is not the part the line calls for:
    // it counts as a replacement; usableOnHand counts only correct pieces.
    case 'wrong_part':
      return Math.max(0, line.qtyPerAssembly - line.usableOnHand);
    case 'not_inspected':
    case 'reuse':
    case 'refurbish':
      return 0;
  }
}

/**
 * Needs from teardown lines and manual wants, one entry per part: quantities of the same part are summed
 * across lines and wants, keeping each line's and want's reference. Order: first appearance (lines, then wants).
 */
export function computeNeeds(lines: readonly TeardownLine[], wants: readonly ManualWant[] = []): NeedsResult {
  const byPart = new Map<string, Need>();
  const notInspectedLineIds: string[] = [];
  const seenLines = new Set<string>();
  const entry = (partId: string): Need => {
    let need = byPart.get(partId);
    if (!need) {
      need = { partId, quantity: 0, sources: [] };
      byPart.set(partId, need);
    }
    return need;
  };
  lines.forEach((line, i) => {
    const label = `lines[${i}]`;
    if (typeof line.lineId !== 'string' || line.lineId === '') fail(`${label}.lineId must be a non-empty string`);
    if (seenLines.has(line.lineId)) fail(`${label}.lineId ${line.lineId} appears twice`);
    seenLines.add(line.lineId);
    if (typeof line.partId !== 'string' || line.partId === '') fail(`${label}.partId must be a non-empty string`);
    checkCount(line.qtyPerAssembly, `${label}.qtyPerAssembly`, false);
    checkCount(line.usableOnHand, `${label}.usableOnHand`, true);
    if (!(teardownStatuses as readonly string[]).includes(line.status)) fail(`${label}.status ${String(line.status)} is not a teardown status`);
    if (line.status === 'not_inspected') notInspectedLineIds.push(line.lineId);
    const quantity = neededForLine(line);
    if (quantity === 0) return;
    const need = entry(line.partId);
    need.quantity += quantity;
    need.sources.push({
      kind: 'teardown',
      lineId: line.lineId,
      status: line.status as 'replace' | 'missing' | 'wrong_part',
      quantity,
    });
  });
  wants.forEach((want, i) => {
    const label = `wants[${i}]`;
    if (typeof want.partId !== 'string' || want.partId === '') fail(`${label}.partId must be a non-empty string`);
    checkCount(want.quantity, `${label}.quantity`, false);
    const need = entry(want.partId);
    need.quantity += want.quantity;
    need.sources.push(want.wantId === undefined ? { kind: 'manual', quantity: want.quantity } : { kind: 'manual', wantId: want.wantId, quantity: want.quantity });
  });
  return { needs: [...byPart.values()], notInspectedLineIds };
}
