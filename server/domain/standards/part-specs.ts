/**
 * Part categories, their specification schemas, and the figures the standards add to a part page.
 * Inch fields take a number or a printed fraction ("3/16", "1-1/4", '3/16"'): spreadsheets carry both.
 */
import { z } from 'zod';
import { brakeFluid, parseBrakeFluidGrade } from './brake-fluids';
import { cotterPin, cotterPinNominals } from './cotter-pins';
import { FLARE_ANGLE_DEG, FLARE_SOURCE, INVERTED_FLARE_TUBE_FLARE, invertedFlareNutThread } from './flare-fittings';
import { formatInchFraction, parseInches, parseThread, threadFigures } from './unified-threads';
import { normalizeWoodruffKeyNumber, woodruffNominal, woodruffRow, WOODRUFF_SOURCE } from './woodruff-keys';

export const partCategories = [
  // brakes
  'brake_hose',
  'brake_line',
  'brake_fitting',
  'wheel_cylinder',
  'wheel_cylinder_kit',
  'wheel_cylinder_cup',
  'master_cylinder',
  'master_cylinder_kit',
  'brake_boot',
  'brake_shoe',
  'brake_drum',
  'brake_spring',
  'brake_fluid',
  // steering
  'steering_gear',
  'tie_rod_end',
  'drag_link',
  'steering_knuckle',
  // suspension
  'leaf_spring',
  'spring_shackle',
  'shock_absorber',
  // hardware and general
  'clamp',
  'clip',
  'fastener',
  'nut',
  'washer',
  'sealing_washer',
  'woodruff_key',
  'cotter_pin',
  'pin',
  'seal',
  'gasket',
  'bearing',
  'bushing',
  'spring',
  'bracket',
  'pedal',
  'linkage',
  'cable',
  'hose',
  'lamp',
  'switch',
  'gauge',
  'wiring',
  'housing',
  'shaft',
  'gear',
  'filter',
  'weapon_mount',
  'generic',
] as const;
export type PartCategory = (typeof partCategories)[number];
export const partCategorySchema = z.enum(partCategories);

export const safetyClasses = ['brake', 'steering', 'suspension', 'none'] as const;
export type SafetyClass = (typeof safetyClasses)[number];

const brakeCategories = new Set<string>([
  'brake_hose',
  'brake_line',
  'brake_fitting',
  'wheel_cylinder',
  'wheel_cylinder_kit',
  'wheel_cylinder_cup',
  'master_cylinder',
  'master_cylinder_kit',
  'brake_boot',
  'brake_shoe',
  'brake_drum',
  'brake_spring',
  'brake_fluid',
]);
const steeringCategories = new Set<string>(['steering_gear', 'tie_rod_end', 'drag_link', 'steering_knuckle']);
const suspensionCategories = new Set<string>(['leaf_spring', 'spring_shackle', 'shock_absorber']);

/**
 * Default safety class of a category; brake, steering and suspension parts show the trade's cautions
 * (DOMAIN.md, common practice). A part may override it (a pedal or a pin can be part of the brakes).
 */
export function safetyClassFor(category: string): SafetyClass {
  if (brakeCategories.has(category)) return 'brake';
  if (steeringCategories.has(category)) return 'steering';
  if (suspensionCategories.has(category)) return 'suspension';
  return 'none';
}

/**
 * True for hydraulic brake rubber or a unit with it inside (hoses, cups, boots, cylinders and their kits).
 * Such rubber ages even unused: old stock is for display or authenticity, used rubber is never sold as
 * serviceable (DOMAIN.md, common practice).
 */
export function isHydraulicRubber(category: string): boolean {
  return hydraulicRubber.has(category);
}
const hydraulicRubber = new Set<string>([
  'brake_hose',
  'wheel_cylinder',
  'wheel_cylinder_kit',
  'wheel_cylinder_cup',
  'master_cylinder',
  'master_cylinder_kit',
  'brake_boot',
]);

const inch = z.union([z.number(), z.string()]).transform((v, ctx) => {
  const n = parseInches(v);
  if (n === null) {
    ctx.addIssue({ code: 'custom', message: 'Give inches as a positive number or a fraction like 3/16.' });
    return z.NEVER;
  }
  return n;
});

