// Fictional demo data: invented makers, models and numbers.
// Seeded randomness and the ledger of printed numbers for the demo catalog generator.
import { foldedKey } from '../../domain/part-number';

/** mulberry32: tiny, fast, and the same sequence on every platform for one seed. */
export class Rng {
  private state: number;

  constructor(seed: number) {
    this.state = seed >>> 0;
  }

  /** A float in [0, 1). */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  /** An integer in [lo, hi], both ends included. */
  int(lo: number, hi: number): number {
    return lo + Math.floor(this.next() * (hi - lo + 1));
  }

  chance(p: number): boolean {
    return this.next() < p;
  }

  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new Error('Rng.pick needs at least one item.');
    return items[Math.floor(this.next() * items.length)];
  }

  digits(count: number): string {
    let s = '';
    for (let i = 0; i < count; i++) s += String(this.int(0, 9));
    return s;
  }
}

/**
 * Every printed number in the demo catalog, by its confusion-folded key (the same key search matches on:
 * O -> 0, I -> 1, punctuation and leading zeros dropped). Keeping folded keys unique means a number typed any
 * which way still finds exactly one part, and the data-quality report shows no "number on several parts".
 */
export class NumberBook {
  private readonly byFolded = new Map<string, string>();

  has(printed: string): boolean {
    return this.byFolded.has(foldedKey(printed));
  }

  /** Records a number we chose by hand; a clash is a bug in the demo data, so it throws. */
  claim(printed: string, owner: string): string {
    const k = foldedKey(printed);
    const prior = this.byFolded.get(k);
    if (prior !== undefined) throw new Error(`Demo number "${printed}" (${owner}) clashes with "${prior}".`);
    this.byFolded.set(k, `${printed} (${owner})`);
    return printed;
  }

  /** Draws numbers from `make` until one is free, then records it. */
  draw(make: () => string, owner: string): string {
    return this.claim(this.free(make, owner), owner);
  }

  /** Draws numbers from `make` until one is free, without recording it (the caller claims it later). */
  free(make: () => string, owner: string): string {
    for (let i = 0; i < 200; i++) {
      const candidate = make();
      if (!this.has(candidate)) return candidate;
    }
    throw new Error(`Could not draw a free demo number for ${owner}.`);
  }
}
