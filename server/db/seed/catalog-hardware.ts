// Fictional demo data: invented makers, models and numbers.
// Common hardware shared by both demo vehicles: cap screws, nuts, washers, cotter pins, Woodruff keys, hose
// clamps, clevis pins and the like. Sizes and designations follow the public standards; the NSNs are drawn at
// random in the real supply classes and are not real stock numbers.
import { formatInchFraction } from '../../domain/standards/unified-threads';
import type { CatalogFactory } from './catalog-factory';

export interface HardwarePool {
  /** Part key for a hardware reference such as "bolt 3/8-16 x 1-1/4", "lw 3/8", "cotter 1/8 x 1", "key 606". */
  key(ref: string): string;
  refs: readonly string[];
}

interface ThreadRow {
  size: string;
  dIn: number;
  tpi: number;
  series: 'UNC' | 'UNF';
}

// source: ASME B1.1, via REFERENCES.md (sizes 1/4 to 1/2 and their coarse/fine pitches)
const THREADS: readonly ThreadRow[] = [
  { size: '1/4', dIn: 0.25, tpi: 20, series: 'UNC' },
  { size: '1/4', dIn: 0.25, tpi: 28, series: 'UNF' },
  { size: '5/16', dIn: 0.3125, tpi: 18, series: 'UNC' },
  { size: '5/16', dIn: 0.3125, tpi: 24, series: 'UNF' },
  { size: '3/8', dIn: 0.375, tpi: 16, series: 'UNC' },
  { size: '3/8', dIn: 0.375, tpi: 24, series: 'UNF' },
  { size: '7/16', dIn: 0.4375, tpi: 20, series: 'UNF' },
  { size: '1/2', dIn: 0.5, tpi: 13, series: 'UNC' },
  { size: '1/2', dIn: 0.5, tpi: 20, series: 'UNF' },
];

const BOLT_LENGTHS: Record<string, number[]> = {
  '1/4-20': [0.5, 0.75, 1],
  '1/4-28': [0.75, 1],
  '5/16-18': [0.75, 1, 1.25],
  '5/16-24': [0.75, 1, 1.5],
  '3/8-16': [1, 1.25, 1.5, 2, 2.5],
  '3/8-24': [1, 1.25, 1.5, 2, 3.5],
  '7/16-20': [1.25, 1.5, 2],
  '1/2-13': [1.5, 2, 3],
  '1/2-20': [1.5, 2, 2.5, 3],
};

// source: ASME B18.8.1, via REFERENCES.md (nominal sizes 1/16 to 3/8); lengths are common stock lengths.
const COTTER_PINS: ReadonlyArray<[string, number[]]> = [
  ['1/16', [0.5, 0.75]],
  ['3/32', [0.75, 1]],
  ['1/8', [0.75, 1, 1.25, 1.5]],
  ['5/32', [1, 1.5]],
  ['3/16', [1.25, 1.5, 2]],
  ['1/4', [1.5, 2]],
  ['5/16', [2]],
  ['3/8', [2.5]],
];

// source: ASME B17.2-1967, via REFERENCES.md (key numbers in the confirmed table)
const WOODRUFF_KEYS = ['202', '406', '505', '606', '608', '808', '810'];

const STEEL_G_PER_CM3 = 7.85;
const IN = 25.4;
const rodGrams = (dIn: number, lenIn: number) => Math.PI * ((dIn * 2.54) / 2) ** 2 * (lenIn * 2.54) * STEEL_G_PER_CM3;
const frac = (x: number) => formatInchFraction(x);

export function hardwareKey(ref: string): string {
  return `hw.${ref.toLowerCase().replace(/\//g, '-').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '')}`;
}