const notes = z.string().trim().max(500).optional();

const threadField = z
  .string()
  .trim()
  .transform((v, ctx) => {
    const r = parseThread(v);
    if (!r.ok) {
      ctx.addIssue({ code: 'custom', message: r.error });
      return z.NEVER;
    }
    return r.value.designation;
  });

const woodruffKey = z.strictObject({
  keyNumber: z.union([z.string(), z.number()]).transform((v, ctx) => {
    const k = normalizeWoodruffKeyNumber(v);
    if (k === null) {
      ctx.addIssue({ code: 'custom', message: 'A Woodruff key number has 3 or 4 digits, like 505 or 1212.' });
      return z.NEVER;
    }
    return k;
  }),
  notes,
});

const cotterPinSpecs = z.strictObject({
  nominal: z.union([z.string(), z.number()]).transform((v, ctx) => {
    const row = cotterPin(v);
    if (!row) {
      ctx.addIssue({ code: 'custom', message: `Nominal size must be one of ${cotterPinNominals.join(', ')} in.` });
      return z.NEVER;
    }
    return row.nominal;
  }),
  lengthIn: inch,
  material: z.enum(['steel', 'stainless', 'brass', 'other']).optional(),
  notes,
});

const brakeLine = z.strictObject({
  tubeOdIn: inch,
  lengthIn: inch,
  flare: z.literal('double_inverted'),
  material: z.enum(['steel', 'copper_nickel', 'stainless', 'other']).optional(),
  notes,
});

const hoseEnds = z.tuple([z.string().trim().min(1).max(80), z.string().trim().min(1).max(80)]);

const hose = z.strictObject({
  lengthIn: inch,
  /** Each end described as printed, e.g. "female 3/8-24 inverted flare", "banjo 3/8". */
  ends: hoseEnds,
  insideDiaIn: inch.optional(),
  notes,
});

const fastener = z.strictObject({
  thread: threadField,
  lengthIn: inch,
  grade: z.enum(['SAE 1', 'SAE 2', 'SAE 5', 'SAE 8', 'stainless', 'brass', 'unmarked']).optional(),
  head: z.enum(['hex', 'square', 'carriage', 'socket', 'slotted', 'phillips', 'other']).optional(),
  notes,
});

const nut = z.strictObject({
  thread: threadField,
  style: z.enum(['hex', 'castle', 'slotted', 'lock', 'jam', 'square', 'wing', 'other']).optional(),
  notes,
});

const ringCheck = (v: { insideDiaIn: number; outsideDiaIn: number }) => v.outsideDiaIn > v.insideDiaIn;
const ringMessage = { message: 'Outside diameter must be larger than inside diameter.', path: ['outsideDiaIn'] };

const washer = z
  .strictObject({
    insideDiaIn: inch,
    outsideDiaIn: inch,
    thicknessIn: inch.optional(),
    type: z.enum(['flat', 'lock', 'tooth', 'other']).optional(),
    notes,
  })
  .refine(ringCheck, ringMessage);

const sealingWasher = z
  .strictObject({
    insideDiaIn: inch,
    outsideDiaIn: inch,
    material: z.enum(['copper', 'aluminium', 'fibre', 'other']),
    notes,
  })
  .refine(ringCheck, ringMessage);

const clamp = z
  .strictObject({
    type: z.enum(['worm_drive', 'spring', 't_bolt', 'wire', 'strap', 'other']),
    minDiaIn: inch.optional(),
    maxDiaIn: inch.optional(),
    widthIn: inch.optional(),
    notes,
  })
  .refine((v) => v.minDiaIn === undefined || v.maxDiaIn === undefined || v.minDiaIn <= v.maxDiaIn, {
    message: 'Smallest diameter must not exceed the largest.',
    path: ['maxDiaIn'],
  });

const seal = z.strictObject({ shaftDiaIn: inch, boreDiaIn: inch, widthIn: inch.optional(), notes });

const bearing = z.strictObject({
  designation: z.string().trim().min(1).max(40).optional(),
  boreIn: inch.optional(),
  outsideDiaIn: inch.optional(),
  widthIn: inch.optional(),
  notes,
});

const spring = z.strictObject({
  freeLengthIn: inch.optional(),
  wireDiaIn: inch.optional(),
  outsideDiaIn: inch.optional(),
  notes,
});

