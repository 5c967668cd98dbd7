import { z } from 'zod';
import { interchanges, partNumberKinds, safetyClasses } from '@shared/schemas/catalog';

// Shapes of the catalog API's replies (server/services/catalog.ts). Objects are not strict, so a field the
// server adds later does not break the page; a field we rely on that goes missing fails loudly.

export const vehicleSchema = z.object({
  id: z.string(),
  slug: z.string(),
  maker: z.string(),
  model: z.string(),
  name: z.string(),
  yearFrom: z.number(),
  yearTo: z.number(),
  serialPrefix: z.string(),
  serialFrom: z.number(),
  serialTo: z.number(),
  description: z.string(),
});
export type Vehicle = z.infer<typeof vehicleSchema>;

export const vehicleListReply = z.object({ vehicles: z.array(vehicleSchema.extend({ assemblyCount: z.number() })) });
export type VehicleSummary = z.infer<typeof vehicleListReply>['vehicles'][number];

export type AssemblyNode = { id: string; code: string; name: string; lineCount: number; hasDiagram: boolean; children: AssemblyNode[] };
const assemblyNodeSchema: z.ZodType<AssemblyNode> = z.lazy(() =>
  z.object({ id: z.string(), code: z.string(), name: z.string(), lineCount: z.number(), hasDiagram: z.boolean(), children: z.array(assemblyNodeSchema) }),
);

export const vehicleReply = z.object({
  vehicle: vehicleSchema,
  variants: z.array(z.object({ code: z.string(), name: z.string(), description: z.string() })),
  systems: z.array(z.object({ slug: z.string(), name: z.string(), assemblies: z.array(assemblyNodeSchema) })),
});
export type VehicleDetail = z.infer<typeof vehicleReply>;

export const partSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  category: z.string(),
  safetyClass: z.enum(safetyClasses),
  primaryNumber: z.string().nullable(),
});
export type PartSummary = z.infer<typeof partSummarySchema>;

export const cautionSchema = z.object({ code: z.string(), text: z.string() });
export type Caution = z.infer<typeof cautionSchema>;

export const applicabilitySchema = z.object({
  serialFrom: z.number().nullable(),
  serialTo: z.number().nullable(),
  builtFrom: z.string().nullable(),
  builtTo: z.string().nullable(),
  variants: z.array(z.string()).nullable(),
});
export type Applicability = z.infer<typeof applicabilitySchema>;

const lineSchema = z.object({
  id: z.string(),
  callout: z.string(),
  quantity: z.number(),
  notes: z.string().nullable(),
  part: partSummarySchema,
  applicability: applicabilitySchema,
});

const assemblyRef = z.object({ id: z.string(), code: z.string(), name: z.string() });

export const assemblyReply = z.object({
  assembly: z.object({ id: z.string(), code: z.string(), name: z.string(), description: z.string(), diagramSvg: z.string().nullable() }),
  vehicle: vehicleSchema,
  system: z.object({ slug: z.string(), name: z.string() }),
  parent: assemblyRef.nullable(),
  children: z.array(assemblyRef),
  callouts: z.array(z.object({ callout: z.string(), x: z.number(), y: z.number() })),
  filter: z.object({ serial: z.number().nullable(), buildDate: z.string().nullable(), variant: z.string().nullable() }).nullable(),
  lines: z.array(lineSchema.extend({ uncertain: z.array(z.string()).nullable() })),
  excluded: z.array(z.object({ line: lineSchema, reasons: z.array(z.string()) })),
  cautions: z.array(cautionSchema),
});
export type AssemblyDetail = z.infer<typeof assemblyReply>;
export type BomLine = AssemblyDetail['lines'][number];
export type Callout = AssemblyDetail['callouts'][number];

const edgeSchema = z.object({
  id: z.string().optional(),
  fromPartId: z.string(),
  toPartId: z.string(),
  interchange: z.enum(interchanges),
  note: z.string().nullable().optional(),
  quantity: z.number(),
});
export type ChainEdge = z.infer<typeof edgeSchema>;

export const chainSchema = z.object({
  parts: z.array(partSummarySchema),
  edges: z.array(edgeSchema),
  current: z.array(z.string()),
  fillers: z.array(z.string()),
  problems: z.array(z.object({ kind: z.string(), message: z.string(), partIds: z.array(z.string()) })),
});
export type SupersessionChain = z.infer<typeof chainSchema>;

export const partReply = z.object({
  part: z.object({
    id: z.string(),
    name: z.string(),
    description: z.string(),
    category: z.string(),
    specs: z.record(z.string(), z.unknown()),
    derivedSpecs: z.array(
      z.object({
        key: z.string(),
        label: z.string(),
        value: z.union([z.number(), z.string()]),
        unit: z.string().nullable(),
        display: z.string(),
        source: z.string(),
        note: z.string().optional(),
      }),
    ),
    weightGrams: z.number(),
    lengthMm: z.number(),
    widthMm: z.number(),
    heightMm: z.number(),
    safetyClass: z.enum(safetyClasses),
    restricted: z.boolean(),
  }),
  numbers: z.array(
    z.object({
      kind: z.enum(partNumberKinds),
      numbers: z.array(
        z.object({
          id: z.string(),
          printed: z.string(),
          key: z.string(),
          nsn: z.object({ fsc: z.string(), supplyClass: z.string().nullable(), country: z.string().nullable() }).optional(),
        }),
      ),
    }),
  ),
  usedIn: z.array(
    z.object({
      assemblyId: z.string(),
      code: z.string(),
      name: z.string(),
      callout: z.string(),
      quantity: z.number(),
      vehicleSlug: z.string(),
      vehicleName: z.string(),
    }),
  ),
  chain: chainSchema,
  cautions: z.array(cautionSchema),
  liveListings: z.number(),
});
export type PartDetail = z.infer<typeof partReply>;
