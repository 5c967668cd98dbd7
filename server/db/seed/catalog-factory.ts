// Fictional demo data: invented makers, models and numbers.
// The builder the demo catalog generator writes through: it hands out part numbers (invented makers,
// invented ordnance pattern, random NSNs in real supply classes), keeps keys and numbers unique, and
// collects assemblies, bill-of-materials lines and supersessions.
import { NumberBook, Rng } from './catalog-random';
import type {
  DemoAssembly,
  DemoBomLine,
  DemoCatalog,
  DemoPart,
  DemoPartNumber,
  DemoSupersession,
  Interchange,
  PartCategory,
  SafetyClass,
  SystemSlug,
} from './catalog-types';
import { SYSTEMS, systemBySlug, type VehicleCtx } from './catalog-vehicles';

export interface PartSpec {
  key: string;
  name: string;
  category: PartCategory;
  grams: number;
  /** Length, width, height in mm. */
  dims: readonly [number, number, number];
  system: SystemSlug;
  vehicle: VehicleCtx | null;
  specs?: Record<string, unknown>;
  /** When absent, written from the category and `where`. */
  description?: string;
  /** Words for "used in the ... of the KV-4" in the written description. */
  where?: string;
  safety?: SafetyClass;
  restricted?: boolean;
  /** Printed maker number; null for none; absent = allocate one in the vehicle's system range. */
  maker?: string | null;
  /** Extra numbers chosen by hand (claimed before any drawn ones). */
  numbers?: DemoPartNumber[];
  /** true = always, false = never, absent = by chance. */
  nsn?: boolean;
  ordnance?: boolean;
  vendor?: boolean;
  reproduction?: boolean;
  fsc?: string;
}

/** Invented sellers and remakers whose number styles appear in the demo data (for seller seeding or tooltips). */
export const DEMO_NUMBER_SOURCES: Readonly<Record<string, { name: string; kind: 'vendor' | 'reproduction' | 'maker' }>> = {
  'BBS-': { name: 'Brassbound Surplus Supply (fictional vendor)', kind: 'vendor' },
  'QH ': { name: 'Quarry Hill Motor Spares (fictional vendor)', kind: 'vendor' },
  'TRV/': { name: 'Tinplate & Rivet Depot (fictional vendor)', kind: 'vendor' },
  'FRW-': { name: 'Fernwick Reproductions (fictional remaker)', kind: 'reproduction' },
  'OPR ': { name: 'Old Post Remakes (fictional remaker)', kind: 'reproduction' },
  'HT-': { name: 'Harl & Tansey, hardware maker (fictional)', kind: 'maker' },
};

const RUBBER_BRAKE: ReadonlySet<PartCategory> = new Set(['brake_hose', 'boot', 'cylinder_kit', 'wheel_cylinder', 'master_cylinder', 'seal']);

const CATEGORY_SENTENCE: Record<PartCategory, string> = {
  brake_hose: 'Flexible hydraulic brake hose with crimped steel end fittings.',
  wheel_cylinder: 'Hydraulic wheel cylinder: cast body, two pistons, cups and boots.',
  master_cylinder: 'Hydraulic master cylinder with integral fluid reservoir.',
  brake_shoe: 'Drum brake shoe or lining.',
  brake_line: 'Steel brake tube, double flared at both ends, with inverted-flare tube nuts.',
  brake_fitting: 'Hydraulic fitting for inverted-flare tube nuts.',
  cylinder_kit: 'Repair kit for rebuilding a hydraulic cylinder.',
  boot: 'Rubber dust boot.',
  clamp: 'Clamp.',
  clip: 'Spring steel clip.',
  fastener: 'Standard threaded fastener.',
  washer: 'Washer.',
  sealing_washer: 'Soft copper sealing (crush) washer: fit new, never reuse.',
  woodruff_key: 'Woodruff key.',
  cotter_pin: 'Steel cotter pin.',
  seal: 'Seal.',
  gasket: 'Gasket.',
  bearing: 'Bearing or bushing.',
  spring: 'Spring.',
  bracket: 'Steel bracket.',
  pedal: 'Pedal.',
  linkage: 'Linkage part.',
  lamp: 'Lamp unit.',
  switch: 'Switch.',
  housing: 'Casting or housing.',
  shaft: 'Shaft.',
  gear: 'Gear.',
  filter: 'Filter or strainer.',
  hose: 'Flexible hose.',
  weapon_mount: 'Display mount for a deactivated display item; nothing live.',
  generic: '',
};

/**
 * Supply class for a drawn NSN. source: Federal Supply Classification H2 names, via REFERENCES.md.
 * Brake lines and brake parts without a closer class go to 2530; seals and gaskets to 5330.
 */