const leafSpring = z.strictObject({
  leaves: z.number().int().min(1).max(30).optional(),
  lengthIn: inch.optional(),
  widthIn: inch.optional(),
  notes,
});

const lamp = z.strictObject({
  volts: z.union([z.literal(6), z.literal(12), z.literal(24)]),
  watts: z.number().positive().optional(),
  candlepower: z.number().positive().optional(),
  base: z.string().trim().min(1).max(40).optional(),
  notes,
});

const brakeFluidSpecs = z.strictObject({
  grade: z.string().transform((v, ctx) => {
    const g = parseBrakeFluidGrade(v);
    if (!g) {
      ctx.addIssue({ code: 'custom', message: 'Grade must be DOT 3, DOT 4, DOT 5 or DOT 5.1.' });
      return z.NEVER;
    }
    return g;
  }),
  volumeMl: z.number().int().positive().optional(),
  notes,
});

/** Free-form specs for categories without their own schema: short names to short values. */
const generic = z
  .record(z.string().trim().min(1).max(40), z.union([z.string().max(200), z.number(), z.boolean()]))
  .refine((v) => Object.keys(v).length <= 30, { message: 'At most 30 specification fields.' });

export const specSchemas = {
  woodruff_key: woodruffKey,
  cotter_pin: cotterPinSpecs,
  brake_line: brakeLine,
  brake_hose: hose,
  hose,
  fastener,
  nut,
  washer,
  sealing_washer: sealingWasher,
  clamp,
  seal,
  bearing,
  spring,
  brake_spring: spring,
  leaf_spring: leafSpring,
  lamp,
  brake_fluid: brakeFluidSpecs,
  generic,
} as const;

export type SpecCategory = keyof typeof specSchemas;
export type Specs<C extends SpecCategory> = z.output<(typeof specSchemas)[C]>;

/** The schema for a category; categories without their own schema use the free-form one. */
export function specSchemaFor(category: string): z.ZodType<unknown> {
  return Object.hasOwn(specSchemas, category) ? specSchemas[category as SpecCategory] : generic;
}

export interface FieldError {
  path: string;
  message: string;
}

export type SpecsResult = { ok: true; value: Record<string, unknown> } | { ok: false; errors: FieldError[] };

/** Validates specs for a category, returning the parsed value (fractions as numbers) or field errors. */
export function validateSpecs(category: string, specs: unknown): SpecsResult {
  if (!(partCategories as readonly string[]).includes(category)) {
    return { ok: false, errors: [{ path: 'category', message: `Unknown part category "${category}".` }] };
  }
  const r = specSchemaFor(category).safeParse(specs ?? {});
  if (r.success) return { ok: true, value: r.data as Record<string, unknown> };
  return {
    ok: false,
    errors: r.error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(specs)', message: i.message })),
  };
}

export interface DerivedSpec {
  key: string;
  label: string;
  value: number | string;
  unit: 'in' | 'deg' | 'C' | 'F' | 'tpi' | null;
  display: string;
  source: string;
  note?: string;
}

const inchSpec = (key: string, label: string, value: number, source: string, note?: string): DerivedSpec => ({
  key,
  label,
  value,
  unit: 'in',
  display: `${value} in`,
  source,
  ...(note ? { note } : {}),
});

const fractionSpec = (key: string, label: string, value: number, source: string): DerivedSpec => ({
  key,
  label,
  value,
  unit: 'in',
  display: `${formatInchFraction(value)} in`,
  source,
});

function threadSpecs(thread: string, prefix: string, labelPrefix: string): DerivedSpec[] {
  const t = threadFigures(thread);
  const majorNote = t.majorFromMemory ? 'numbered-size major diameter from memory' : undefined;
  return [
    inchSpec(`${prefix}MajorDiameterIn`, `${labelPrefix}major diameter`, Number(t.majorIn.toFixed(4)), t.source, majorNote),
    { key: `${prefix}Tpi`, label: `${labelPrefix}threads per inch`, value: t.tpi, unit: 'tpi', display: String(t.tpi), source: t.source },
    inchSpec(`${prefix}BasicPitchDiameterIn`, `${labelPrefix}basic pitch diameter`, t.basicPitchDiameterIn, t.source, majorNote),
    ...(t.series
      ? [{ key: `${prefix}Series`, label: `${labelPrefix}series`, value: t.series, unit: null, display: t.series, source: t.source }]
      : []),
  ];
}

