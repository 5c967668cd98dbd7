// Fictional demo data: invented makers, models and numbers.
// Templates for every assembly outside the brake system. Weights (g) and sizes (mm) are written for the
// 1/4-ton truck; the builder scales them for the 2-1/2-ton one. A pair [a, b] means light truck / heavy truck.
import type { PartCategory, SafetyClass, SystemSlug } from './catalog-types';
import type { VehicleCode } from './catalog-vehicles';

type Pair<T> = T | readonly [T, T];

export interface PartTemplate {
  name: Pair<string>;
  category: PartCategory;
  grams: number;
  dims: readonly [number, number, number];
  qty?: Pair<number>;
  notes?: string;
  safety?: SafetyClass;
  specs?: Record<string, unknown>;
  restricted?: boolean;
  /** Sizes are the same on both trucks (small standard parts). */
  fixed?: boolean;
  description?: string;
}

export interface AssemblyTemplate {
  short: string;
  system: SystemSlug;
  parent?: string;
  name: Pair<string>;
  description: Pair<string>;
  parts: PartTemplate[];
  /** Hardware pool references with quantities and notes. */
  hw?: ReadonlyArray<readonly [string, Pair<number>, string?]>;
  only?: VehicleCode;
  /** Every line applies only to this maker's variant (by role; codes differ per vehicle). */
  variant?: 'winch';
}

const t = (
  name: Pair<string>,
  category: PartCategory,
  grams: number,
  dims: readonly [number, number, number],
  qty: Pair<number> = 1,
  more: Omit<PartTemplate, 'name' | 'category' | 'grams' | 'dims' | 'qty'> = {},
): PartTemplate => ({ name, category, grams, dims, qty, ...more });

const SUSP = { safety: 'suspension' as const };
const STEER = { safety: 'steering' as const };