export function fscFor(category: PartCategory, system: SystemSlug): string {
  switch (category) {
    case 'brake_hose':
    case 'hose':
      return '4720';
    case 'brake_fitting':
      return '4730';
    case 'clamp':
      return system === 'brakes' || system === 'steering' || system === 'electrical' ? '5340' : '4730';
    case 'clip':
      return '5340';
    case 'fastener':
      return '5306';
    case 'washer':
    case 'sealing_washer':
      return '5310';
    case 'woodruff_key':
    case 'cotter_pin':
      return '5315';
    case 'seal':
    case 'gasket':
      return '5330';
    case 'lamp':
      return '6220';
    case 'weapon_mount':
      return '2540';
    default:
      return systemBySlug(system).fsc;
  }
}

export function safetyFor(system: SystemSlug): SafetyClass {
  if (system === 'brakes') return 'brake';
  if (system === 'steering') return 'steering';
  return 'none';
}

const ORDNANCE_LETTERS = 'ABCDEFGHKLMNPRT';

export class CatalogFactory {
  readonly rng: Rng;
  readonly book = new NumberBook();
  private readonly parts = new Map<string, DemoPart>();
  private readonly partSystems = new Map<string, SystemSlug>();
  private readonly assemblies = new Map<string, DemoAssembly>();
  private readonly lines: DemoBomLine[] = [];
  private readonly edges: DemoSupersession[] = [];
  private readonly nextBody = new Map<string, number>();

  constructor(seed: number) {
    this.rng = new Rng(seed);
  }

  hasPart(key: string): boolean {
    return this.parts.has(key);
  }

  part(key: string): DemoPart {
    const p = this.parts.get(key);
    if (!p) throw new Error(`No demo part ${key}.`);
    return p;
  }

  systemOf(key: string): SystemSlug {
    const s = this.partSystems.get(key);
    if (!s) throw new Error(`No demo part ${key}.`);
    return s;
  }

  makerOf(key: string): string | null {
    return this.part(key).numbers.find((x) => x.kind === 'maker')?.number ?? null;
  }

  /** Next free maker number in the vehicle's range for the system (gaps, as real number blocks have). */
  allocateMaker(v: VehicleCtx, system: SystemSlug, owner: string): string {
    const slot = `${v.code}:${system}`;
    return this.book.draw(() => {
      const body = (this.nextBody.get(slot) ?? v.makerBase(system)) + this.rng.int(1, 7);
      this.nextBody.set(slot, body);
      return v.makerNumber(body);
    }, owner);
  }

  ordnanceNumber(system: SystemSlug, owner: string): string {
    const group = systemBySlug(system).group;
    // Invented pattern: D + system group + letter + five digits. About one in ten uses letter O or I,
    // which people retype as 0 and 1: search must still find them.
    return this.book.draw(() => {
      const letter = this.rng.chance(0.1) ? this.rng.pick(['O', 'I']) : this.rng.pick([...ORDNANCE_LETTERS]);
      return `D${group}-${letter}${this.rng.digits(5)}`;
    }, owner);
  }

  nsn(fsc: string, owner: string): string {
    // source: NATO Codification System, via REFERENCES.md: FSC + NIIN (NCB code 00/01 = United States + 7 digits).
    return this.book.draw(() => {
      const ncb = this.rng.chance(0.8) ? '00' : '01';
      const rest = this.rng.digits(7);
      return `${fsc}-${ncb}-${rest.slice(0, 3)}-${rest.slice(3)}`;
    }, owner);
  }

  vendorNumber(owner: string): string {
    return this.book.draw(() => {
      switch (this.rng.int(0, 2)) {
        case 0:
          return `BBS-${this.rng.int(1000, 99999)}`;
        case 1:
          return `QH ${this.rng.pick(['A', 'B', 'C', 'D', 'E', 'O'])}${this.rng.digits(4)}`;
        default:
          return `TRV/${this.rng.digits(4)}`;
      }
    }, owner);
  }

  reproductionNumber(maker: string | null, owner: string): string {
    const body = maker?.replace(/[^0-9]/g, '') ?? '';
    return this.book.draw(() => {
      if (body !== '' && this.rng.chance(0.6)) return `FRW-${body}R${this.rng.chance(0.3) ? String(this.rng.int(2, 9)) : ''}`;
      return `OPR ${this.rng.digits(3)}-${this.rng.digits(3)}`;
    }, owner);
  }