/**
 * Figures the standards add to a part's own specs (key width and diameter, thread pitch diameter, flare nut
 * thread...), each with its standard's name. Invalid specs or categories without a table give [].
 */
export function derivedSpecs(category: string, specs: unknown): DerivedSpec[] {
  const r = validateSpecs(category, specs);
  if (!r.ok) return [];
  const v = r.value;
  switch (category) {
    case 'woodruff_key': {
      const nominal = woodruffNominal(v.keyNumber as string)!;
      const out = [
        fractionSpec('widthIn', 'Key width', nominal.widthIn, WOODRUFF_SOURCE),
        fractionSpec('diameterIn', 'Key diameter', nominal.diameterIn, WOODRUFF_SOURCE),
      ];
      const row = woodruffRow(nominal.keyNumber);
      if (row) {
        out.push(inchSpec('heightMaxIn', 'Height, max', row.heightMaxIn, WOODRUFF_SOURCE));
        if (row.heightMinIn !== null) out.push(inchSpec('heightMinIn', 'Height, min', row.heightMinIn, WOODRUFF_SOURCE));
        out.push(inchSpec('shaftKeyseatDepthIn', 'Shaft keyseat depth', row.shaftKeyseatDepthIn, WOODRUFF_SOURCE));
        out.push(inchSpec('hubKeyseatDepthIn', 'Hub keyseat depth', row.hubKeyseatDepthIn, WOODRUFF_SOURCE));
        out.push(
          inchSpec('lengthFIn', 'Length F', row.lengthFIn, WOODRUFF_SOURCE, row.lengthFromMemory ? 'from memory' : undefined),
        );
      }
      return out;
    }
    case 'cotter_pin': {
      const row = cotterPin(v.nominal as string)!;
      return [
        inchSpec('shankMaxIn', 'Shank diameter, max', row.shankMaxIn, row.source),
        inchSpec('recommendedHoleIn', 'Recommended hole', row.recommendedHoleIn, row.source),
      ];
    }
    case 'brake_line': {
      const out: DerivedSpec[] = [
        { key: 'flareAngleDeg', label: 'Flare angle', value: FLARE_ANGLE_DEG, unit: 'deg', display: `${FLARE_ANGLE_DEG}°`, source: FLARE_SOURCE },
        {
          key: 'flare',
          label: 'Flare',
          value: INVERTED_FLARE_TUBE_FLARE,
          unit: null,
          display: 'double flare (inverted-flare seats assume double-flared tubing)',
          source: 'SAE J512 scope (via REFERENCES.md)',
        },
      ];
      const nut = invertedFlareNutThread(v.tubeOdIn as number);
      if (nut) {
        out.push({
          key: 'flareNutThread',
          label: 'Inverted flare nut thread',
          value: nut.nutThread,
          unit: null,
          display: nut.nutThread,
          source: nut.source,
          ...(nut.note ? { note: nut.note } : {}),
        });
        out.push(...threadSpecs(nut.nutThread, 'flareNut', 'Flare nut '));
      }
      return out;
    }
    case 'fastener':
    case 'nut':
      return threadSpecs(v.thread as string, 'thread', 'Thread ');
    case 'brake_fluid': {
      const f = brakeFluid(v.grade as string)!;
      const temp = (key: string, label: string, c: number, fahr: number): DerivedSpec => ({
        key,
        label,
        value: c,
        unit: 'C',
        display: `${c} °C (${fahr} °F)`,
        source: f.source,
      });
      return [
        temp('dryBoilingMinC', 'Dry boiling point, min', f.dryBoilingMinC, f.dryBoilingMinF),
        temp('wetBoilingMinC', 'Wet boiling point, min', f.wetBoilingMinC, f.wetBoilingMinF),
        { key: 'colour', label: 'Colour', value: f.colour, unit: null, display: f.colour, source: f.source },
        { key: 'base', label: 'Base', value: f.base, unit: null, display: f.base, source: f.source },
      ];
    }
    default:
      return [];
  }
}
