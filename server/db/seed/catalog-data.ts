// Fictional demo data: invented makers, models and numbers.
// The demo catalog generator: plain data, no database code. Two invented vehicle models, their systems,
// assemblies (with exploded diagrams for the brakes), parts with numbers of every kind, parts lists with
// early/late effectivity, and supersessions including kits, consolidations, long chains and one deliberate
// loop for the data-quality report. Deterministic: a seeded generator gives the same catalog on every run.
import { ASSEMBLY_TEMPLATES, type AssemblyTemplate } from './catalog-assemblies';
import { buildBrakes, KV4_BRAKE_NUMBERS, KV4_PEDAL_CONDITION, ST25_BRAKE_NUMBERS } from './catalog-brakes';
import { CatalogFactory } from './catalog-factory';
import { buildHardware, type HardwarePool } from './catalog-hardware';
import type { DemoCatalog, Interchange, PartCategory } from './catalog-types';
import { systemBySlug, VEHICLES, type VehicleCtx } from './catalog-vehicles';

export type {
  DemoAssembly,
  DemoBomLine,
  DemoCatalog,
  DemoPart,
  DemoPartNumber,
  DemoSupersession,
  DemoSystem,
  DemoVehicle,
  Interchange,
  NumberKind,
  SafetyClass,
} from './catalog-types';

export const FICTIONAL_NOTICE =
  'Fictional demo data: the makers (Kestrelvale Motor Company, Stoverton Truck Works), vehicle models, part ' +
  'numbers, stock numbers and sellers in this catalog are invented for demonstration. Any likeness to real ' +
  'vehicles, companies or numbers is coincidental; hardware designations follow public standards.';

const SEED = 0x0d4ab1a2;

const slug = (s: string) =>
  s
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');

const pick = <T>(x: T | readonly [T, T], v: VehicleCtx): T => (Array.isArray(x) ? (v.code === 'kv4' ? x[0] : x[1]) : (x as T));

// ---- part keys the supersession set-pieces hang on (stable: derived from template names) ----
const CAM_GEAR_KV4 = 'kv4.engine.timing.gear-camshaft-timing-fiber';
const OIL_ELEMENT_ST25 = 'st25.engine.oil.element-oil-filter';
const THERMOSTAT_GASKET_KV4 = 'kv4.cooling.radiator.gasket-thermostat-housing';
const chainKey = (start: string, step: number) => `${start}-c${step}`;

/** The three parts that replace each other in a circle (A -> B -> C -> A), kept for the data-quality report. */
export const DELIBERATE_LOOP_PART_KEYS: readonly [string, string, string] = [
  THERMOSTAT_GASKET_KV4,
  `${THERMOSTAT_GASKET_KV4}-rev1`,
  `${THERMOSTAT_GASKET_KV4}-rev2`,
];

/**
 * Named keys the tests, the demo walkthrough and the browser test rely on.
 */
