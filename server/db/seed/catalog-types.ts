// Fictional demo data: invented makers, models and numbers.
// The shape of the generated demo catalog (the contract the seed's database inserts are written against).

export type Interchange = 'two_way' | 'one_way' | 'conditional';
export type NumberKind = 'maker' | 'ordnance' | 'nsn' | 'hardware_standard' | 'vendor' | 'reproduction';
export type SafetyClass = 'brake' | 'steering' | 'suspension' | 'none';

export const PART_CATEGORIES = [
  'brake_hose',
  'wheel_cylinder',
  'master_cylinder',
  'brake_shoe',
  'brake_line',
  'brake_fitting',
  'cylinder_kit',
  'boot',
  'clamp',
  'clip',
  'fastener',
  'washer',
  'sealing_washer',
  'woodruff_key',
  'cotter_pin',
  'seal',
  'gasket',
  'bearing',
  'spring',
  'bracket',
  'pedal',
  'linkage',
  'lamp',
  'switch',
  'housing',
  'shaft',
  'gear',
  'filter',
  'hose',
  'weapon_mount',
  'generic',
] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];

export const SYSTEM_SLUGS = [
  'engine',
  'clutch',
  'transmission',
  'transfer-case',
  'axles',
  'brakes',
  'steering',
  'electrical',
  'fuel',
  'cooling',
  'exhaust',
  'frame',
  'body',
  'wheels-tires',
  'accessories',
] as const;
export type SystemSlug = (typeof SYSTEM_SLUGS)[number];

export interface DemoVehicle {
  slug: string;
  maker: string;
  model: string;
  name: string;
  yearFrom: number;
  yearTo: number;
  serialFrom: number;
  serialTo: number;
  serialPrefix: string;
  description: string;
  variants: Array<{ code: string; name: string; description: string }>;
}

export interface DemoSystem {
  slug: string;
  name: string;
  sortOrder: number;
}

export interface DemoAssembly {
  key: string;
  vehicleSlug: string;
  systemSlug: string;
  parentKey: string | null;
  code: string;
  name: string;
  description: string;
  diagramSvg: string | null;
  callouts: Array<{ callout: string; x: number; y: number }>;
}

export interface DemoPartNumber {
  number: string;
  kind: NumberKind;
}

export interface DemoPart {
  key: string;
  name: string;
  description: string;
  category: string;
  specs: Record<string, unknown>;
  weightGrams: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  safetyClass: SafetyClass;
  restricted?: boolean;
  numbers: DemoPartNumber[];
}

export interface DemoBomLine {
  assemblyKey: string;
  callout: string;
  partKey: string;
  quantity: number;
  notes: string | null;
  serialFrom: number | null;
  serialTo: number | null;
  builtFrom: string | null;
  builtTo: string | null;
  variants: string[] | null;
}

export interface DemoSupersession {
  fromPartKey: string;
  toPartKey: string;
  interchange: Interchange;
  note: string | null;
  quantity: number;
}

export interface DemoCatalog {
  vehicles: DemoVehicle[];
  systems: DemoSystem[];
  assemblies: DemoAssembly[];
  parts: DemoPart[];
  bomLines: DemoBomLine[];
  supersessions: DemoSupersession[];
}
