import { z } from 'zod';
import { interchanges, partNumberKinds, safetyClasses } from '@shared/schemas/catalog';

// The parts of the catalog replies the editor uses (server/services/catalog.ts and catalog-admin.ts).

const partSummary = z.object({ id: z.string(), name: z.string(), category: z.string(), primaryNumber: z.string().nullable() });
export type AdminPartSummary = z.infer<typeof partSummary>;

export const resolveReply = z.object({
  query: z.string(),
  matches: z.array(z.object({ partId: z.string(), number: z.string(), matchedBy: z.string(), depth: z.number() })),
  parts: z.array(partSummary),
});
export type ResolveReply = z.infer<typeof resolveReply>;

export const partRecordReply = z.object({
  part: z.object({
    id: z.string(),
    name: z.string(),
    description: z.string(),
    category: z.string(),
    specs: z.record(z.string(), z.unknown()),
    weightGrams: z.number(),
    lengthMm: z.number(),
    widthMm: z.number(),
    heightMm: z.number(),
    safetyClass: z.enum(safetyClasses),
    restricted: z.boolean(),
  }),
  numbers: z.array(z.object({ kind: z.enum(partNumberKinds), numbers: z.array(z.object({ id: z.string(), printed: z.string() })) })),
  chain: z.object({
    parts: z.array(partSummary),
    edges: z.array(
      z.object({
        id: z.string().optional(),
        fromPartId: z.string(),
        toPartId: z.string(),
        interchange: z.enum(interchanges),
        note: z.string().nullable().optional(),
        quantity: z.number(),
      }),
    ),
  }),
});
export type PartRecord = z.infer<typeof partRecordReply>;

export const createdPartReply = z.object({ part: z.object({ id: z.string(), name: z.string() }) });

export const vehiclesReply = z.object({ vehicles: z.array(z.object({ id: z.string(), slug: z.string(), name: z.string() })) });

export type AssemblyTreeNode = { id: string; code: string; name: string; lineCount: number; children: AssemblyTreeNode[] };
const treeNode: z.ZodType<AssemblyTreeNode> = z.lazy(() =>
  z.object({ id: z.string(), code: z.string(), name: z.string(), lineCount: z.number(), children: z.array(treeNode) }),
);
export const vehicleTreeReply = z.object({
  vehicle: z.object({ slug: z.string(), name: z.string() }),
  systems: z.array(z.object({ slug: z.string(), name: z.string(), assemblies: z.array(treeNode) })),
});
export type VehicleTree = z.infer<typeof vehicleTreeReply>;

const applicability = z.object({
  serialFrom: z.number().nullable(),
  serialTo: z.number().nullable(),
  builtFrom: z.string().nullable(),
  builtTo: z.string().nullable(),
  variants: z.array(z.string()).nullable(),
});
export const assemblyRecordReply = z.object({
  assembly: z.object({ id: z.string(), code: z.string(), name: z.string(), description: z.string() }),
  vehicle: z.object({ slug: z.string(), name: z.string() }),
  system: z.object({ slug: z.string(), name: z.string() }),
  parent: z.object({ id: z.string(), code: z.string(), name: z.string() }).nullable(),
  lines: z.array(z.object({ id: z.string(), callout: z.string(), quantity: z.number(), notes: z.string().nullable(), part: partSummary, applicability })),
});
export type AssemblyRecord = z.infer<typeof assemblyRecordReply>;
export type AssemblyLine = AssemblyRecord['lines'][number];

export const createdAssemblyReply = z.object({ assembly: z.object({ id: z.string() }) });

export const dataQualityReply = z.object({
  loops: z.array(z.object({ partIds: z.array(z.string()), numbers: z.array(z.string()), message: z.string() })),
  numbersOnSeveralParts: z.array(z.object({ key: z.string(), printed: z.string(), partIds: z.array(z.string()) })),
  partsInNoAssembly: z.object({ count: z.number(), sample: z.array(z.object({ id: z.string(), name: z.string(), primaryNumber: z.string().nullable() })) }),
  overlappingLines: z.array(z.object({ assemblyId: z.string(), callout: z.string(), lineIds: z.array(z.string()), message: z.string() })),
});
export type DataQuality = z.infer<typeof dataQualityReply>;