export function buildHardware(f: CatalogFactory): HardwarePool {
  const refs: string[] = [];
  const add = (ref: string, spec: Omit<Parameters<CatalogFactory['addPart']>[0], 'key' | 'vehicle' | 'system'>) => {
    refs.push(ref);
    f.addPart({ key: hardwareKey(ref), vehicle: null, system: 'frame', ...spec });
  };

  for (const t of THREADS) {
    const thread = `${t.size}-${t.tpi} ${t.series}`;
    for (const len of BOLT_LENGTHS[`${t.size}-${t.tpi}`]) {
      const grade = t.size === '1/2' && t.series === 'UNF' ? 8 : 5;
      // Cap screws are FSC 5305, bolts 5306 (both in REFERENCES.md); fine threads here are sold as bolts.
      const isScrew = t.series === 'UNC';
      add(`bolt ${t.size}-${t.tpi} x ${frac(len)}`, {
        name: `${isScrew ? 'Screw, cap, hexagon head' : 'Bolt, machine, hexagon head'}, ${thread} x ${frac(len)}`,
        category: 'fastener',
        grams: rodGrams(t.dIn, len) + rodGrams(t.dIn * 1.6, t.dIn * 0.65),
        dims: [(len + t.dIn * 0.65) * IN, t.dIn * 1.5 * IN, t.dIn * 1.5 * IN],
        specs: { thread, lengthIn: len, grade, head: 'hex' },
        description: `Hex head ${isScrew ? 'cap screw' : 'bolt'}, ${thread} thread, ${frac(len)} in long under the head, SAE grade ${grade}.`,
        // SAE J429 grade designation, from memory (the grade system is not in REFERENCES.md).
        numbers: [{ number: `SAE J429 GR${grade} ${thread} X ${frac(len)}`, kind: 'hardware_standard' }],
        fsc: isScrew ? '5305' : '5306',
        maker: null,
      });
    }
    const nutH = t.dIn * 0.875;
    add(`nut ${t.size}-${t.tpi}`, {
      name: `Nut, plain, hexagon, ${thread}`,
      category: 'fastener',
      grams: rodGrams(t.dIn * 1.7, nutH) - rodGrams(t.dIn, nutH),
      dims: [t.dIn * 1.6 * IN, t.dIn * 1.5 * IN, nutH * IN],
      specs: { thread, lengthIn: Number(nutH.toFixed(3)), grade: 5, style: 'hex' },
      description: `Plain hex nut, ${thread}.`,
      // ASME B18.2.2 covers inch hex nuts (from memory).
      numbers: [{ number: `ASME B18.2.2 HEX NUT ${thread}`, kind: 'hardware_standard' }],
      fsc: '5310',
      maker: null,
    });
    if (t.series === 'UNF' && t.dIn >= 0.375) {
      add(`castle ${t.size}-${t.tpi}`, {
        name: `Nut, plain, slotted (castellated), ${thread}`,
        category: 'fastener',
        grams: (rodGrams(t.dIn * 1.7, nutH * 1.25) - rodGrams(t.dIn, nutH * 1.25)) * 0.9,
        dims: [t.dIn * 1.6 * IN, t.dIn * 1.5 * IN, nutH * 1.25 * IN],
        specs: { thread, lengthIn: Number((nutH * 1.25).toFixed(3)), style: 'slotted' },
        description: `Slotted hex nut, ${thread}, locked with a cotter pin through the bolt.`,
        numbers: [{ number: `ASME B18.2.2 SLOTTED NUT ${thread}`, kind: 'hardware_standard' }],
        fsc: '5310',
        maker: null,
      });
    }
  }
  add('jam 3/8-24', {
    name: 'Nut, plain, hexagon, jam, 3/8-24 UNF',
    category: 'fastener',
    grams: 6,
    dims: [15, 14, 6],
    specs: { thread: '3/8-24 UNF', lengthIn: 0.219, style: 'jam' },
    description: 'Thin hex jam nut, 3/8-24 UNF, locks an adjustable rod or clevis.',
    numbers: [{ number: 'ASME B18.2.2 JAM NUT 3/8-24 UNF', kind: 'hardware_standard' }],
    fsc: '5310',
    maker: null,
  });

  for (const size of ['1/4', '5/16', '3/8', '7/16', '1/2']) {
    const d = Number(eval0(size));
    add(`lw ${size}`, {
      name: `Washer, lock, helical spring, ${size}`,
      category: 'washer',
      grams: d * 12,
      dims: [d * 1.8 * IN, d * 1.8 * IN, d * 0.25 * IN],
      specs: { nominalIn: d, type: 'helical_spring' },
      // ASME B18.21.1 covers helical spring lock washers (from memory).
      numbers: [{ number: `ASME B18.21.1 LOCK WASHER ${size}`, kind: 'hardware_standard' }],
      fsc: '5310',
      maker: null,
    });
    add(`fw ${size}`, {
      name: `Washer, flat, ${size}`,
      category: 'washer',
      grams: d * 14,
      dims: [d * 2.2 * IN, d * 2.2 * IN, 1.6],
      specs: { nominalIn: d, type: 'plain' },
      // ASME B18.22.1 covers plain washers (from memory).
      numbers: [{ number: `ASME B18.22.1 FLAT WASHER ${size}`, kind: 'hardware_standard' }],
      fsc: '5310',
      maker: null,
    });
  }

  for (const [nominal, lengths] of COTTER_PINS) {
    const d = Number(eval0(nominal));
    for (const len of lengths) {
      add(`cotter ${nominal} x ${frac(len)}`, {
        name: `Pin, cotter, ${nominal} x ${frac(len)}`,
        category: 'cotter_pin',
        // Two half-round legs make one round of the nominal diameter, plus the eye.
        grams: Math.max(1, rodGrams(d, len + d * 3) * 0.85),
        dims: [(len + d * 2) * IN, d * 2 * IN, d * IN],
        specs: { nominal, lengthIn: len },
        description: `Steel cotter pin, ${nominal} nominal, ${frac(len)} in long. Fit a new pin whenever one is removed.`,
        numbers: [{ number: `ASME B18.8.1 COTTER ${nominal} X ${frac(len)}`, kind: 'hardware_standard' }],
        fsc: '5315',
        maker: null,
      });
    }
  }

  for (const keyNumber of WOODRUFF_KEYS) {
    // source: ASME B17.2-1967, via REFERENCES.md: last two digits = diameter in 1/8 in, the rest = width in 1/32 in.
    const widthIn = Number(keyNumber.slice(0, -2)) / 32;
    const diaIn = Number(keyNumber.slice(-2)) / 8;
    add(`key ${keyNumber}`, {
      name: `Key, Woodruff, No. ${keyNumber} (${frac(widthIn)} x ${frac(diaIn)})`,
      category: 'woodruff_key',
      grams: Math.max(1, rodGrams(diaIn * 0.7, widthIn) * 1.2),
      dims: [diaIn * IN, widthIn * IN, diaIn * 0.45 * IN],
      specs: { keyNumber },
      description: `Woodruff key No. ${keyNumber}, ${frac(widthIn)} in wide, ${frac(diaIn)} in nominal diameter.`,
      numbers: [{ number: keyNumber, kind: 'hardware_standard' }],
      fsc: '5315',
      maker: null,
    });
  }

  for (const hoseIn of [0.75, 1, 1.25, 1.5, 1.75, 2, 2.5]) {
    add(`hclamp ${frac(hoseIn)}`, {
      name: `Clamp, hose, screw tightened band, ${frac(hoseIn)} in hose`,
      category: 'clamp',
      grams: 10 + hoseIn * 12,
      dims: [hoseIn * 1.6 * IN, hoseIn * 1.3 * IN, 13],
      specs: { hoseOdIn: hoseIn },
      description: `Band clamp for ${frac(hoseIn)} in coolant, fuel or air hose.`,
      maker: f.book.free(() => `HT-${f.rng.int(4000, 4999)}`, `hclamp ${hoseIn}`),
      nsn: true,
      fsc: '4730',
    });
  }

  for (const [dia, len] of [
    [0.3125, 1],
    [0.375, 1.125],
    [0.375, 1.5],
    [0.5, 1.5],
  ] as const) {
    add(`clevis ${frac(dia)} x ${frac(len)}`, {
      name: `Pin, clevis, ${frac(dia)} x ${frac(len)}`,
      category: 'linkage',
      grams: rodGrams(dia, len) + 3,
      dims: [(len + 0.15) * IN, dia * 1.5 * IN, dia * 1.5 * IN],
      specs: { diameterIn: dia, lengthIn: len },
      description: `Headed clevis pin ${frac(dia)} x ${frac(len)} in, drilled for a cotter pin.`,
      // ASME B18.8.1 covers clevis pins as well as cotter pins (from memory).
      numbers: [{ number: `ASME B18.8.1 CLEVIS ${frac(dia)} X ${frac(len)}`, kind: 'hardware_standard' }],
      fsc: '5315',
      maker: null,
    });
  }

  for (const angle of ['straight', '45 degree', '90 degree']) {
    add(`grease ${angle}`, {
      name: `Fitting, lubrication, ${angle}, 1/4-28 taper thread`,
      category: 'generic',
      grams: 5,
      dims: [18, 9, 9],
      specs: { thread: '1/4-28', angle },
      description: `Grease fitting, ${angle}, 1/4-28 taper thread.`,
      maker: f.book.free(() => `HT-${f.rng.int(1000, 1999)}`, `grease ${angle}`),
      nsn: true,
      fsc: '4730',
    });
  }

  for (const shaftIn of [0.5, 0.625, 0.75, 1]) {
    add(`snap ${frac(shaftIn)}`, {
      name: `Ring, retaining, external, ${frac(shaftIn)} shaft`,
      category: 'clip',
      grams: 1 + shaftIn * 3,
      dims: [shaftIn * 1.3 * IN, shaftIn * 1.3 * IN, 1.2],
      specs: { shaftIn },
      maker: f.book.free(() => `HT-${f.rng.int(6000, 6999)}`, `snap ${shaftIn}`),
      nsn: true,
    });
  }

  for (const boreIn of [0.5, 0.625, 0.75]) {
    add(`gasket-washer ${frac(boreIn)}`, {
      name: `Washer, sealing, copper, ${frac(boreIn)} bore`,
      category: 'sealing_washer',
      grams: 2 + boreIn * 4,
      dims: [boreIn * 1.6 * IN, boreIn * 1.6 * IN, 1.5],
      specs: { boreIn, material: 'copper' },
      description: `Copper crush washer for drain plugs and banjo fittings, ${frac(boreIn)} in bore. Fit new, never reuse.`,
      maker: f.book.free(() => `HT-${f.rng.int(7000, 7999)}`, `gasket-washer ${boreIn}`),
      nsn: true,
    });
  }

  const known = new Set(refs.map(hardwareKey));
  return {
    refs,
    key(ref: string): string {
      const k = hardwareKey(ref);
      if (!known.has(k)) throw new Error(`No demo hardware "${ref}".`);
      return k;
    },
  };
}

/** "5/16" -> 0.3125 (only simple fractions appear in the tables above). */
function eval0(fraction: string): number {
  const [a, b] = fraction.split('/').map(Number);
  return b ? a / b : a;
}