export const ASSEMBLY_TEMPLATES: readonly AssemblyTemplate[] = [
  // ---------------- engine ----------------
  {
    short: 'engine.block',
    system: 'engine',
    name: ['Engine assembly, 4-cylinder L-head', 'Engine assembly, 6-cylinder L-head'],
    description: 'Cylinder block with crankshaft, camshaft, pistons and connecting rods.',
    parts: [
      t('Block, cylinder, bare', 'housing', 38000, [560, 360, 420], 1, { description: 'Bare cylinder block casting; check for freeze cracks between the bores.' }),
      t('Crankshaft', 'shaft', 17000, [700, 160, 160]),
      t('Camshaft', 'shaft', 3200, [520, 45, 45]),
      t('Bearing set, crankshaft main, standard', 'bearing', 450, [90, 60, 40], 1, { specs: { undersizeIn: 0 } }),
      t('Bearing set, connecting rod, standard', 'bearing', 300, [80, 55, 35], 1, { specs: { undersizeIn: 0 } }),
      t('Piston, with pin and rings, standard', 'generic', 620, [90, 80, 80], [4, 6]),
      t('Rod, connecting', 'linkage', 780, [240, 70, 30], [4, 6]),
      t('Flywheel, with ring gear', 'generic', 14000, [330, 330, 60]),
      t('Plug, expansion, cylinder block', 'generic', 20, [40, 40, 8], [6, 8], { fixed: true }),
      t('Gasket set, engine overhaul', 'gasket', 900, [500, 300, 30]),
    ],
    hw: [
      ['key 606', 1, 'Crankshaft gear key'],
      ['key 808', 1, 'Crankshaft pulley key'],
      ['bolt 1/2-13 x 3', [6, 8], 'Main bearing caps'],
      ['lw 1/2', [6, 8]],
    ],
  },
  {
    short: 'engine.head',
    system: 'engine',
    parent: 'engine.block',
    name: 'Cylinder head and valves',
    description: 'Cylinder head, head gasket, valves, valve springs and valve chamber cover.',
    parts: [
      t('Head, cylinder', 'housing', 14000, [560, 260, 90]),
      t('Gasket, cylinder head', 'gasket', 250, [580, 270, 3], 1, { description: 'Copper and asbestos-free composite head gasket (original was copper-asbestos).' }),
      t('Valve, intake', 'generic', 90, [125, 40, 40], [4, 6]),
      t('Valve, exhaust', 'generic', 95, [125, 38, 38], [4, 6]),
      t('Spring, valve', 'spring', 70, [60, 35, 35], [8, 12]),
      t('Lock, valve spring retainer', 'clip', 2, [10, 10, 8], [16, 24], { fixed: true }),
      t('Stud, cylinder head, 7/16-20 UNF', 'fastener', 75, [110, 12, 12], [14, 22], { specs: { thread: '7/16-20 UNF', lengthIn: 4.25 }, fixed: true }),
      t('Cover, valve chamber', 'housing', 1600, [500, 120, 40]),
      t('Gasket, valve chamber cover', 'gasket', 60, [500, 120, 2]),
    ],
    hw: [
      ['nut 7/16-20', [14, 22], 'Cylinder head nuts'],
      ['fw 7/16', [14, 22]],
      ['bolt 1/4-20 x 3/4', 6, 'Valve chamber cover'],
    ],
  },
  {
    short: 'engine.oil',
    system: 'engine',
    parent: 'engine.block',
    name: 'Oil pan, oil pump and oil filter',
    description: 'Oil pan, gear-type oil pump with its screen, drain plug and the by-pass oil filter.',
    parts: [
      t('Pan, oil', 'housing', 4200, [560, 260, 180]),
      t('Gasket set, oil pan', 'gasket', 120, [560, 260, 4]),
      t('Pump assembly, oil', 'housing', 1800, [160, 100, 100]),
      t('Screen, oil pump inlet', 'filter', 180, [120, 90, 40]),
      t('Gear, oil pump drive', 'gear', 160, [45, 45, 40]),
      t('Plug, oil pan drain, 1/2-20 UNF', 'fastener', 35, [25, 22, 22], 1, { specs: { thread: '1/2-20 UNF', lengthIn: 0.75 }, fixed: true }),
      t('Element, oil filter', 'filter', 350, [100, 100, 150], 1, { description: 'Replaceable cotton-waste element for the canister by-pass filter.' }),
      t('Housing, oil filter canister', 'housing', 1500, [130, 130, 220]),
    ],
    hw: [
      ['bolt 5/16-18 x 3/4', [16, 22], 'Oil pan'],
      ['lw 5/16', [16, 22]],
      ['gasket-washer 1/2', 1, 'Drain plug; fit new'],
      ['key 406', 1, 'Oil pump drive gear'],
    ],
  },
  {
    short: 'engine.timing',
    system: 'engine',
    parent: 'engine.block',
    name: 'Timing gears and cover',
    description: 'Crankshaft and camshaft timing gears, gear cover with its oil seal, and the crankshaft pulley.',
    parts: [
      t('Gear, crankshaft timing', 'gear', 700, [90, 90, 30]),
      t('Gear, camshaft timing, fiber', 'gear', 400, [170, 170, 25], 1, { description: 'Fiber-composite camshaft gear: quiet, but old ones crack at the hub.' }),
      t('Cover, timing gear', 'housing', 1300, [260, 230, 70]),
      t('Gasket, timing gear cover', 'gasket', 15, [260, 230, 1]),
      t('Seal, crankshaft front oil', 'seal', 40, [65, 65, 12]),
      t('Pulley, crankshaft', 'generic', 1400, [170, 170, 50]),
    ],
    hw: [
      ['bolt 5/16-18 x 1', 8, 'Timing gear cover'],
      ['lw 5/16', 8],
      ['key 606', 1, 'Camshaft gear'],
    ],
  },
  {
    short: 'engine.mounts',
    system: 'engine',
    name: 'Engine mounts',
    description: 'Rubber engine mounts and the front engine support bracket.',
    parts: [
      t('Insulator, engine mount, front', 'generic', 450, [100, 80, 60], 2),
      t('Insulator, engine mount, rear', 'generic', 500, [110, 90, 60]),
      t('Bracket, engine front support', 'bracket', 1500, [200, 120, 90], 2),
    ],
    hw: [
      ['bolt 3/8-16 x 1-1/2', 6],
      ['nut 3/8-16', 6],
      ['lw 3/8', 6],
    ],
  },
  // ---------------- clutch ----------------
  {
    short: 'clutch.assembly',
    system: 'clutch',
    name: 'Clutch pressure plate and disc',
    description: 'Single dry-plate clutch: pressure plate, driven disc, release bearing and fork.',
    parts: [
      t('Plate assembly, clutch pressure', 'housing', 6200, [260, 260, 80], 1, { specs: { diameterIn: 8.5 } }),
      t('Disc, clutch, driven', 'generic', 1300, [220, 220, 12], 1, { specs: { diameterIn: 8.5, splines: 10 } }),
      t('Bearing, clutch release', 'bearing', 450, [75, 75, 35]),
      t('Bearing, pilot, flywheel', 'bearing', 60, [35, 35, 25]),
      t('Fork, clutch release', 'linkage', 600, [220, 60, 40]),
      t('Spring, clutch fork return', 'spring', 25, [80, 14, 14], 1, { fixed: true }),
    ],
    hw: [
      ['bolt 5/16-18 x 1', 6, 'Pressure plate to flywheel'],
      ['lw 5/16', 6],
    ],
  },
  {
    short: 'clutch.linkage',
    system: 'clutch',
    name: 'Clutch pedal and linkage',
    description: 'Clutch pedal, adjustable release rod and the return spring.',
    parts: [
      t('Pedal, clutch', 'pedal', 1400, [380, 70, 40]),
      t('Rod, clutch release, adjustable', 'linkage', 300, [350, 12, 12], 1, { specs: { thread: '3/8-24 UNF' } }),
      t('Yoke, clutch release rod', 'linkage', 70, [50, 25, 22]),
      t('Spring, clutch pedal return', 'spring', 55, [150, 20, 20]),
      t('Pad, clutch pedal', 'pedal', 90, [110, 60, 12], 1, { fixed: true }),
    ],
    hw: [
      ['clevis 3/8 x 1-1/2', 1],
      ['cotter 3/32 x 1', 2],
      ['nut 3/8-24', 2],
    ],
  },
  // ---------------- transmission ----------------
  {
    short: 'transmission.assembly',
    system: 'transmission',
    name: ['Transmission assembly, 3-speed', 'Transmission assembly, 5-speed'],
    description: 'Sliding-gear transmission: case, gears, shafts and bearings.',
    parts: [
      t('Case, transmission', 'housing', 18000, [380, 280, 300]),
      t('Gear, main drive', 'gear', 2100, [200, 90, 90]),
      t('Gear, countershaft cluster', 'gear', 3200, [220, 90, 90]),
      t('Gear, second speed', 'gear', 1200, [110, 110, 40]),
      t('Shaft, main', 'shaft', 2400, [300, 45, 45]),
      t('Shaft, countershaft', 'shaft', 900, [230, 30, 30]),
      t('Bearing, main drive gear', 'bearing', 500, [80, 80, 22]),
      t('Bearing, mainshaft rear', 'bearing', 420, [72, 72, 19]),
      t('Seal, transmission oil, front', 'seal', 30, [60, 60, 10]),
      t('Gasket set, transmission', 'gasket', 80, [300, 200, 4]),
    ],
    hw: [
      ['bolt 3/8-16 x 1-1/4', 8, 'Case to bell housing'],
      ['lw 3/8', 8],
      ['snap 1', 2, 'Bearing retainers'],
    ],
  },
  {
    short: 'transmission.shift',
    system: 'transmission',
    parent: 'transmission.assembly',
    name: 'Gearshift lever and housing',
    description: 'Floor gearshift lever, shift housing, forks, rails and poppets.',
    parts: [
      t('Lever, gearshift', 'linkage', 900, [500, 30, 30]),
      t('Housing, gearshift', 'housing', 2200, [200, 170, 120]),
      t('Spring, gearshift lever', 'spring', 40, [40, 30, 30]),
      t('Knob, gearshift lever', 'generic', 90, [50, 50, 50], 1, { fixed: true }),
      t('Fork, shift, low and reverse', 'linkage', 350, [120, 90, 30]),
      t('Fork, shift, second and high', 'linkage', 340, [120, 90, 30]),
      t('Rail, shift', 'shaft', 300, [230, 16, 16], 2),
      t('Ball, poppet, 5/16', 'generic', 2, [8, 8, 8], 2, { fixed: true }),
      t('Spring, poppet', 'spring', 2, [20, 7, 7], 2, { fixed: true }),
    ],
    hw: [
      ['bolt 5/16-18 x 1-1/4', 4, 'Shift housing'],
      ['lw 5/16', 4],
    ],
  },
  // ---------------- transfer case ----------------
  {
    short: 'transfer.assembly',
    system: 'transfer-case',
    name: 'Transfer case assembly, 2-speed',
    description: 'Two-speed transfer case with front axle engagement, output shafts and companion flanges.',
    parts: [
      t('Case, transfer', 'housing', 25000, [420, 320, 300]),
      t('Shaft, output, rear', 'shaft', 1800, [300, 45, 45]),
      t('Shaft, output, front', 'shaft', 1600, [260, 45, 45]),
      t('Gear, intermediate', 'gear', 2200, [150, 150, 45]),
      t('Gear, main drive, transfer', 'gear', 1800, [140, 140, 40]),
      t('Bearing, output shaft', 'bearing', 380, [72, 72, 19], 2),
      t('Seal, output shaft oil', 'seal', 35, [62, 62, 10], 2),
      t('Flange, companion, output', 'generic', 900, [110, 110, 70], 2),
      t('Gasket, transfer case cover', 'gasket', 20, [220, 160, 1]),
    ],
    hw: [
      ['castle 1/2-20', 2, 'Companion flange nuts'],
      ['cotter 5/32 x 1-1/2', 2],
      ['bolt 3/8-16 x 1-1/2', 6],
      ['lw 3/8', 6],
    ],
  },
  {
    short: 'transfer.shift',
    system: 'transfer-case',
    parent: 'transfer.assembly',
    name: 'Transfer case shift levers',
    description: 'High/low range and front axle engagement levers with their rods and poppets.',
    parts: [
      t('Lever, transfer range shift', 'linkage', 700, [420, 30, 30]),
      t('Lever, front axle engagement', 'linkage', 650, [400, 30, 30]),
      t('Rod, shift, transfer', 'shaft', 260, [220, 16, 16], 2),
      t('Spring, transfer poppet', 'spring', 3, [22, 8, 8], 2, { fixed: true }),
      t('Bracket, transfer shift lever', 'bracket', 450, [120, 80, 50]),
      t('Boot, transfer shift lever', 'boot', 60, [100, 80, 80], 2),
    ],
    hw: [
      ['clevis 5/16 x 1', 2],
      ['cotter 3/32 x 3/4', 2],
    ],
  },
  {
    short: 'transfer.propshafts',
    system: 'transfer-case',
    name: 'Propeller shafts and universal joints',
    description: 'Front and rear propeller shafts with slip yokes and universal joint journals.',
    parts: [
      t('Shaft, propeller, front', 'shaft', 7000, [700, 90, 90]),
      t(['Shaft, propeller, rear', 'Shaft, propeller, transfer to forward-rear axle'], 'shaft', 7500, [760, 90, 90]),
      t('Journal and bearing kit, universal joint', 'bearing', 500, [90, 90, 60], [4, 8]),
      t('Yoke, slip, propeller shaft', 'generic', 1600, [160, 90, 90], [2, 3]),
      t('Seal, slip yoke, felt', 'seal', 5, [50, 50, 8], [2, 3], { fixed: true }),
    ],
    hw: [
      ['bolt 5/16-24 x 1', [8, 16], 'Journal retainers'],
      ['lw 5/16', [8, 16]],
      ['grease straight', [4, 8]],
    ],
  },
  // ---------------- axles ----------------
  {
    short: 'axles.front',
    system: 'axles',
    name: 'Front axle housing and differential',
    description: 'Driving front axle: housing, differential carrier, ring gear and pinion, bearings and seals.',
    parts: [
      t('Housing, front axle', 'housing', 68000, [1450, 330, 320], 1, { description: 'Banjo front axle housing without shafts or differential. Heavy: ships by freight.' }),
      t('Case, differential', 'housing', 6500, [230, 230, 200]),
      t('Gear and pinion set, ring, front axle', 'gear', 5200, [250, 250, 120], 1, { specs: { ratio: '5.38:1' } }),
      t('Bearing, pinion, front axle', 'bearing', 520, [80, 80, 30], 2),
      t('Bearing, differential side', 'bearing', 460, [80, 80, 25], 2),
      t('Seal, pinion oil, front axle', 'seal', 45, [70, 70, 12]),
      t('Cover, differential', 'housing', 2600, [280, 280, 60]),
      t('Gasket, differential cover', 'gasket', 15, [280, 280, 1]),
      t('Shaft, axle, inner, front', 'shaft', 4200, [600, 40, 40], 2),
      t('Plug, filler, differential, 1/2-20 UNF', 'fastener', 30, [25, 22, 22], 1, { specs: { thread: '1/2-20 UNF', lengthIn: 0.75 }, fixed: true }),
    ],
    hw: [
      ['bolt 3/8-16 x 1', 10, 'Differential cover'],
      ['lw 3/8', 10],
      ['castle 1/2-20', 1, 'Pinion flange nut'],
      ['cotter 1/8 x 1-1/2', 1],
    ],
  },
  {
    short: 'axles.knuckle',
    system: 'axles',
    parent: 'axles.front',
    name: 'Steering knuckles and axle joints',
    description: 'Steering knuckles, king pin bearings, outer axle shafts with universal joints and the wheel spindles.',
    parts: [
      t('Knuckle, steering, left', 'housing', 9000, [300, 230, 220], 1, STEER),
      t('Knuckle, steering, right', 'housing', 9000, [300, 230, 220], 1, STEER),
      t('Shaft, axle, outer, with universal joint', 'shaft', 3600, [380, 80, 80], 2),
      t('Bearing, king pin', 'bearing', 180, [50, 50, 22], 4, STEER),
      t('Shim set, king pin bearing', 'generic', 30, [60, 60, 5], 2, { ...STEER, fixed: true }),
      t('Seal, steering knuckle, oil', 'seal', 150, [240, 240, 20], 2),
      t('Spindle, front wheel', 'shaft', 2400, [200, 90, 90], 2, STEER),
      t('Gasket, spindle', 'gasket', 8, [130, 130, 1], 2, { fixed: true }),
    ],
    hw: [
      ['bolt 3/8-24 x 1-1/4', 16, 'Knuckle caps and spindle'],
      ['lw 3/8', 16],
      ['grease straight', 2],
    ],
  },
  {
    short: 'axles.rear',
    system: 'axles',
    name: ['Rear axle housing and differential', 'Rear-rear axle housing and differential'],
    description: ['Full-floating rear axle: housing, differential, shafts, bearings and seals.', 'Rearmost of the tandem axles: housing, differential, shafts, bearings and seals.'],
    parts: [
      t('Housing, rear axle', 'housing', 62000, [1450, 330, 320], 1, { description: 'Banjo rear axle housing without shafts or differential. Heavy: ships by freight.' }),
      t('Shaft, axle, rear', 'shaft', 5200, [800, 40, 40], 2),
      t('Gear and pinion set, ring, rear axle', 'gear', 5200, [250, 250, 120], 1, { specs: { ratio: '5.38:1' } }),
      t('Bearing, pinion, rear axle', 'bearing', 520, [80, 80, 30], 2),
      t('Seal, pinion oil, rear axle', 'seal', 45, [70, 70, 12]),
      t('Gasket, axle shaft flange', 'gasket', 6, [140, 140, 1], 2, { fixed: true }),
      t('Cover, differential, rear', 'housing', 2600, [280, 280, 60]),
    ],
    hw: [
      ['bolt 3/8-16 x 1', 10, 'Differential cover'],
      ['lw 3/8', 10],
      ['castle 1/2-20', 1, 'Pinion flange nut'],
      ['cotter 1/8 x 1-1/2', 1],
    ],
  },
  {
    short: 'axles.forward-rear',
    system: 'axles',
    only: 'st25',
    name: 'Forward-rear axle housing and differential',
    description: 'Forward axle of the tandem, with the through-drive to the rear-rear axle.',
    parts: [
      t('Housing, forward-rear axle', 'housing', 64000, [1450, 330, 340], 1, { description: 'Through-drive axle housing without shafts or differential. Heavy: ships by freight.' }),
      t('Shaft, through-drive', 'shaft', 3100, [320, 50, 50]),
      t('Bearing, through-drive shaft', 'bearing', 600, [90, 90, 30], 2),
      t('Seal, through-drive oil', 'seal', 50, [72, 72, 12]),
      t('Gear and pinion set, ring, forward-rear axle', 'gear', 5200, [250, 250, 120], 1, { specs: { ratio: '6.72:1' } }),
    ],
    hw: [
      ['bolt 1/2-13 x 2', 10],
      ['lw 1/2', 10],
    ],
  },
  {
    short: 'axles.hubs',
    system: 'axles',
    name: 'Wheel hubs and bearings',
    description: 'Front and rear wheel hubs, taper roller bearings, grease seals and the adjusting nuts.',
    parts: [
      t('Hub, wheel, front', 'housing', 5200, [220, 220, 150], 2),
      t('Hub, wheel, rear', 'housing', 5400, [220, 220, 150], [2, 4]),
      t('Bearing, wheel, inner', 'bearing', 420, [80, 80, 25], [4, 6]),
      t('Bearing, wheel, outer', 'bearing', 320, [70, 70, 22], [4, 6]),
      t('Seal, wheel bearing grease', 'seal', 60, [85, 85, 14], [4, 6]),
      t('Nut, wheel bearing adjusting', 'generic', 120, [60, 60, 15], [8, 12]),
      t('Washer, lock, wheel bearing nut', 'washer', 25, [60, 60, 2], [4, 6]),
      t('Flange, drive, axle shaft', 'generic', 1400, [150, 150, 60], [4, 6]),
    ],
    hw: [
      ['bolt 3/8-24 x 1', [24, 36], 'Drive flanges'],
      ['lw 3/8', [24, 36]],
    ],
  },
  // ---------------- steering ----------------
  {
    short: 'steering.gear',
    system: 'steering',
    name: 'Steering gear',
    description: 'Cam-and-lever steering gear with the pitman arm.',
    parts: [
      t('Housing, steering gear', 'housing', 4800, [260, 160, 160]),
      t('Shaft and cam, steering worm', 'shaft', 2600, [800, 60, 60]),
      t('Shaft, lever, steering gear', 'shaft', 1300, [160, 60, 60]),
      t('Bearing, steering worm, ball', 'bearing', 90, [50, 50, 15], 2),
      t('Seal, lever shaft oil', 'seal', 15, [40, 40, 8]),
      t('Arm, pitman', 'linkage', 1500, [230, 60, 40]),
      t('Gasket, steering gear side cover', 'gasket', 5, [110, 80, 1], 1, { fixed: true }),
    ],
    hw: [
      ['castle 1/2-20', 1, 'Pitman arm nut'],
      ['cotter 1/8 x 1-1/4', 1],
      ['bolt 7/16-20 x 1-1/2', 3, 'Gear to frame'],
      ['lw 7/16', 3],
    ],
  },
  {
    short: 'steering.column',
    system: 'steering',
    parent: 'steering.gear',
    name: 'Steering wheel and column',
    description: 'Steering wheel, column jacket, upper bearing and horn button.',
    parts: [
      t('Wheel, steering', 'generic', 2200, [430, 430, 90]),
      t('Nut, steering wheel, 5/8-18', 'fastener', 30, [25, 25, 14], 1, { specs: { thread: '5/8-18 UNF', lengthIn: 0.55 }, fixed: true }),
      t('Jacket, steering column', 'housing', 2300, [900, 60, 60]),
      t('Bearing, steering column, upper', 'bearing', 80, [50, 50, 15]),
      t('Clamp, steering column to instrument panel', 'clamp', 150, [90, 60, 25]),
      t('Button, horn', 'switch', 60, [60, 60, 25], 1, { safety: 'none' }),
    ],
    hw: [
      ['bolt 5/16-18 x 1-1/4', 2, 'Column clamp'],
      ['nut 5/16-18', 2],
    ],
  },
  {
    short: 'steering.linkage',
    system: 'steering',
    name: 'Tie rod and drag link',
    description: 'Tie rod with its ends, the drag link and their ball seats and springs.',
    parts: [
      t('Rod, tie, with ends', 'linkage', 3800, [1150, 60, 60]),
      t('End, tie rod, right hand thread', 'linkage', 500, [130, 50, 50]),
      t('End, tie rod, left hand thread', 'linkage', 500, [130, 50, 50]),
      t('Link, drag, with ends', 'linkage', 3100, [700, 70, 70]),
      t('Spring, drag link ball seat', 'spring', 25, [30, 25, 25], 4),
      t('Seat, drag link ball', 'generic', 40, [30, 30, 15], 4),
      t('Clamp, tie rod end', 'clamp', 80, [50, 40, 25], 2),
      t('Cover, tie rod end, dust', 'boot', 15, [40, 40, 25], 2),
    ],
    hw: [
      ['castle 1/2-20', 4, 'Ball stud nuts'],
      ['cotter 1/8 x 1-1/4', 4],
      ['bolt 5/16-24 x 1-1/2', 2, 'Tie rod end clamps'],
      ['nut 5/16-24', 2],
      ['grease straight', 4],
    ],
  },
  // ---------------- electrical ----------------
  {
    short: 'electrical.generator',
    system: 'electrical',
    name: ['Generator and regulator, 6-volt', 'Generator and regulator, 24-volt'],
    description: 'Belt-driven generator, voltage regulator, fan belt and the adjusting bracket.',
    parts: [
      t(['Generator, 6-volt, 45 ampere', 'Generator, 24-volt, 25 ampere'], 'housing', 9000, [260, 140, 140]),
      t(['Regulator, generator, 6-volt', 'Regulator, generator, 24-volt'], 'switch', 1400, [170, 110, 90]),
      t('Brush set, generator', 'generic', 30, [40, 30, 20], 1, { fixed: true }),
      t('Bearing, generator drive end', 'bearing', 90, [47, 47, 14]),
      t('Pulley, generator', 'generic', 600, [100, 100, 40]),
      t('Belt, fan and generator', 'generic', 250, [450, 200, 15]),
      t('Bracket, generator adjusting', 'bracket', 300, [180, 40, 10]),
    ],
    hw: [
      ['key 406', 1, 'Pulley key'],
      ['bolt 3/8-16 x 1-1/2', 2],
      ['lw 3/8', 2],
    ],
  },
  {
    short: 'electrical.starter',
    system: 'electrical',
    name: 'Starting motor',
    description: 'Starting motor with its drive and the foot-operated starter switch.',
    parts: [
      t('Motor, starting', 'housing', 8500, [280, 130, 130]),
      t('Drive, starting motor', 'gear', 500, [90, 45, 45]),
      t('Switch, starting motor, foot operated', 'switch', 350, [90, 60, 60]),
      t('Brush set, starting motor', 'generic', 50, [50, 40, 20], 1, { fixed: true }),
      t('Bushing, starting motor, drive end', 'bearing', 15, [20, 20, 18], 1, { fixed: true }),
    ],
    hw: [
      ['bolt 3/8-16 x 1-1/4', 2],
      ['lw 3/8', 2],
    ],
  },
  {
    short: 'electrical.lights',
    system: 'electrical',
    name: 'Lamps and light switch',
    description: 'Headlamps, service and blackout tail and stop lamps, blackout markers and the main light switch.',
    parts: [
      t(['Lamp unit, headlight, sealed beam, 6-volt', 'Lamp unit, headlight, sealed beam, 24-volt'], 'lamp', 700, [180, 180, 100], 2),
      t('Lamp, marker, blackout', 'lamp', 450, [100, 80, 80], 2),
      t('Lamp assembly, tail and stop, service', 'lamp', 800, [140, 100, 90], 2),
      t('Lamp assembly, stop, blackout', 'lamp', 700, [130, 100, 90]),
      t('Switch, main light', 'switch', 500, [110, 70, 60]),
      t('Switch, headlight dimmer, foot operated', 'switch', 250, [70, 60, 60]),
      t('Door, headlamp', 'generic', 250, [190, 190, 30], 2),
      t('Gasket, lamp lens', 'gasket', 5, [100, 80, 2], 4, { fixed: true }),
      t(['Bulb, lamp, 6-volt, 21 candlepower', 'Bulb, lamp, 24-volt, 21 candlepower'], 'lamp', 10, [50, 30, 30], 4, { fixed: true }),
    ],
    hw: [
      ['bolt 1/4-20 x 3/4', 12, 'Lamp mounting'],
      ['lw 1/4', 12],
    ],
  },
  {
    short: 'electrical.wiring',
    system: 'electrical',
    name: 'Wiring harness and batteries',
    description: 'Main wiring harness, battery cables, battery box and hold-down.',
    parts: [
      t('Harness, wiring, main', 'generic', 3500, [600, 400, 100]),
      t('Cable, battery, ground', 'generic', 400, [500, 80, 30]),
      t('Cable, battery, positive', 'generic', 500, [700, 80, 30]),
      t('Clamp, battery hold-down', 'clamp', 350, [250, 40, 20]),
      t('Box, battery', 'housing', 4500, [350, 250, 250], [1, 2]),
      t('Terminal, battery cable', 'generic', 45, [50, 25, 20], 4, { fixed: true }),
      t('Clip, wiring harness', 'clip', 5, [30, 12, 10], [12, 20], { fixed: true }),
      t('Grommet, wiring harness', 'seal', 4, [25, 25, 10], 6, { fixed: true }),
    ],
    hw: [['bolt 1/4-20 x 1/2', [12, 20], 'Harness clips']],
  },
  // ---------------- fuel ----------------
  {
    short: 'fuel.tank',
    system: 'fuel',
    name: 'Fuel tank and lines',
    description: 'Fuel tank, filler cap, gauge sender, sediment bowl filter and fuel lines.',
    parts: [
      t(['Tank, fuel, 15 gallon', 'Tank, fuel, 56 gallon'], 'housing', 9000, [700, 400, 300]),
      t('Cap, fuel tank filler', 'generic', 150, [80, 80, 40]),
      t('Gasket, fuel tank filler cap', 'gasket', 5, [60, 60, 3], 1, { fixed: true }),
      t('Unit, fuel gauge, tank', 'switch', 300, [200, 80, 60]),
      t('Line, fuel, tank to pump, steel', 'generic', 250, [900, 150, 30], 1, { specs: { tubeOdIn: 0.3125 } }),
      t('Hose, fuel, flexible', 'hose', 80, [250, 20, 20], 1, { specs: { lengthIn: 10 } }),
      t('Strap, fuel tank hold-down', 'bracket', 400, [800, 40, 5], 2),
      t('Filter assembly, fuel, sediment bowl', 'filter', 350, [90, 70, 120]),
    ],
    hw: [
      ['hclamp 3/4', 2, 'Fuel hose'],
      ['bolt 3/8-16 x 2', 2, 'Tank straps'],
      ['nut 3/8-16', 2],
    ],
  },
  {
    short: 'fuel.carburetor',
    system: 'fuel',
    name: 'Carburetor, fuel pump and air cleaner',
    description: 'Updraft carburetor, mechanical fuel pump, oil-bath air cleaner and throttle linkage.',
    parts: [
      t('Carburetor assembly, updraft', 'housing', 2200, [200, 160, 160]),
      t('Kit, carburetor repair', 'generic', 120, [150, 100, 30], 1, { fixed: true }),
      t('Gasket, carburetor to manifold', 'gasket', 4, [80, 50, 2], 1, { fixed: true }),
      t('Pump, fuel, mechanical', 'housing', 900, [130, 100, 100]),
      t('Kit, fuel pump repair', 'generic', 80, [100, 80, 25], 1, { fixed: true }),
      t('Cleaner, air, oil bath', 'filter', 3500, [250, 250, 300]),
      t('Hose, air cleaner to carburetor', 'hose', 300, [300, 70, 70], 1, { specs: { lengthIn: 11 } }),
      t('Rod, throttle', 'linkage', 90, [300, 8, 8]),
      t('Spring, throttle return', 'spring', 10, [60, 10, 10], 1, { fixed: true }),
    ],
    hw: [
      ['hclamp 2-1/2', 2, 'Air cleaner hose'],
      ['nut 5/16-24', 2, 'Carburetor to manifold'],
      ['lw 5/16', 2],
      ['cotter 1/16 x 1/2', 2],
    ],
  },
  // ---------------- cooling ----------------
  {
    short: 'cooling.radiator',
    system: 'cooling',
    name: 'Radiator, hoses and thermostat',
    description: 'Radiator with pressure cap, upper and lower hoses, drain cock and the thermostat in its housing.',
    parts: [
      t('Radiator assembly', 'housing', 11000, [600, 120, 600]),
      t('Cap, radiator, pressure', 'generic', 120, [70, 70, 35], 1, { fixed: true }),
      t('Hose, radiator, upper', 'hose', 250, [250, 60, 60], 1, { specs: { lengthIn: 9 } }),
      t('Hose, radiator, lower', 'hose', 350, [350, 60, 60], 1, { specs: { lengthIn: 13 } }),
      t('Cock, radiator drain', 'generic', 60, [50, 25, 25], 1, { fixed: true }),
      t('Insulator, radiator mounting', 'generic', 80, [60, 60, 25], 2),
      t('Thermostat, 160 degree', 'generic', 120, [60, 60, 50], 1, { fixed: true }),
      t('Gasket, thermostat housing', 'gasket', 3, [70, 60, 1], 1, { fixed: true }),
      t('Housing, thermostat', 'housing', 500, [100, 80, 70]),
    ],
    hw: [
      ['hclamp 1-1/2', 4, 'Radiator hoses'],
      ['bolt 3/8-16 x 1-1/2', 4, 'Radiator to frame'],
      ['lw 3/8', 4],
      ['bolt 5/16-18 x 1', 2, 'Thermostat housing'],
    ],
  },
  {
    short: 'cooling.pump',
    system: 'cooling',
    name: 'Water pump and fan',
    description: 'Water pump with its seal and bearing, the fan blade and the fan pulley.',
    parts: [
      t('Pump assembly, water', 'housing', 2500, [200, 150, 150]),
      t('Kit, water pump repair', 'generic', 300, [120, 100, 50]),
      t('Seal, water pump', 'seal', 30, [40, 40, 20]),
      t('Bearing and shaft, water pump', 'bearing', 450, [130, 30, 30]),
      t('Fan, blade, 4-blade', 'generic', 1400, [400, 400, 80]),
      t('Pulley, fan and water pump', 'generic', 700, [150, 150, 40]),
      t('Gasket, water pump', 'gasket', 4, [120, 90, 1], 1, { fixed: true }),
    ],
    hw: [
      ['bolt 5/16-18 x 1-1/4', 4, 'Fan blade'],
      ['lw 5/16', 4],
      ['bolt 3/8-16 x 1-1/4', 4, 'Pump to block'],
    ],
  },
  // ---------------- exhaust ----------------
  {
    short: 'exhaust.system',
    system: 'exhaust',
    name: 'Manifolds, exhaust pipes and muffler',
    description: 'Combined intake and exhaust manifold, exhaust pipe, muffler, tail pipe, clamps and hangers.',
    parts: [
      t('Manifold, intake and exhaust', 'housing', 7500, [500, 160, 150]),
      t('Gasket set, manifold', 'gasket', 60, [500, 150, 3]),
      t('Pipe, exhaust, front', 'generic', 2600, [1000, 200, 80]),
      t('Muffler', 'housing', 5500, [700, 200, 160]),
      t('Pipe, tail', 'generic', 1500, [700, 80, 80]),
      t('Clamp, exhaust pipe', 'clamp', 250, [100, 80, 40], 2),
      t('Bracket, muffler', 'bracket', 400, [200, 60, 30], 2),
      t('Gasket, exhaust pipe flange', 'gasket', 20, [90, 70, 3], 1, { fixed: true }),
    ],
    hw: [
      ['nut 3/8-24', 8, 'Manifold studs'],
      ['fw 3/8', 8],
      ['bolt 3/8-16 x 1-1/2', 2, 'Exhaust flange'],
    ],
  },
  // ---------------- frame ----------------
  {
    short: 'frame.assembly',
    system: 'frame',
    name: 'Frame assembly',
    description: 'Riveted ladder frame with crossmembers, front bumper, lifting and towing hooks.',
    parts: [
      t('Frame, assembly, riveted', 'generic', 120000, [3300, 760, 220], 1, { description: 'Bare riveted frame. Oversize freight: collection or flatbed only.' }),
      t('Crossmember, front', 'bracket', 8000, [760, 150, 120]),
      t('Crossmember, rear', 'bracket', 7500, [760, 150, 120]),
      t('Bumper, front', 'generic', 18000, [1400, 150, 200]),
      t('Hook, lifting and towing', 'generic', 1800, [200, 100, 60], 2),
      t('Bracket, spring shackle', 'bracket', 1300, [150, 100, 80], 4),
    ],
    hw: [
      ['bolt 1/2-13 x 1-1/2', 8, 'Bumper and hooks'],
      ['nut 1/2-13', 8],
      ['lw 1/2', 8],
    ],
  },
  {
    short: 'frame.front-springs',
    system: 'frame',
    name: 'Front springs and shock absorbers',
    description: 'Front leaf springs, shackles, spring eye bushings, U-bolts and the shock absorbers.',
    parts: [
      t('Spring, leaf, front', 'spring', 14000, [1000, 60, 120], 2, SUSP),
      t('Shackle, spring', 'linkage', 500, [120, 50, 30], 2, SUSP),
      t('Bushing, spring eye', 'bearing', 60, [50, 30, 30], 4, SUSP),
      t('Bolt, spring pivot, 1/2-20 UNF', 'fastener', 170, [130, 20, 20], 2, { ...SUSP, specs: { thread: '1/2-20 UNF', lengthIn: 4.5, grade: 8 }, fixed: true }),
      t('Bolt, U, front spring', 'clamp', 500, [200, 90, 15], 4, SUSP),
      t('Absorber, shock, front', 'generic', 2200, [380, 70, 70], 2, SUSP),
      t('Bracket, shock absorber, front', 'bracket', 500, [120, 60, 50], 2, SUSP),
    ],
    hw: [
      ['nut 1/2-20', 8, 'U-bolt nuts'],
      ['lw 1/2', 8],
      ['grease straight', 4],
    ],
  },
  {
    short: 'frame.rear-springs',
    system: 'frame',
    name: ['Rear springs and shock absorbers', 'Rear bogie springs and torque rods'],
    description: ['Rear leaf springs, shackles, U-bolts and shock absorbers.', 'Inverted rear bogie springs with their seats, torque rods and U-bolts.'],
    parts: [
      t('Spring, leaf, rear', 'spring', 16000, [1100, 60, 130], 2, SUSP),
      t('Shackle, spring, rear', 'linkage', 550, [130, 50, 30], 2, SUSP),
      t('Bolt, U, rear spring', 'clamp', 550, [220, 90, 15], 4, SUSP),
      t(['Absorber, shock, rear', 'Rod, torque, bogie'], 'generic', 2400, [400, 70, 70], [2, 6], SUSP),
      t('Bumper, axle, rubber', 'generic', 200, [80, 60, 50], 2, SUSP),
    ],
    hw: [
      ['nut 1/2-20', 8, 'U-bolt nuts'],
      ['lw 1/2', 8],
    ],
  },
  // ---------------- body ----------------
  {
    short: 'body.main',
    system: 'body',
    name: ['Body tub and seats', 'Cab and seats'],
    description: ['Open steel body tub with driver and passenger seats, grab handles and floor.', 'Open steel cab with seats, doors and floor plates.'],
    parts: [
      t(['Body, tub, steel', 'Cab, open, steel'], 'generic', 180000, [2200, 1500, 800], 1, { description: 'Large body shell. Oversize freight: collection or flatbed only.' }),
      t('Cushion, seat, driver', 'generic', 3500, [500, 450, 120]),
      t('Back, seat, driver', 'generic', 3000, [500, 450, 100]),
      t('Handle, grab', 'generic', 400, [300, 60, 40], 2),
      t('Hinge, seat frame', 'generic', 200, [80, 50, 20], 2),
      t('Latch, tool box lid', 'generic', 90, [60, 40, 30], 2),
      t('Plate, floor, access', 'generic', 2500, [400, 300, 5]),
    ],
    hw: [
      ['bolt 5/16-18 x 1', 16],
      ['nut 5/16-18', 16],
      ['fw 5/16', 16],
    ],
  },
  {
    short: 'body.hood',
    system: 'body',
    name: 'Hood, fenders and grille',
    description: 'Hood, front fenders, radiator grille guard, hood latches and hinge.',
    parts: [
      t('Hood', 'generic', 18000, [1200, 1000, 120]),
      t('Fender, front, left', 'generic', 9000, [900, 500, 300]),
      t('Fender, front, right', 'generic', 9000, [900, 500, 300]),
      t('Grille, radiator guard', 'generic', 11000, [900, 120, 800]),
      t('Catch, hood', 'generic', 150, [80, 40, 30], 2),
      t('Hinge, hood', 'generic', 700, [1000, 40, 20]),
      t('Bumper, hood rest, rubber', 'generic', 20, [30, 30, 20], 2, { fixed: true }),
    ],
    hw: [
      ['bolt 5/16-18 x 3/4', 20, 'Fenders and grille'],
      ['lw 5/16', 20],
      ['nut 5/16-18', 20],
    ],
  },
  {
    short: 'body.windshield',
    system: 'body',
    name: 'Windshield and top',
    description: 'Folding windshield frame, glass, hand wiper, top bows and canvas top.',
    parts: [
      t('Frame, windshield', 'generic', 9000, [1300, 80, 500]),
      t('Glass, windshield', 'generic', 6000, [1200, 420, 6], 2),
      t('Weatherstrip, windshield glass', 'seal', 300, [1300, 20, 15], 2),
      t('Wiper, windshield, hand operated', 'generic', 300, [300, 60, 40], 2),
      t('Bow, top', 'generic', 2000, [1400, 40, 900], 2),
      t('Top, canvas', 'generic', 6000, [600, 400, 200]),
      t('Clamp, windshield hold-down', 'clamp', 250, [90, 60, 40], 2),
    ],
    hw: [
      ['bolt 1/4-20 x 1', 10],
      ['nut 1/4-20', 10],
    ],
  },
  {
    short: 'body.cargo',
    system: 'body',
    only: 'st25',
    name: 'Cargo body and troop seats',
    description: 'Steel cargo body, tailgate with chains, folding troop seats and cargo bows.',
    parts: [
      t('Body, cargo, steel', 'generic', 230000, [3700, 2200, 900], 1, { description: 'Complete steel cargo body. Oversize freight: collection or flatbed only.' }),
      t('Tailgate, cargo body', 'generic', 35000, [2200, 100, 600]),
      t('Chain, tailgate, with hook', 'generic', 900, [500, 40, 20], 2, { fixed: true }),
      t('Seat, troop, folding', 'generic', 22000, [3500, 400, 100], 2),
      t('Bow, cargo', 'generic', 4000, [2300, 40, 1400], 5),
      t('Hook, lashing', 'generic', 300, [80, 60, 30], 12, { fixed: true }),
    ],
    hw: [
      ['bolt 1/2-13 x 2', 12, 'Body to frame'],
      ['nut 1/2-13', 12],
      ['fw 1/2', 12],
    ],
  },
  // ---------------- wheels and tires ----------------
  {
    short: 'wheels.wheels',
    system: 'wheels-tires',
    name: 'Wheels and tires',
    description: 'Split-rim combat wheels, tires, tubes and flaps, wheel studs and nuts, and the spare wheel carrier.',
    parts: [
      t(['Wheel, disc, split rim, 16 x 4.50', 'Wheel, disc, split rim, 20 x 7.00'], 'generic', 20000, [420, 420, 140], [5, 11], { description: 'Split-rim wheel. Deflate fully before loosening the rim bolts; use a safety cage when inflating.' }),
      t(['Tire, 6.00-16, non-directional', 'Tire, 7.50-20, non-directional'], 'generic', 12000, [720, 720, 160], [5, 11]),
      t(['Tube, inner, 6.00-16', 'Tube, inner, 7.50-20'], 'generic', 1500, [300, 300, 60], [5, 11]),
      t(['Flap, tire, 16 in', 'Flap, tire, 20 in'], 'generic', 700, [300, 300, 40], [5, 11]),
      t('Stud, wheel, 1/2-20 UNF', 'fastener', 80, [70, 15, 15], [20, 60], { specs: { thread: '1/2-20 UNF', lengthIn: 2.25 }, fixed: true }),
      t('Nut, wheel, 1/2-20 UNF', 'fastener', 40, [25, 22, 22], [20, 60], { specs: { thread: '1/2-20 UNF', lengthIn: 0.75 }, fixed: true }),
      t('Carrier, spare wheel', 'bracket', 7000, [500, 400, 200]),
    ],
  },
  // ---------------- accessories ----------------
  {
    short: 'accessories.pintle',
    system: 'accessories',
    name: 'Pintle hook and towing',
    description: 'Rear pintle hook with its latch and spring, safety chains and mounting bracket.',
    parts: [
      t('Hook, pintle', 'generic', 9000, [300, 180, 150]),
      t('Spring, pintle hook', 'spring', 300, [80, 50, 50]),
      t('Latch, pintle hook', 'linkage', 400, [120, 50, 30]),
      t('Pin, pintle latch lock', 'linkage', 60, [80, 12, 12], 1, { fixed: true }),
      t('Chain, safety, towing', 'generic', 3000, [900, 60, 30], 2),
      t('Bracket, pintle hook', 'bracket', 5000, [300, 200, 150]),
    ],
    hw: [
      ['castle 1/2-20', 1, 'Pintle shank nut'],
      ['cotter 5/32 x 1-1/2', 1],
      ['bolt 1/2-13 x 3', 4],
      ['nut 1/2-13', 4],
    ],
  },
  {
    short: 'accessories.winch',
    system: 'accessories',
    variant: 'winch',
    name: 'Front winch',
    description: 'Front-mounted drum winch driven from the transfer case power take-off (winch variant only).',
    parts: [
      t('Winch assembly, drum, front', 'housing', 60000, [700, 400, 400], 1, { description: 'Front winch without cable. Heavy: ships by freight.' }),
      t('Cable, winch, 3/8 in x 150 ft, with hook', 'generic', 18000, [500, 500, 300]),
      t('Shaft, winch drive', 'shaft', 6000, [1500, 40, 40]),
      t('Pin, shear, winch drive', 'linkage', 20, [50, 10, 10], 2, { fixed: true, description: 'Shear pin that protects the winch drive; keep spares, use the correct hardness.' }),
      t('Power take-off assembly', 'gear', 12000, [250, 200, 200]),
      t('Bracket, winch mounting', 'bracket', 9000, [800, 200, 150], 2),
      t('Lever, power take-off shift', 'linkage', 600, [350, 30, 30]),
    ],
    hw: [
      ['bolt 1/2-13 x 2', 8, 'Winch to frame'],
      ['nut 1/2-13', 8],
      ['lw 1/2', 8],
      ['key 810', 1, 'Drive shaft key'],
    ],
  },
  {
    short: 'accessories.display-mount',
    system: 'accessories',
    name: 'Display mount (deactivated display item)',
    description: 'Pedestal or ring mount for a deactivated display item on a museum vehicle. Nothing live; extra review before listing.',
    parts: [
      t(['Mount, pedestal, display item, deactivated', 'Mount, ring, display item, deactivated'], 'weapon_mount', 22000, [900, 400, 400], 1, { restricted: true, description: 'Steel mount for a deactivated display item. Sold as a collector display piece only; listings get an extra review.' }),
      t(['Bracket, pintle, display mount', 'Cradle, display mount'], 'weapon_mount', 4000, [300, 200, 150], 1, { restricted: true, description: 'Bracket of the display mount. Collector display piece only; listings get an extra review.' }),
      t('Bracket, mount reinforcing, floor', 'bracket', 3000, [400, 200, 50]),
    ],
    hw: [
      ['bolt 1/2-13 x 2', 4],
      ['nut 1/2-13', 4],
    ],
  },
  {
    short: 'accessories.tools',
    system: 'accessories',
    name: 'Pioneer tools and fuel can brackets',
    description: 'Axe and shovel brackets with their straps, the jerrycan bracket and the hydraulic jack.',
    parts: [
      t('Bracket, axe and shovel', 'bracket', 900, [300, 100, 50]),
      t('Strap, tool, with buckle', 'generic', 120, [400, 40, 10], 4, { fixed: true }),
      t('Can, fuel, 5 gallon', 'generic', 4500, [470, 340, 160]),
      t('Bracket, fuel can', 'bracket', 2500, [400, 200, 200]),
      t('Jack, hydraulic, 3 ton', 'generic', 5500, [250, 150, 150]),
    ],
    hw: [
      ['bolt 5/16-18 x 1', 6],
      ['nut 5/16-18', 6],
    ],
  },
];
