// Fictional demo data: invented makers, models and numbers.
// The two invented vehicle models of the demo catalog, the catalog's systems, and per-vehicle numbering.
import type { DemoSystem, DemoVehicle, SystemSlug } from './catalog-types';

export const SYSTEMS: ReadonlyArray<DemoSystem & { slug: SystemSlug; group: string; fsc: string }> = [
  // fsc: the Federal Supply Class most of the system's own parts fall in.
  // source: Federal Supply Classification H2 names, via REFERENCES.md (2590 used where no closer class is listed)
  { slug: 'engine', name: 'Engine', sortOrder: 1, group: '01', fsc: '2805' },
  { slug: 'clutch', name: 'Clutch', sortOrder: 2, group: '02', fsc: '2520' },
  { slug: 'transmission', name: 'Transmission', sortOrder: 3, group: '03', fsc: '2520' },
  { slug: 'transfer-case', name: 'Transfer case and propeller shafts', sortOrder: 4, group: '04', fsc: '2520' },
  { slug: 'axles', name: 'Axles', sortOrder: 5, group: '05', fsc: '2530' },
  { slug: 'brakes', name: 'Brakes', sortOrder: 6, group: '06', fsc: '2530' },
  { slug: 'steering', name: 'Steering', sortOrder: 7, group: '07', fsc: '2530' },
  { slug: 'electrical', name: 'Electrical', sortOrder: 8, group: '08', fsc: '2920' },
  { slug: 'fuel', name: 'Fuel system', sortOrder: 9, group: '09', fsc: '2910' },
  { slug: 'cooling', name: 'Cooling system', sortOrder: 10, group: '10', fsc: '2930' },
  { slug: 'exhaust', name: 'Exhaust', sortOrder: 11, group: '11', fsc: '2590' },
  { slug: 'frame', name: 'Frame, springs and shock absorbers', sortOrder: 12, group: '12', fsc: '2510' },
  { slug: 'body', name: 'Body, hood and fenders', sortOrder: 13, group: '13', fsc: '2510' },
  { slug: 'wheels-tires', name: 'Wheels and tires', sortOrder: 14, group: '14', fsc: '2530' },
  { slug: 'accessories', name: 'Accessories', sortOrder: 15, group: '15', fsc: '2540' },
];

export const systemBySlug = (slug: SystemSlug) => {
  const s = SYSTEMS.find((x) => x.slug === slug);
  if (!s) throw new Error(`Unknown system ${slug}`);
  return s;
};

export type VehicleCode = 'kv4' | 'st25';

export interface VehicleCtx {
  code: VehicleCode;
  vehicle: DemoVehicle;
  /** Short name used in part descriptions. */
  short: string;
  /** Early/late production split: the first late serial and the first late build date. */
  lateSerial: number;
  lateBuilt: string;
  lastEarlyBuilt: string;
  /** Weight and size factor against the light truck (templates are written for the 1/4-ton). */
  scale: number;
  /** Maker number as printed from its numeric body. */
  makerNumber: (body: number) => string;
  /** A revised maker number (same body, revision letter). */
  revised: (printed: string, letter: string) => string;
  /** First number the allocator hands out in each system; bodies below it are kept for hand-picked numbers. */
  makerBase: (system: SystemSlug) => number;
  variantCodes: { standard: string; long: string; winch: string };
}

const KV4: DemoVehicle = {
  slug: 'kestrelvale-kv4-wrenlet',
  maker: 'Kestrelvale Motor Company',
  model: 'KV-4',
  name: 'Kestrelvale KV-4 "Wrenlet" 1/4-ton 4x4 utility truck',
  yearFrom: 1951,
  yearTo: 1956,
  serialFrom: 1001,
  serialTo: 18750,
  serialPrefix: 'KV4-',
  description:
    'Light 4x4 utility truck of an invented maker, built for liaison, reconnaissance and light towing. ' +
    'An L-head four-cylinder engine, three-speed gearbox and two-speed transfer case; hydraulic drum brakes on ' +
    'four wheels with a single-circuit master cylinder. Production changed at serial 5000 (mid-1953): new pedal ' +
    'bracket, master cylinder and wheel cylinders.',
  variants: [
    { code: 'STD', name: 'Standard utility', description: 'Standard wheelbase, open body, no winch.' },
    { code: 'LWB', name: 'Long wheelbase', description: 'Wheelbase stretched 16 in for the command and litter bodies; longer rear brake line.' },
    { code: 'WIN', name: 'Front winch', description: 'Standard wheelbase with a front-mounted winch driven from the transfer power take-off.' },
  ],
};

const ST25: DemoVehicle = {
  slug: 'stoverton-st25-oxwain',
  maker: 'Stoverton Truck Works',
  model: 'ST-25',
  name: 'Stoverton ST-25 "Oxwain" 2-1/2-ton 6x6 cargo truck',
  yearFrom: 1952,
  yearTo: 1960,
  serialFrom: 20001,
  serialTo: 61400,
  serialPrefix: 'OX-',
  description:
    'Medium 6x6 cargo truck of an invented maker with a six-cylinder L-head engine, five-speed gearbox and ' +
    'tandem rear axles. Hydraulic drum brakes on six wheels; production changed at serial 24000 (early 1954) ' +
    'with a revised master cylinder and brake hoses.',
  variants: [
    { code: 'CGO', name: 'Cargo, standard wheelbase', description: 'Steel cargo body with troop seats.' },
    { code: 'LWB', name: 'Cargo, long wheelbase', description: 'Twelve-foot cargo body; longer frame brake line.' },
    { code: 'WIN', name: 'Cargo with front winch', description: 'Standard wheelbase with a 10,000 lb front winch.' },
  ],
};

export const VEHICLES: Readonly<Record<VehicleCode, VehicleCtx>> = {
  kv4: {
    code: 'kv4',
    vehicle: KV4,
    short: 'KV-4',
    lateSerial: 5000,
    lateBuilt: '1953-07-01',
    lastEarlyBuilt: '1953-06-30',
    scale: 1,
    makerNumber: (body) => `KV-${body}`,
    revised: (printed, letter) => `${printed}-${letter}`,
    // Five-digit bodies by system: 11xxx engine ... 43xxx accessories; brakes keep 20400-20999 for hand-picked numbers.
    makerBase: (system) =>
      ({
        engine: 11100,
        clutch: 12100,
        transmission: 13100,
        'transfer-case': 14100,
        axles: 15100,
        brakes: 21000,
        steering: 22100,
        electrical: 30100,
        fuel: 31100,
        cooling: 32100,
        exhaust: 33100,
        frame: 40100,
        body: 41100,
        'wheels-tires': 42100,
        accessories: 43100,
      })[system],
    variantCodes: { standard: 'STD', long: 'LWB', winch: 'WIN' },
  },
  st25: {
    code: 'st25',
    vehicle: ST25,
    short: 'ST-25',
    lateSerial: 24000,
    lateBuilt: '1954-03-01',
    lastEarlyBuilt: '1954-02-28',
    scale: 2.6,
    makerNumber: (body) => `ST ${body}`,
    revised: (printed, letter) => `${printed}${letter}`,
    // Six-digit bodies 1GGnnn, GG = system group; nnn below 100 kept for hand-picked numbers.
    makerBase: (system) => 100100 + Number(systemBySlug(system).group) * 1000,
    variantCodes: { standard: 'CGO', long: 'LWB', winch: 'WIN' },
  },
};