export const DEMO_KEYS = {
  /** Slug of vehicle 1, the 1/4-ton utility truck. */
  vehicle1Slug: VEHICLES.kv4.vehicle.slug,
  /** Slug of vehicle 2, the 2-1/2-ton 6x6 cargo truck. */
  vehicle2Slug: VEHICLES.st25.vehicle.slug,
  /** Assembly key of vehicle 1's master cylinder (has an exploded diagram). */
  masterCylinderAssembly: 'kv4:brakes.master-cylinder',
  /** Part key of vehicle 1's early master cylinder (callout 1, serials up to 4999). */
  masterCylinderPart: 'kv4.brakes.master-early',
  /** Part key of vehicle 1's late master cylinder (callout 1, serials from 5000). */
  masterCylinderLatePart: 'kv4.brakes.master-late',
  /** Printed maker number of the early master cylinder; superseded two-way by `replacementNumber`. */
  supersededNumber: KV4_BRAKE_NUMBERS.masterEarly,
  /** Printed maker number of the late master cylinder, the current number for the early one. */
  replacementNumber: KV4_BRAKE_NUMBERS.masterLate,
  /** Last early serial and first late serial of vehicle 1 (master cylinder, pedal, bracket, wheel cylinders). */
  lastEarlySerial: VEHICLES.kv4.lateSerial - 1,
  firstLateSerial: VEHICLES.kv4.lateSerial,
  /** Build date from which vehicle 1's front hoses are the late, either-side hose. */
  lateBuiltFrom: VEHICLES.kv4.lateBuilt,
  /** One-way step: early front wheel cylinder -> late one (late fits early vehicles, not the reverse). */
  oneWayOldNumber: KV4_BRAKE_NUMBERS.wheelCylFrontEarly,
  oneWayNewNumber: KV4_BRAKE_NUMBERS.wheelCylFrontLate,
  /** Conditional step: early pedal -> late pedal, only with the late bracket. */
  conditionalOldNumber: KV4_BRAKE_NUMBERS.pedalEarly,
  conditionalNewNumber: KV4_BRAKE_NUMBERS.pedalLate,
  conditionalNote: KV4_PEDAL_CONDITION,
  /** Start of a four-step chain (brake shoe) and the part that ends it (the current number). */
  chain4StartPartKey: 'kv4.brakes.shoe',
  chain4EndPartKey: chainKey('kv4.brakes.shoe', 4),
  chain4StartNumber: KV4_BRAKE_NUMBERS.shoe,
  chain4CurrentNumber: KV4_BRAKE_NUMBERS.shoeChain[3],
  /** Vehicle 2's rear hose starts another four-step chain. */
  chain4bStartPartKey: 'st25.brakes.hose-rear',
  chain4bCurrentNumber: ST25_BRAKE_NUMBERS.hoseRearChain[3],
  /** Kit: the early rear wheel cylinder is replaced by 2 cups + 2 boots + 1 spring. */
  kitFromPartKey: 'kv4.brakes.wheel-cyl-rear-early',
  kitFromNumber: KV4_BRAKE_NUMBERS.wheelCylRearEarly,
  /** Consolidation: the left and right early front hoses became one either-side hose. */
  consolidationToPartKey: 'kv4.brakes.hose-front',
  consolidationFromNumbers: [KV4_BRAKE_NUMBERS.hoseFrontLeftEarly, KV4_BRAKE_NUMBERS.hoseFrontRightEarly],
  /** A printed number with letter O where people type a zero, and how they type it. */
  lookalikeNumber: KV4_BRAKE_NUMBERS.masterEarlyOrdnance,
  lookalikeTypedAs: 'D06-020417',
  /** A printed number with letter I where people type a one, and how they type it. */
  lookalikeINumber: KV4_BRAKE_NUMBERS.masterLateVendor,
  lookalikeITypedAs: 'QH 126602',
  /** Winch assembly of vehicle 1: every line applies to variant `winchVariant` only. */
  winchAssembly: 'kv4:accessories.winch',
  winchVariant: VEHICLES.kv4.variantCodes.winch,
  /** Rear brake lines of vehicle 1: the frame line differs for the long-wheelbase variant. */
  rearLinesAssembly: 'kv4:brakes.rear-lines',
  longWheelbaseVariant: VEHICLES.kv4.variantCodes.long,
  /** Vehicle 2's rear lines (tandem axles, frame tee callout 13). */
  tandemRearLinesAssembly: 'st25:brakes.rear-lines',
  /** A restricted display-mount part (extra review when listed). */
  restrictedPartKey: 'kv4.accessories.display-mount.mount-pedestal-display-item-deactivated',
  /** A loop member, for the data-quality report. */
  loopPartKey: THERMOSTAT_GASKET_KV4,
} as const;

/** Template parts the set-pieces below use; random revisions and early/late splits leave them alone. */
const RESERVED = new Set([CAM_GEAR_KV4, OIL_ELEMENT_ST25, THERMOSTAT_GASKET_KV4]);

/** A plausible condition for a conditional replacement, by the kind of part. */
function conditionFor(category: PartCategory): string {
  switch (category) {
    case 'seal':
    case 'gasket':
      return 'Use with the revised gasket set only.';
    case 'shaft':
    case 'gear':
    case 'bearing':
      return 'Check the shaft diameter first: the revised part suits the late shaft only.';
    case 'bracket':
    case 'housing':
      return 'Needs the late mounting bracket; check the bolt holes before fitting.';
    case 'spring':
    case 'linkage':
    case 'lamp':
      return 'Fit in pairs: change both sides together.';
    default:
      return 'Fits only with the matching late mating part.';
  }
}

const NO_REVISION: ReadonlySet<PartCategory> = new Set(['weapon_mount']);

function interchangeDraw(f: CatalogFactory, category: PartCategory, weights: readonly [number, number]): { interchange: Interchange; note: string | null } {
  const r = f.rng.next();
  if (r < weights[0]) return { interchange: 'two_way', note: null };
  if (r < weights[0] + weights[1]) return { interchange: 'one_way', note: null };
  return { interchange: 'conditional', note: conditionFor(category) };
}

