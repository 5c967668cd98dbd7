// Fictional demo data: invented makers, models and numbers.
// The brake system of each demo vehicle, written out by hand: assemblies, parts, parts lists with early/late
// production effectivity, their exploded diagrams, and the brake supersessions the demo relies on.
import type { CatalogFactory, PartSpec } from './catalog-factory';
import type { HardwarePool } from './catalog-hardware';
import type { DemoBomLine } from './catalog-types';
import type { VehicleCtx } from './catalog-vehicles';
import { brakeLayout, type BrakeDiagramKind } from './diagrams/brake-layouts';
import { renderDiagram } from './diagrams/svg-kit';

/** Hand-picked numbers of the light truck's brake parts that tests and the demo walkthrough refer to. */
export const KV4_BRAKE_NUMBERS = {
  pedalEarly: 'KV-20401',
  pedalLate: 'KV-20402',
  bracketEarly: 'KV-4471',
  bracketLate: 'KV-4471-B',
  masterEarly: 'KV-20417',
  masterLate: 'KV-26602',
  /** Ordnance number of the early master cylinder, printed with letter O (people type a zero). */
  masterEarlyOrdnance: 'D06-O20417',
  /** Vendor number of the late master cylinder, printed with letter I (people type a one). */
  masterLateVendor: 'QH I26602',
  masterKitEarly: 'KV-20430',
  hoseFrontLeftEarly: 'KV-20520',
  hoseFrontRightEarly: 'KV-20521',
  hoseFrontLate: 'KV-20525',
  wheelCylFrontEarly: 'KV-20560',
  wheelCylFrontLate: 'KV-20563',
  wheelCylRearEarly: 'KV-20580',
  wheelCylRearLate: 'KV-20583',
  shoe: 'KV-20610',
  shoeChain: ['KV-20610-A', 'KV-28815', 'KV-28815-B', 'KV-28815-C'],
} as const;

export const ST25_BRAKE_NUMBERS = {
  masterEarly: 'ST 106010',
  masterLate: 'ST 106012',
  hoseFrontEarly: 'ST 106030',
  hoseFrontLate: 'ST 106031',
  wheelCylFront: 'ST 106040',
  hoseRear: 'ST 106050',
  hoseRearChain: ['ST 106050A', 'ST 106057', 'ST 106057B', 'ST 106059'],
} as const;

export const KV4_PEDAL_CONDITION = 'Fits only with late pedal bracket KV-4471-B.';

export interface BrakeResult {
  assemblyKeys: Record<'pedals' | 'masterCylinder' | 'frontLines' | 'rearLines' | 'frontWheel' | 'frontWheelCylinder' | 'rearWheel' | 'rearWheelCylinder' | 'parking', string>;
  partKeys: Record<string, string>;
}

type LineSpec = Omit<Partial<DemoBomLine>, 'assemblyKey' | 'callout' | 'partKey'>;