  addPart(s: PartSpec): string {
    if (this.parts.has(s.key)) throw new Error(`Duplicate demo part key ${s.key}.`);
    const numbers: DemoPartNumber[] = [];
    const push = (number: string, kind: DemoPartNumber['kind']) => numbers.push({ number, kind });
    // Hand-picked numbers first, so a drawn number can never take one of them.
    let maker: string | null = null;
    if (typeof s.maker === 'string') maker = this.book.claim(s.maker, s.key);
    for (const x of s.numbers ?? []) this.book.claim(x.number, s.key);
    if (s.maker === undefined && s.vehicle) maker = this.allocateMaker(s.vehicle, s.system, s.key);
    if (maker !== null) push(maker, 'maker');
    for (const x of s.numbers ?? []) push(x.number, x.kind);

    const onVehicle = s.vehicle !== null;
    const rubberBrake = s.system === 'brakes' && RUBBER_BRAKE.has(s.category);
    const has = (kind: DemoPartNumber['kind']) => numbers.some((x) => x.kind === kind);
    if (!has('ordnance') && (s.ordnance ?? (onVehicle && this.rng.chance(0.45)))) push(this.ordnanceNumber(s.system, s.key), 'ordnance');
    if (!has('nsn') && (s.nsn ?? this.rng.chance(onVehicle ? 0.62 : 0.85))) push(this.nsn(s.fsc ?? fscFor(s.category, s.system), s.key), 'nsn');
    if (!has('vendor') && (s.vendor ?? this.rng.chance(0.14))) push(this.vendorNumber(s.key), 'vendor');
    if (!has('reproduction') && (s.reproduction ?? (onVehicle && this.rng.chance(rubberBrake ? 0.4 : 0.06)))) {
      push(this.reproductionNumber(maker, s.key), 'reproduction');
    }
    if (numbers.length === 0) push(this.vendorNumber(s.key), 'vendor');

    let description = s.description;
    if (description === undefined) {
      const where = s.where && s.vehicle ? ` Used in the ${s.where} of the ${s.vehicle.short}.` : '';
      const caution = rubberBrake ? ' Rubber ages even unused: old stock is for display or authenticity only.' : '';
      description = `${CATEGORY_SENTENCE[s.category] || `${s.name}.`}${where}${caution}`;
    }
    const part: DemoPart = {
      key: s.key,
      name: s.name,
      description,
      category: s.category,
      specs: s.specs ?? {},
      weightGrams: Math.max(1, Math.round(s.grams)),
      lengthMm: Math.max(1, Math.round(s.dims[0])),
      widthMm: Math.max(1, Math.round(s.dims[1])),
      heightMm: Math.max(1, Math.round(s.dims[2])),
      safetyClass: s.safety ?? safetyFor(s.system),
      numbers,
    };
    if (s.restricted) part.restricted = true;
    this.parts.set(s.key, part);
    this.partSystems.set(s.key, s.system);
    return s.key;
  }

  /** A new part like `fromKey` under a new number (a revision or a replacement), not on any parts list. */
  addSuccessor(fromKey: string, key: string, o: { maker?: string | null; name?: string; description?: string; vehicle: VehicleCtx | null }): string {
    const from = this.part(fromKey);
    return this.addPart({
      key,
      name: o.name ?? from.name,
      category: from.category as PartCategory,
      grams: from.weightGrams,
      dims: [from.lengthMm, from.widthMm, from.heightMm],
      system: this.systemOf(fromKey),
      vehicle: o.vehicle,
      specs: { ...from.specs },
      description: o.description ?? `${from.description} Later issue under a new number.`.trim(),
      safety: from.safetyClass,
      restricted: from.restricted,
      maker: o.maker,
    });
  }

  addAssembly(a: Omit<DemoAssembly, 'diagramSvg' | 'callouts'> & Partial<Pick<DemoAssembly, 'diagramSvg' | 'callouts'>>): string {
    if (this.assemblies.has(a.key)) throw new Error(`Duplicate demo assembly key ${a.key}.`);
    this.assemblies.set(a.key, { diagramSvg: null, callouts: [], ...a });
    return a.key;
  }

  setDiagram(key: string, svg: string, callouts: DemoAssembly['callouts']): void {
    const a = this.assemblies.get(key);
    if (!a) throw new Error(`No demo assembly ${key}.`);
    a.diagramSvg = svg;
    a.callouts = callouts;
  }

  addLine(l: Partial<DemoBomLine> & Pick<DemoBomLine, 'assemblyKey' | 'callout' | 'partKey'>): void {
    this.lines.push({
      quantity: 1,
      notes: null,
      serialFrom: null,
      serialTo: null,
      builtFrom: null,
      builtTo: null,
      variants: null,
      ...l,
    });
  }

  linesOf(assemblyKey: string): DemoBomLine[] {
    return this.lines.filter((l) => l.assemblyKey === assemblyKey);
  }

  hasReplacement(fromKey: string): boolean {
    return this.edges.some((e) => e.fromPartKey === fromKey);
  }

  supersede(fromPartKey: string, toPartKey: string, interchange: Interchange, note: string | null = null, quantity = 1): void {
    if (interchange === 'conditional' && !note) throw new Error(`A conditional supersession needs its condition (${fromPartKey}).`);
    this.edges.push({ fromPartKey, toPartKey, interchange, note, quantity });
  }

  finish(vehicles: DemoCatalog['vehicles']): DemoCatalog {
    for (const l of this.lines) {
      if (!this.assemblies.has(l.assemblyKey)) throw new Error(`Line on unknown assembly ${l.assemblyKey}.`);
      this.part(l.partKey);
    }
    for (const e of this.edges) {
      this.part(e.fromPartKey);
      this.part(e.toPartKey);
    }
    return {
      vehicles,
      systems: SYSTEMS.map(({ slug, name, sortOrder }) => ({ slug, name, sortOrder })),
      assemblies: [...this.assemblies.values()],
      parts: [...this.parts.values()],
      bomLines: this.lines,
      supersessions: this.edges,
    };
  }
}