function buildTemplated(f: CatalogFactory, hw: HardwarePool, v: VehicleCtx): string[] {
  const assemblyKeys = new Map<string, { key: string; code: string; children: number }>();
  const perSystem = new Map<string, number>();
  const revisable: string[] = [];
  for (const tpl of ASSEMBLY_TEMPLATES as readonly AssemblyTemplate[]) {
    if (tpl.only && tpl.only !== v.code) continue;
    const sys = systemBySlug(tpl.system);
    let code: string;
    let parentKey: string | null = null;
    if (tpl.parent) {
      const parent = assemblyKeys.get(tpl.parent);
      if (!parent) throw new Error(`Template ${tpl.short} names unknown parent ${tpl.parent}.`);
      parent.children += 1;
      code = `${parent.code}.${parent.children}`;
      parentKey = parent.key;
    } else {
      const nth = (perSystem.get(tpl.system) ?? 0) + 1;
      perSystem.set(tpl.system, nth);
      code = `${sys.group}-${String(nth).padStart(2, '0')}`;
    }
    const name = pick(tpl.name, v);
    const key = f.addAssembly({
      key: `${v.code}:${tpl.short}`,
      vehicleSlug: v.vehicle.slug,
      systemSlug: tpl.system,
      parentKey,
      code,
      name,
      description: pick(tpl.description, v),
    });
    assemblyKeys.set(tpl.short, { key, code, children: 0 });
    const variants = tpl.variant === 'winch' ? [v.variantCodes.winch] : null;
    const where = name.charAt(0).toLowerCase() + name.slice(1);
    const baseKey = (pt: AssemblyTemplate['parts'][number]) => `${v.code}.${tpl.short}.${slug(pick(pt.name, v))}`;

    // About a third of the assemblies change one part at the early/late production split.
    const eligible = tpl.parts.map((pt, i) => ({ pt, i })).filter(({ pt }) => !NO_REVISION.has(pt.category) && !RESERVED.has(baseKey(pt)));
    const splitAt = !variants && eligible.length > 0 && f.rng.chance(0.35) ? f.rng.pick(eligible).i : -1;

    let callout = 0;
    tpl.parts.forEach((pt, i) => {
      callout += 1;
      const partName = pick(pt.name, v);
      const ds = pt.fixed ? 1 : Math.cbrt(v.scale);
      const spec = {
        name: partName,
        category: pt.category,
        grams: pt.fixed ? pt.grams : pt.grams * v.scale,
        dims: [pt.dims[0] * ds, pt.dims[1] * ds, pt.dims[2] * ds] as const,
        system: tpl.system,
        vehicle: v,
        specs: pt.specs,
        description: pt.description,
        where,
        safety: pt.safety,
        restricted: pt.restricted,
      };
      const quantity = pick(pt.qty ?? 1, v);
      const notes = pt.notes ?? null;
      if (i === splitAt) {
        const early = f.addPart({ ...spec, key: `${baseKey(pt)}-early`, name: `${partName}, early` });
        const late = f.addPart({ ...spec, key: `${baseKey(pt)}-late`, name: `${partName}, late` });
        const bySerial = f.rng.chance(0.6);
        const e = bySerial ? { serialTo: v.lateSerial - 1 } : { builtTo: v.lastEarlyBuilt };
        const l = bySerial ? { serialFrom: v.lateSerial } : { builtFrom: v.lateBuilt };
        f.addLine({ assemblyKey: key, callout: String(callout), partKey: early, quantity, notes, variants, ...e });
        f.addLine({ assemblyKey: key, callout: String(callout), partKey: late, quantity, notes, variants, ...l });
        const { interchange, note } = interchangeDraw(f, pt.category, [0.25, 0.6]);
        f.supersede(early, late, interchange, note);
      } else {
        const partKey = f.addPart({ ...spec, key: baseKey(pt) });
        f.addLine({ assemblyKey: key, callout: String(callout), partKey, quantity, notes, variants });
        if (!NO_REVISION.has(pt.category) && !RESERVED.has(partKey)) revisable.push(partKey);
      }
    });
    for (const [ref, qty, notes] of tpl.hw ?? []) {
      callout += 1;
      f.addLine({ assemblyKey: key, callout: String(callout), partKey: hw.key(ref), quantity: pick(qty, v), notes: notes ?? null, variants });
    }
  }
  return revisable;
}