export function buildBrakes(f: CatalogFactory, hw: HardwarePool, v: VehicleCtx): BrakeResult {
  const kv = v.code === 'kv4';
  const s = v.scale;
  const ds = Math.cbrt(s);
  const early = { serialTo: v.lateSerial - 1 };
  const late = { serialFrom: v.lateSerial };
  const builtEarly = { builtTo: v.lastEarlyBuilt };
  const builtLate = { builtFrom: v.lateBuilt };
  const keys: Record<string, string> = {};

  type Spec = Omit<PartSpec, 'key' | 'system' | 'vehicle' | 'grams' | 'dims'> & { g: number; d: [number, number, number]; fixed?: boolean };
  /** A brake part of this vehicle; sizes are written for the light truck and scaled unless `fixed`. */
  const p = (id: string, sp: Spec, where: string): string => {
    const { g, d, fixed, ...rest } = sp;
    const key = f.addPart({
      key: `${v.code}.brakes.${id}`,
      system: 'brakes',
      vehicle: v,
      grams: fixed ? g : g * s,
      dims: fixed ? d : [d[0] * ds, d[1] * ds, d[2] * ds],
      where,
      ...rest,
    });
    keys[id] = key;
    return key;
  };
  const tubeGrams = (odIn: number, lengthIn: number) => Math.round((odIn > 0.2 ? 98 : 71) * lengthIn * 0.0254 + 10);
  const brakeLine = (id: string, name: string, odIn: 0.1875 | 0.25, lengthIn: number, where: string) =>
    p(id, {
      name,
      category: 'brake_line',
      g: tubeGrams(odIn, lengthIn),
      d: [Math.min(lengthIn * 25.4 * 0.7, 1400), 150, 30],
      fixed: true,
      specs: { tubeOdIn: odIn, lengthIn, flare: 'double_inverted', nutThread: odIn === 0.25 ? '7/16-24' : '3/8-24' },
    }, where);

  const asm = (short: string, code: string, name: string, description: string, parent: string | null = null) =>
    f.addAssembly({
      key: `${v.code}:brakes.${short}`,
      vehicleSlug: v.vehicle.slug,
      systemSlug: 'brakes',
      parentKey: parent,
      code,
      name,
      description,
    });
  const line = (assemblyKey: string, callout: string, partKey: string, quantity = 1, extra: LineSpec = {}) =>
    f.addLine({ assemblyKey, callout, partKey, quantity, ...extra });
  const drawn = (assemblyKey: string, kind: BrakeDiagramKind, title: string, code: string) => {
    const used = f.linesOf(assemblyKey).map((l) => l.callout);
    const { svg, callouts } = renderDiagram(brakeLayout(kind, title, !kv), used, `${v.vehicle.maker} ${v.vehicle.model} · group ${code}`);
    f.setDiagram(assemblyKey, svg, callouts);
  };

  // ---------------- pedal and linkage ----------------
  const wPed = 'brake pedal and linkage';
  const aPed = asm('pedals', '06-01', 'Brake pedal and linkage', 'Suspended brake pedal, pivot shaft and bracket, and the push rod to the master cylinder.');
  if (kv) {
    p('pedal-early', { name: 'Pedal, brake, early', category: 'pedal', g: 1450, d: [380, 70, 40], maker: KV4_BRAKE_NUMBERS.pedalEarly, nsn: true }, wPed);
    p('pedal-late', { name: 'Pedal, brake, late', category: 'pedal', g: 1520, d: [385, 70, 40], maker: KV4_BRAKE_NUMBERS.pedalLate, nsn: true, description: 'Brake pedal with the longer hub of late production; pairs with the late pedal bracket KV-4471-B.' }, wPed);
    p('bracket-early', { name: 'Bracket, brake pedal, early', category: 'bracket', g: 980, d: [210, 120, 60], maker: KV4_BRAKE_NUMBERS.bracketEarly }, wPed);
    p('bracket-late', { name: 'Bracket, brake pedal, late', category: 'bracket', g: 1040, d: [215, 120, 64], maker: KV4_BRAKE_NUMBERS.bracketLate, nsn: true }, wPed);
    line(aPed, '1', keys['pedal-early'], 1, early);
    line(aPed, '1', keys['pedal-late'], 1, late);
    line(aPed, '3', keys['bracket-early'], 1, early);
    line(aPed, '3', keys['bracket-late'], 1, late);
    f.supersede(keys['pedal-early'], keys['pedal-late'], 'conditional', KV4_PEDAL_CONDITION);
    f.supersede(keys['bracket-early'], keys['bracket-late'], 'conditional', 'Fit together with late pedal KV-20402.');
  } else {
    p('pedal', { name: 'Pedal, brake', category: 'pedal', g: 1450, d: [380, 70, 40], nsn: true }, wPed);
    p('bracket', { name: 'Bracket, brake and clutch pedal', category: 'bracket', g: 980, d: [210, 120, 60] }, wPed);
    line(aPed, '1', keys['pedal']);
    line(aPed, '3', keys['bracket']);
  }
  line(aPed, '2', p('pedal-pad', { name: 'Pad, brake pedal', category: 'pedal', g: 90, d: [110, 60, 12], reproduction: true }, wPed));
  line(aPed, '4', p('pedal-shaft', { name: 'Shaft, brake pedal pivot', category: 'shaft', g: 420, d: [190, 22, 22] }, wPed));
  line(aPed, '5', p('pedal-bushing', { name: 'Bushing, pedal pivot, bronze', category: 'bearing', g: 18, d: [25, 22, 22] }, wPed), 2, { notes: 'One each side of the pedal hub' });
  line(aPed, '6', p('pedal-spring', { name: 'Spring, brake pedal return', category: 'spring', g: 60, d: [150, 20, 20] }, wPed));
  line(aPed, '7', p('push-rod', { name: 'Rod, push, master cylinder', category: 'linkage', g: 140, d: [170, 10, 10], specs: { thread: '3/8-24 UNF' } }, wPed));
  line(aPed, '8', p('push-rod-clevis', { name: 'Clevis, push rod, adjustable', category: 'linkage', g: 65, d: [50, 25, 22], specs: { thread: '3/8-24 UNF' } }, wPed));
  line(aPed, '9', hw.key('clevis 3/8 x 1-1/8'));
  line(aPed, '10', hw.key('cotter 3/32 x 3/4'));
  line(aPed, '11', hw.key('jam 3/8-24'), 1, { notes: 'Locks the clevis on the push rod' });
  line(aPed, '12', hw.key('bolt 3/8-16 x 1-1/4'), 3, { notes: 'Bracket to frame' });
  line(aPed, '13', hw.key('lw 3/8'), 3);
  line(aPed, '14', hw.key('nut 3/8-16'), 3);
  line(aPed, '15', p('pedal-thrust-washer', { name: 'Washer, thrust, pedal shaft', category: 'washer', g: 8, d: [30, 30, 2] }, wPed));
  line(aPed, '16', p('pedal-shaft-ring', { name: 'Ring, retaining, pedal shaft', category: 'clip', g: 3, d: [26, 26, 1.5] }, wPed));
  drawn(aPed, 'pedals', 'Brake pedal and linkage', '06-01');

  // ---------------- master cylinder ----------------
  const wMc = 'master cylinder';
  const aMc = asm('master-cylinder', '06-02', 'Master cylinder', 'Single-circuit master cylinder under the floor, with its repair parts, outlet fitting and stop light switch.');
  if (kv) {
    p('master-early', {
      name: 'Master cylinder assembly, single circuit, 1 in bore, early',
      category: 'master_cylinder',
      g: 2300,
      d: [230, 110, 120],
      maker: KV4_BRAKE_NUMBERS.masterEarly,
      numbers: [{ number: KV4_BRAKE_NUMBERS.masterEarlyOrdnance, kind: 'ordnance' }],
      nsn: true,
      reproduction: true,
      specs: { boreIn: 1, circuits: 1 },
      description: 'Early single-circuit master cylinder with cast-in reservoir, 1 in bore. Rubber inside ages even unused: rebuild before road use.',
    }, wMc);
    p('master-late', {
      name: 'Master cylinder assembly, single circuit, 1 in bore, late',
      category: 'master_cylinder',
      g: 2350,
      d: [235, 110, 120],
      maker: KV4_BRAKE_NUMBERS.masterLate,
      numbers: [{ number: KV4_BRAKE_NUMBERS.masterLateVendor, kind: 'vendor' }],
      nsn: true,
      specs: { boreIn: 1, circuits: 1 },
      description: 'Late master cylinder with a larger reservoir and a revised outlet boss; fits early vehicles as well.',
    }, wMc);
    line(aMc, '1', keys['master-early'], 1, early);
    line(aMc, '1', keys['master-late'], 1, late);
    f.supersede(keys['master-early'], keys['master-late'], 'two_way', null);
  } else {
    p('master-early', { name: 'Master cylinder assembly, single circuit, 1-1/4 in bore, early', category: 'master_cylinder', g: 2300, d: [230, 110, 120], maker: ST25_BRAKE_NUMBERS.masterEarly, nsn: true, specs: { boreIn: 1.25, circuits: 1 } }, wMc);
    p('master-late', { name: 'Master cylinder assembly, single circuit, 1-1/4 in bore, late', category: 'master_cylinder', g: 2350, d: [235, 110, 120], maker: ST25_BRAKE_NUMBERS.masterLate, nsn: true, specs: { boreIn: 1.25, circuits: 1 } }, wMc);
    line(aMc, '1', keys['master-early'], 1, early);
    line(aMc, '1', keys['master-late'], 1, late);
    f.supersede(keys['master-early'], keys['master-late'], 'one_way', 'Late cylinder fits early trucks; an early cylinder must not go on a late truck (different outlet boss).');
  }
  line(aMc, '2', p('mc-cap', { name: 'Cap, filler, master cylinder, vented', category: 'generic', g: 60, d: [55, 55, 25] }, wMc));
  line(aMc, '3', p('mc-cap-gasket', { name: 'Gasket, master cylinder filler cap', category: 'gasket', g: 3, d: [45, 45, 2] }, wMc));
  line(aMc, '4', p('mc-boot', { name: 'Boot, master cylinder push rod', category: 'boot', g: 25, d: [70, 45, 45], reproduction: true }, wMc));
  const kit = p('mc-kit', { name: 'Kit, repair, master cylinder', category: 'cylinder_kit', g: 160, d: [120, 80, 40], maker: kv ? KV4_BRAKE_NUMBERS.masterKitEarly : undefined, nsn: true, reproduction: true, description: 'Primary cup, piston with secondary cup, return spring, check valve and boot for one master cylinder. Rubber ages even unused: old stock is for display or authenticity only.' }, wMc);
  line(aMc, '5', kit, 1, { notes: 'Contains callouts 4, 6, 7, 8, 9' });
  const cupP = p('mc-cup-primary', { name: 'Cup, piston, primary, master cylinder', category: 'seal', g: 4, d: [26, 26, 9], reproduction: true }, wMc);
  const pist = p('mc-piston', { name: 'Piston, master cylinder, with secondary cup', category: 'generic', g: 55, d: [45, 26, 26] }, wMc);
  const spr = p('mc-spring', { name: 'Spring, piston return, with retainer, master cylinder', category: 'spring', g: 20, d: [70, 20, 20] }, wMc);
  const valve = p('mc-check-valve', { name: 'Valve, check, master cylinder outlet', category: 'seal', g: 6, d: [16, 16, 10] }, wMc);
  line(aMc, '6', cupP);
  line(aMc, '7', pist);
  line(aMc, '8', spr);
  line(aMc, '9', valve);
  line(aMc, '10', p('stop-switch', { name: 'Switch, stop light, hydraulic', category: 'switch', g: 70, d: [60, 25, 25], specs: { thread: '1/8-27 NPT', volts: kv ? 6 : 24 } }, wMc));
  line(aMc, '11', p('mc-outlet', { name: 'Fitting, outlet, master cylinder, with switch port', category: 'brake_fitting', g: 55, d: [45, 25, 25], specs: { thread: '3/8-24 UNF', seat: 'inverted_flare' } }, wMc));
  line(aMc, '12', p('mc-outlet-washer', { name: 'Washer, sealing, copper, master cylinder outlet', category: 'sealing_washer', g: 2, d: [16, 16, 1.5], fixed: true, specs: { boreIn: 0.5, material: 'copper' } }, wMc), 1, { notes: 'Fit new whenever the fitting is disturbed' });
  line(aMc, '13', hw.key('bolt 3/8-16 x 2-1/2'), 2, { notes: 'Cylinder to frame bracket' });
  line(aMc, '14', hw.key('lw 3/8'), 2);
  line(aMc, '15', p('mc-stop-ring', { name: 'Ring, snap, piston stop, master cylinder', category: 'clip', g: 2, d: [28, 28, 1.5], fixed: true }, wMc));
  line(aMc, '16', hw.key('nut 3/8-16'), 2);
  drawn(aMc, 'master_cylinder', 'Master cylinder', '06-02');
  if (kv) {
    // Kit number withdrawn: the pieces are ordered one by one.
    for (const k of [cupP, pist, spr, valve, keys['mc-boot']]) f.supersede(kit, k, 'one_way', 'Kit number withdrawn; order its pieces.', 1);
  }

  // ---------------- front lines and hoses ----------------
  const wFl = 'front brake lines';
  const aFl = asm('front-lines', '06-03', 'Front brake lines and hoses', 'Steel lines from the master cylinder to the front tee and on to the frame brackets, and the two flexible front hoses.');
  const od: 0.1875 | 0.25 = kv ? 0.1875 : 0.25;
  const lk = kv ? 1 : 1.6;
  line(aFl, '1', brakeLine('tube-mc-front-tee', 'Tube, brake, master cylinder to front tee', od, Math.round(38 * lk), wFl));
  line(aFl, '2', p('tee-front', { name: 'Tee, brake line, front, frame mounted', category: 'brake_fitting', g: 90, d: [50, 35, 25], specs: { ports: 3, thread: od === 0.25 ? '7/16-24' : '3/8-24', seat: 'inverted_flare' } }, wFl));
  line(aFl, '3', brakeLine('tube-front-left', 'Tube, brake, front tee to left hose', 0.1875, Math.round(22 * lk), wFl));
  line(aFl, '4', brakeLine('tube-front-right', 'Tube, brake, front tee to right hose', 0.1875, Math.round(30 * lk), wFl));
  const hoseSpecs = (lengthIn: number) => ({ lengthIn, ends: 'male-female' as const });
  if (kv) {
    p('hose-front-left-early', { name: 'Hose, brake, front, left, early', category: 'brake_hose', g: 110, d: [300, 25, 25], maker: KV4_BRAKE_NUMBERS.hoseFrontLeftEarly, nsn: true, specs: hoseSpecs(11.5) }, wFl);
    p('hose-front-right-early', { name: 'Hose, brake, front, right, early', category: 'brake_hose', g: 110, d: [300, 25, 25], maker: KV4_BRAKE_NUMBERS.hoseFrontRightEarly, nsn: true, specs: hoseSpecs(11.5) }, wFl);
    p('hose-front', { name: 'Hose, brake, front, flexible, either side', category: 'brake_hose', g: 110, d: [300, 25, 25], maker: KV4_BRAKE_NUMBERS.hoseFrontLate, nsn: true, reproduction: true, specs: hoseSpecs(11.5) }, wFl);
    line(aFl, '5', keys['hose-front-left-early'], 1, { notes: 'Left side', ...builtEarly });
    line(aFl, '5', keys['hose-front-right-early'], 1, { notes: 'Right side', ...builtEarly });
    line(aFl, '5', keys['hose-front'], 2, { notes: 'Either side', ...builtLate });
    // Consolidation: the handed early hoses became one hose for either side.
    f.supersede(keys['hose-front-left-early'], keys['hose-front'], 'one_way', null);
    f.supersede(keys['hose-front-right-early'], keys['hose-front'], 'one_way', null);
  } else {
    p('hose-front-early', { name: 'Hose, brake, front, flexible, early', category: 'brake_hose', g: 150, d: [400, 28, 28], fixed: true, maker: ST25_BRAKE_NUMBERS.hoseFrontEarly, nsn: true, specs: hoseSpecs(15) }, wFl);
    p('hose-front', { name: 'Hose, brake, front, flexible, late', category: 'brake_hose', g: 160, d: [400, 28, 28], fixed: true, maker: ST25_BRAKE_NUMBERS.hoseFrontLate, nsn: true, reproduction: true, specs: hoseSpecs(15) }, wFl);
    line(aFl, '5', keys['hose-front-early'], 2, { notes: 'Either side', ...builtEarly });
    line(aFl, '5', keys['hose-front'], 2, { notes: 'Either side', ...builtLate });
    f.supersede(keys['hose-front-early'], keys['hose-front'], 'two_way', null);
  }
  const hoseClip = p('hose-clip', { name: 'Clip, brake hose lock', category: 'clip', g: 5, d: [25, 20, 3], fixed: true }, 'brake lines');
  line(aFl, '6', hoseClip, 2);
  const clampSingle = p('clamp-single', { name: 'Clamp, brake line, single', category: 'clamp', g: 6, d: [25, 14, 8], fixed: true, specs: { tubeOdIn: od, tubes: 1 } }, 'brake lines');
  line(aFl, '7', clampSingle, 4);
  line(aFl, '8', p('clamp-double', { name: 'Clamp, brake line and fuel line, double', category: 'clamp', g: 9, d: [36, 14, 8], fixed: true, specs: { tubeOdIn: od, tubes: 2 } }, wFl), 2, { notes: 'Holds the front brake line beside the fuel line' });
  const hoseWasher = p('hose-washer', { name: 'Washer, sealing, copper, brake hose end', category: 'sealing_washer', g: 2, d: [17, 17, 1.5], fixed: true, specs: { boreIn: 0.4375, material: 'copper' } }, 'brake hoses');
  line(aFl, '9', hoseWasher, 2, { notes: 'Hose to wheel cylinder; fit new' });
  line(aFl, '10', hw.key('bolt 5/16-18 x 3/4'), 1, { notes: 'Tee to crossmember' });
  line(aFl, '11', hw.key('lw 5/16'));
  const tubeNut = p('tube-nut-3-16', { name: 'Nut, tube, inverted flare, 3/16 tube, 3/8-24', category: 'brake_fitting', g: 6, d: [16, 11, 11], fixed: true, specs: { tubeOdIn: 0.1875, thread: '3/8-24 UNF', seat: 'inverted_flare' } }, 'brake lines');
  line(aFl, '12', tubeNut, kv ? 6 : 4, { notes: 'Spare; each tube comes with its nuts fitted' });
  if (!kv) {
    line(aFl, '12', p('tube-nut-1-4', { name: 'Nut, tube, inverted flare, 1/4 tube, 7/16-24', category: 'brake_fitting', g: 8, d: [18, 13, 13], fixed: true, specs: { tubeOdIn: 0.25, thread: '7/16-24', seat: 'inverted_flare' } }, 'brake lines'), 2, { notes: 'Spare, for the 1/4 in frame line' });
  }
  line(aFl, '13', hw.key('bolt 1/4-20 x 1/2'), 6, { notes: 'Clamp screws' });
  drawn(aFl, 'front_lines', 'Front brake lines and hoses', '06-03');

  // ---------------- rear lines and hoses ----------------
  const wRl = 'rear brake lines';
  const aRl = asm('rear-lines', '06-04', 'Rear brake lines and hoses', kv ? 'Frame line to the rear hose, the rear axle tee and the two axle lines.' : 'Frame line to the frame tee between the rear axles, the two rear hoses, the axle tees and the four axle lines.');
  const std = [v.variantCodes.standard, v.variantCodes.winch];
  line(aRl, '1', brakeLine('tube-frame-rear', `Tube, brake, frame, front tee to rear hose, ${kv ? 84 : 140} in`, od, kv ? 84 : 140, wRl), 1, { variants: std });
  line(aRl, '1', brakeLine('tube-frame-rear-lwb', `Tube, brake, frame, front tee to rear hose, long wheelbase, ${kv ? 100 : 176} in`, od, kv ? 100 : 176, wRl), 1, { variants: [v.variantCodes.long], notes: 'Long wheelbase only' });
  if (kv) {
    line(aRl, '2', p('hose-rear', { name: 'Hose, brake, rear, frame to axle', category: 'brake_hose', g: 120, d: [360, 25, 25], nsn: true, reproduction: true, specs: { lengthIn: 14, ends: 'female-female' } }, wRl));
  } else {
    line(aRl, '2', p('hose-rear', { name: 'Hose, brake, rear, frame tee to axle', category: 'brake_hose', g: 160, d: [420, 28, 28], fixed: true, maker: ST25_BRAKE_NUMBERS.hoseRear, nsn: true, reproduction: true, specs: { lengthIn: 16, ends: 'female-female' } }, wRl), 2, { notes: 'One to each rear axle' });
  }
  line(aRl, '3', p('tee-axle', { name: 'Tee, brake line, rear axle', category: 'brake_fitting', g: 95, d: [55, 35, 25], specs: { ports: 3, thread: '3/8-24', seat: 'inverted_flare' } }, wRl), kv ? 1 : 2, kv ? {} : { notes: 'One on each rear axle' });
  line(aRl, '4', brakeLine('tube-axle', 'Tube, brake, axle tee to wheel cylinder, either side', 0.1875, kv ? 26 : 34, wRl), kv ? 2 : 4);
  line(aRl, '5', p('hose-bracket-rear', { name: 'Bracket, brake hose, rear', category: 'bracket', g: 140, d: [60, 45, 40] }, wRl));
  line(aRl, '6', hoseClip, kv ? 1 : 2);
  line(aRl, '7', clampSingle, kv ? 6 : 9);
  line(aRl, '8', p('clip-axle-tube', { name: 'Clip, brake tube, axle housing', category: 'clip', g: 5, d: [30, 12, 10], fixed: true }, wRl), kv ? 4 : 8);
  line(aRl, '9', hoseWasher, kv ? 1 : 2, { notes: 'Hose to axle tee; fit new' });
  line(aRl, '10', hw.key('bolt 5/16-24 x 1'), kv ? 1 : 3, { notes: kv ? 'Tee to axle housing' : 'Tees to axle housings and frame' });
  line(aRl, '11', hw.key('lw 5/16'), kv ? 1 : 3);
  line(aRl, '12', tubeNut, kv ? 5 : 8, { notes: 'Spare; each tube comes with its nuts fitted' });
  if (!kv) line(aRl, '13', p('tee-frame-rear', { name: 'Tee, brake line, frame, between rear axles', category: 'brake_fitting', g: 95, d: [55, 35, 25], specs: { ports: 3, thread: '7/16-24', seat: 'inverted_flare' } }, wRl));
  drawn(aRl, 'rear_lines', 'Rear brake lines and hoses', '06-04');

  // ---------------- wheel brakes and wheel cylinders ----------------
  const wheelBrake = (end: 'front' | 'rear', code: string) => {
    const where = `${end} wheel brake`;
    const axles = end === 'rear' && !kv ? 2 : 1;
    const a = asm(`${end}-wheel`, code, `${end === 'front' ? 'Front' : 'Rear'} wheel brake`, `Backing plates, shoes, springs and adjusters of the ${end} drum brakes${axles === 2 ? ' (both rear axles)' : ''}.`);
    const per = axles * 2;
    line(a, '1', p(`plate-${end}-left`, { name: `Plate, backing, ${end} brake, left`, category: 'housing', g: 2600, d: [300, 300, 60] }, where), axles, { notes: 'Left side' });
    line(a, '1', p(`plate-${end}-right`, { name: `Plate, backing, ${end} brake, right`, category: 'housing', g: 2600, d: [300, 300, 60] }, where), axles, { notes: 'Right side' });
    const shoeKey =
      kv && end === 'rear'
        ? keys['shoe']
        : p(kv ? 'shoe' : `shoe-${end}`, {
            name: kv ? 'Shoe, brake, with lining, front or rear' : `Shoe, brake, with lining, ${end}`,
            category: 'brake_shoe',
            g: 1100,
            d: [280, 45, 70],
            maker: kv ? KV4_BRAKE_NUMBERS.shoe : undefined,
            nsn: true,
            specs: { drumDiameterIn: kv ? 9 : 14, liningWidthIn: kv ? 1.75 : 3 },
            description: 'Brake shoe with riveted lining. Linings of this age may contain asbestos: do not sand or blow the dust.',
          }, where);
    line(a, '2', shoeKey, per * 2);
    const lining = kv && end === 'rear' ? keys['lining'] : p(kv ? 'lining' : `lining-${end}`, { name: kv ? 'Lining set, brake shoe, with rivets' : `Lining set, brake shoe, ${end}, with rivets`, category: 'brake_shoe', g: 700, d: [260, 45, 30], description: 'Lining set to reline one axle; riveting needs the right tools.' }, where);
    line(a, '3', lining, axles, { notes: 'Set for one axle' });
    const upper = kv && end === 'rear' ? keys['spring-return'] : p(kv ? 'spring-return' : `spring-return-${end}`, { name: 'Spring, brake shoe return', category: 'spring', g: 45, d: [120, 14, 14] }, where);
    line(a, '4', upper, per);
    line(a, '5', p(`anchor-pin-${end}`, { name: `Pin, anchor, brake shoe, ${end}`, category: 'linkage', g: 90, d: [55, 18, 18] }, where), per * 2);
    line(a, '6', p(`cam-${end}`, { name: `Cam, brake shoe adjusting, eccentric, ${end}`, category: 'generic', g: 60, d: [35, 30, 25] }, where), per * 2);
    const hdPin = kv && end === 'rear' ? keys['hold-down-pin'] : p('hold-down-pin' + (kv ? '' : `-${end}`), { name: 'Pin, brake shoe hold-down', category: 'linkage', g: 12, d: [60, 8, 8] }, where);
    line(a, '7', hdPin, per * 2);
    const hdSpring = kv && end === 'rear' ? keys['hold-down-spring'] : p('hold-down-spring' + (kv ? '' : `-${end}`), { name: 'Spring, brake shoe hold-down', category: 'spring', g: 8, d: [25, 18, 18] }, where);
    line(a, '8', hdSpring, per * 2);
    const hdCup = kv && end === 'rear' ? keys['hold-down-cup'] : p('hold-down-cup' + (kv ? '' : `-${end}`), { name: 'Cup, brake shoe hold-down spring', category: 'washer', g: 4, d: [20, 20, 5], fixed: true }, where);
    line(a, '9', hdCup, per * 4);
    line(a, '10', hw.key('castle 7/16-20'), per * 2, { notes: 'Anchor pin nut' });
    line(a, '11', hw.key('lw 7/16'), per * 2);
    line(a, '12', hw.key(kv ? 'bolt 3/8-24 x 1-1/4' : 'bolt 1/2-20 x 1-1/2'), per * 5, { notes: 'Backing plate to knuckle or axle flange' });
    line(a, '13', p(`spring-lower-${end}`, { name: `Spring, brake shoe, lower, ${end}`, category: 'spring', g: 35, d: [100, 12, 12] }, where), per);
    drawn(a, 'wheel_brake', `${end === 'front' ? 'Front' : 'Rear'} wheel brake`, code);

    // The wheel cylinder is a sub-assembly of the wheel brake.
    const wc = `${end} wheel cylinder`;
    const c = asm(`${end}-wheel-cylinder`, `${code}.1`, `${end === 'front' ? 'Front' : 'Rear'} wheel cylinder`, `Double-piston wheel cylinder of the ${end} brakes with its repair parts.`, a);
    const bore = kv ? (end === 'front' ? 1 : 0.875) : end === 'front' ? 1.25 : 1.375;
    const wcSpec = (id: string, name: string, maker?: string) =>
      p(id, { name, category: 'wheel_cylinder', g: 520, d: [95, 50, 55], maker, nsn: true, reproduction: true, specs: { boreIn: bore, pistons: 2 } }, wc);
    if (kv) {
      const n = KV4_BRAKE_NUMBERS;
      const e = wcSpec(`wheel-cyl-${end}-early`, `Cylinder, wheel, ${end}, ${bore === 1 ? '1' : '7/8'} in bore, early`, end === 'front' ? n.wheelCylFrontEarly : n.wheelCylRearEarly);
      const l = wcSpec(`wheel-cyl-${end}-late`, `Cylinder, wheel, ${end}, ${bore === 1 ? '1' : '7/8'} in bore, late`, end === 'front' ? n.wheelCylFrontLate : n.wheelCylRearLate);
      line(c, '1', e, per, early);
      line(c, '1', l, per, late);
      if (end === 'front') f.supersede(e, l, 'one_way', null);
    } else {
      line(c, '1', wcSpec(`wheel-cyl-${end}`, `Cylinder, wheel, ${end}, ${bore === 1.25 ? '1-1/4' : '1-3/8'} in bore`, end === 'front' ? ST25_BRAKE_NUMBERS.wheelCylFront : undefined), per);
    }
    const bootK = p(`wc-boot-${end}`, { name: `Boot, wheel cylinder, ${end}`, category: 'boot', g: 8, d: [35, 35, 18], fixed: true, reproduction: true }, wc);
    const pistonK = p(`wc-piston-${end}`, { name: `Piston, wheel cylinder, ${end}`, category: 'generic', g: 25, d: [26, 26, 18], fixed: true }, wc);
    const cupK = p(`wc-cup-${end}`, { name: `Cup, wheel cylinder, ${end}`, category: 'seal', g: 3, d: [26, 26, 8], fixed: true, reproduction: true }, wc);
    const springK = p(`wc-spring-${end}`, { name: `Spring, wheel cylinder cup expander, ${end}`, category: 'spring', g: 6, d: [45, 18, 18], fixed: true }, wc);
    line(c, '2', bootK, per * 2);
    line(c, '3', pistonK, per * 2);
    line(c, '4', cupK, per * 2);
    line(c, '5', springK, per);
    const bleederK = kv && end === 'rear' ? keys['bleeder'] : p(kv ? 'bleeder' : `bleeder-${end}`, { name: 'Screw, bleeder, wheel cylinder', category: 'brake_fitting', g: 8, d: [30, 10, 10], fixed: true, specs: { thread: '1/4-28 UNF' } }, wc);
    line(c, '6', bleederK, per);
    const capK = kv && end === 'rear' ? keys['bleeder-cap'] : p(kv ? 'bleeder-cap' : `bleeder-cap-${end}`, { name: 'Cap, bleeder screw, rubber', category: 'boot', g: 1, d: [12, 12, 10], fixed: true }, wc);
    line(c, '7', capK, per);
    const kitK = p(`wc-kit-${end}`, { name: `Kit, repair, wheel cylinder, ${end}`, category: 'cylinder_kit', g: 40, d: [90, 60, 25], fixed: true, nsn: true, reproduction: true, description: `Two cups, two boots and the expander spring for one ${end} wheel cylinder. Rubber ages even unused: old stock is for display or authenticity only.` }, wc);
    line(c, '8', kitK, per, { notes: 'One kit per cylinder' });
    line(c, '9', hw.key(kv ? 'bolt 5/16-24 x 3/4' : 'bolt 3/8-24 x 1'), per * 2, { notes: 'Cylinder to backing plate' });
    line(c, '10', hw.key(kv ? 'lw 5/16' : 'lw 3/8'), per * 2);
    drawn(c, 'wheel_cylinder', `${end === 'front' ? 'Front' : 'Rear'} wheel cylinder`, `${code}.1`);

    // Kits: the early rear cylinder of the light truck (and the heavy truck's front one) is no longer
    // stocked whole; the replacement is its rubber and spring to rebuild the existing body.
    const rebuildNote = 'No complete cylinder is stocked; rebuild the existing body with these parts.';
    if (kv && end === 'rear') {
      const e = keys[`wheel-cyl-rear-early`];
      f.supersede(e, cupK, 'conditional', rebuildNote, 2);
      f.supersede(e, bootK, 'conditional', rebuildNote, 2);
      f.supersede(e, springK, 'conditional', rebuildNote, 1);
    }
    if (!kv && end === 'front') {
      const whole = keys['wheel-cyl-front'];
      f.supersede(whole, cupK, 'conditional', rebuildNote, 2);
      f.supersede(whole, bootK, 'conditional', rebuildNote, 2);
      f.supersede(whole, pistonK, 'conditional', rebuildNote, 2);
      f.supersede(whole, springK, 'conditional', rebuildNote, 1);
    }
    return { a, c };
  };
  const front = wheelBrake('front', '06-05');
  const rear = wheelBrake('rear', '06-06');

  // ---------------- parking brake ----------------
  const wPk = 'parking brake';
  const aPk = asm('parking', '06-07', 'Parking brake', 'Hand-operated band brake on the transfer case rear output: T-handle, cable and conduit, drum and band.');
  line(aPk, '1', p('park-handle', { name: 'Handle, parking brake, T-type, with ratchet', category: 'linkage', g: 900, d: [300, 110, 60] }, wPk));
  line(aPk, '2', p('park-cable', { name: 'Cable and conduit, parking brake', category: 'linkage', g: 450, d: [600, 200, 30], specs: { lengthIn: kv ? 54 : 86 } }, wPk));
  line(aPk, '3', p('park-conduit-clip', { name: 'Clamp, conduit, parking brake cable', category: 'clamp', g: 10, d: [40, 22, 12], fixed: true }, wPk), 2);
  line(aPk, '4', p('park-bracket', { name: 'Bracket, parking brake cable, on transfer case', category: 'bracket', g: 280, d: [110, 60, 45] }, wPk));
  line(aPk, '5', p('park-drum', { name: 'Drum, parking brake, transfer output', category: 'housing', g: 4800, d: [230, 230, 70] }, wPk));
  line(aPk, '6', p('park-band', { name: 'Band, parking brake, with lining', category: 'brake_shoe', g: 1200, d: [260, 260, 60], nsn: true, reproduction: true }, wPk));
  line(aPk, '7', p('park-adjust-bolt', { name: 'Bolt, parking brake band adjusting', category: 'fastener', g: 80, d: [95, 14, 14], fixed: true, specs: { thread: '3/8-24 UNF', lengthIn: 3.5 } }, wPk));
  line(aPk, '8', p('park-spring', { name: 'Spring, parking brake band release', category: 'spring', g: 30, d: [60, 16, 16], fixed: true }, wPk));
  line(aPk, '9', p('park-lever', { name: 'Lever, parking brake band operating', category: 'linkage', g: 380, d: [170, 35, 20] }, wPk));
  line(aPk, '10', hw.key('clevis 5/16 x 1'));
  line(aPk, '11', hw.key('cotter 1/8 x 1'));
  line(aPk, '12', hw.key('nut 3/8-24'), 2);
  line(aPk, '13', hw.key('bolt 3/8-16 x 1'), 2, { notes: 'Cable bracket to transfer case' });
  line(aPk, '14', hw.key('lw 3/8'), 2);
  drawn(aPk, 'parking', 'Parking brake', '06-07');

  return {
    assemblyKeys: {
      pedals: aPed,
      masterCylinder: aMc,
      frontLines: aFl,
      rearLines: aRl,
      frontWheel: front.a,
      frontWheelCylinder: front.c,
      rearWheel: rear.a,
      rearWheelCylinder: rear.c,
      parking: aPk,
    },
    partKeys: keys,
  };
}