/** Some parts were later issued under a new number (a revision letter or a fresh number). */
function addRevisions(f: CatalogFactory, v: VehicleCtx, candidates: readonly string[]): void {
  for (const from of candidates) {
    if (!f.rng.chance(0.22) || f.hasReplacement(from)) continue;
    const oldMaker = f.makerOf(from);
    const revised = oldMaker && f.rng.chance(0.5) ? v.revised(oldMaker, f.rng.pick(['A', 'B'])) : undefined;
    const to = f.addSuccessor(from, `${from}-r`, { vehicle: v, maker: revised !== undefined && !f.book.has(revised) ? revised : undefined });
    const { interchange, note } = interchangeDraw(f, f.part(from).category as PartCategory, [0.55, 0.3]);
    f.supersede(from, to, interchange, note);
  }
}

/** A chain of `steps` later numbers from `start`; explicit printed maker numbers where given. */
function addChain(f: CatalogFactory, v: VehicleCtx, start: string, kinds: readonly Interchange[], makers: readonly string[] = []): void {
  let prev = start;
  kinds.forEach((interchange, i) => {
    const key = chainKey(start, i + 1);
    f.addSuccessor(prev, key, {
      vehicle: v,
      maker: makers[i],
      description: `${f.part(start).description.replace(/ Later issue under a new number\.$/, '')} Issue ${i + 2} of this part under a new number.`,
    });
    f.supersede(prev, key, interchange, interchange === 'conditional' ? 'Fit with the matching retainer of the same issue.' : null);
    prev = key;
  });
}

/** Early parts lists gave makers' own numbers to standard hardware; both makers' numbers now point to one standard part. */
function addHardwareConsolidations(f: CatalogFactory, hw: HardwarePool): void {
  const refs = ['bolt 3/8-16 x 1-1/4', 'lw 3/8', 'cotter 1/8 x 1', 'key 606', 'nut 3/8-24', 'castle 1/2-20', 'clevis 3/8 x 1-1/8', 'fw 5/16'];
  refs.forEach((ref, i) => {
    const std = hw.key(ref);
    const part = f.part(std);
    for (const v of [VEHICLES.kv4, VEHICLES.st25]) {
      const maker = v.code === 'kv4' ? `KV-9${String(100 + i * 7).padStart(4, '0')}` : `ST 190${String(100 + i * 7).padStart(3, '0')}`;
      const legacy = f.addPart({
        key: `${v.code}.legacy-hardware.${std.slice(3)}`,
        name: part.name,
        category: part.category as PartCategory,
        grams: part.weightGrams,
        dims: [part.lengthMm, part.widthMm, part.heightMm],
        system: 'frame',
        vehicle: v,
        specs: { ...part.specs },
        description: `${v.vehicle.maker}'s own number for a standard part, printed in early parts lists; the standard part replaces it.`,
        maker,
        reproduction: false,
      });
      f.supersede(legacy, std, 'two_way', null);
    }
  });
}

export function buildDemoCatalog(): DemoCatalog {
  const f = new CatalogFactory(SEED);
  const hw = buildHardware(f);
  const kv = VEHICLES.kv4;
  const st = VEHICLES.st25;

  buildBrakes(f, hw, kv);
  buildBrakes(f, hw, st);
  const kvRevisable = buildTemplated(f, hw, kv);
  const stRevisable = buildTemplated(f, hw, st);
  addRevisions(f, kv, kvRevisable);
  addRevisions(f, st, stRevisable);
  addHardwareConsolidations(f, hw);

  // Chains of four and five steps, with one-way steps that search must never walk backwards.
  addChain(f, kv, DEMO_KEYS.chain4StartPartKey, ['two_way', 'two_way', 'one_way', 'two_way'], KV4_BRAKE_NUMBERS.shoeChain);
  addChain(f, st, DEMO_KEYS.chain4bStartPartKey, ['two_way', 'one_way', 'two_way', 'two_way'], ST25_BRAKE_NUMBERS.hoseRearChain);
  addChain(f, kv, CAM_GEAR_KV4, ['one_way', 'two_way', 'conditional', 'two_way']);
  addChain(f, st, OIL_ELEMENT_ST25, ['two_way', 'two_way', 'one_way', 'two_way', 'two_way']);

  // The one deliberate loop: a data error on purpose, so the data-quality report has something to show.
  const [a, b, c] = DELIBERATE_LOOP_PART_KEYS;
  f.addSuccessor(a, b, { vehicle: kv });
  f.addSuccessor(a, c, { vehicle: kv });
  f.supersede(a, b, 'two_way');
  f.supersede(b, c, 'two_way');
  f.supersede(c, a, 'two_way');

  return f.finish([kv.vehicle, st.vehicle]);
}
