// Fictional demo data for component tests: invented maker, model and numbers.
import type { AssemblyDetail, PartDetail, PartSummary, Vehicle } from '../api/catalog-schemas';

export const ASSEMBLY_ID = '00000000-0000-4000-8000-0000000000a1';
export const PART_EARLY = '00000000-0000-4000-8000-0000000000b1';
export const PART_LATE = '00000000-0000-4000-8000-0000000000b2';
export const PART_CAP = '00000000-0000-4000-8000-0000000000b3';
export const PART_SCREW = '00000000-0000-4000-8000-0000000000b4';
export const PART_NEWER = '00000000-0000-4000-8000-0000000000b5';

export const vehicle: Vehicle = {
  id: '00000000-0000-4000-8000-0000000000c1',
  slug: 'fictional-fv-1',
  maker: 'Fictional Vehicle Works',
  model: 'FV-1',
  name: 'Fictional FV-1 utility truck',
  yearFrom: 1951,
  yearTo: 1956,
  serialPrefix: '',
  serialFrom: 1001,
  serialTo: 9999,
  description: 'A fictional light truck for tests.',
};

const summary = (id: string, name: string, primaryNumber: string, safetyClass: PartSummary['safetyClass'] = 'none'): PartSummary => ({
  id,
  name,
  category: 'generic',
  safetyClass,
  primaryNumber,
});

export const early = summary(PART_EARLY, 'Master cylinder, early', 'FV-20417', 'brake');
export const late = summary(PART_LATE, 'Master cylinder, late', 'FV-26602', 'brake');
export const cap = summary(PART_CAP, 'Cap, filler, vented', 'FV-21036');
export const screw = summary(PART_SCREW, 'Screw, cap, hexagon head', 'FV-10647');

const bubble = (c: string, x: number, y: number) =>
  `<g data-callout="${c}"><line x1="${x}" y1="${y}" x2="${x + 30}" y2="${y + 30}" stroke="#1f2933"/><circle cx="${x}" cy="${y}" r="13" fill="#fff" stroke="#1f2933"/><text x="${x}" y="${y + 4}">${c}</text></g>`;

export const diagramSvg =
  '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 800 600" width="800" height="600"><title>Master cylinder</title>' +
  '<rect x="0" y="0" width="800" height="600" fill="#fff"/><script>window.__hacked = true</script>' +
  `<g>${bubble('1', 100, 100)}${bubble('2', 300, 120)}${bubble('10', 500, 300)}</g></svg>`;

const none = { serialFrom: null, serialTo: null, builtFrom: null, builtTo: null, variants: null };

export function assemblyReply(overrides: Partial<AssemblyDetail> = {}): AssemblyDetail {
  return {
    assembly: { id: ASSEMBLY_ID, code: '06-02', name: 'Master cylinder', description: 'Fictional single-circuit master cylinder.', diagramSvg },
    vehicle,
    system: { slug: 'brakes', name: 'Brakes' },
    parent: null,
    children: [],
    callouts: [
      { callout: '1', x: 100, y: 100 },
      { callout: '2', x: 300, y: 120 },
      { callout: '10', x: 500, y: 300 },
    ],
    filter: null,
    lines: [
      { id: 'l1', callout: '1', quantity: 1, notes: null, part: early, applicability: { ...none, serialTo: 4999 }, uncertain: null },
      { id: 'l2', callout: '1', quantity: 1, notes: null, part: late, applicability: { ...none, serialFrom: 5000 }, uncertain: null },
      { id: 'l3', callout: '2', quantity: 1, notes: 'Vented type only', part: cap, applicability: none, uncertain: null },
      { id: 'l4', callout: '10', quantity: 2, notes: 'Cylinder to frame bracket', part: screw, applicability: none, uncertain: null },
    ],
    excluded: [],
    cautions: [{ code: 'brake_safety', text: 'Brakes stop the vehicle.' }],
    ...overrides,
  };
}

export function partReply(overrides: Partial<PartDetail> = {}): PartDetail {
  return {
    part: {
      id: PART_EARLY,
      name: 'Master cylinder, early',
      description: 'Fictional early master cylinder.',
      category: 'master_cylinder',
      specs: { boreIn: 1, circuits: 1 },
      derivedSpecs: [],
      weightGrams: 2300,
      lengthMm: 230,
      widthMm: 110,
      heightMm: 120,
      safetyClass: 'brake',
      restricted: false,
    },
    numbers: [
      { kind: 'maker', numbers: [{ id: 'n1', printed: 'FV-20417', key: 'FV20417' }] },
      { kind: 'nsn', numbers: [{ id: 'n2', printed: '2530-00-252-5858', key: '2530002525858', nsn: { fsc: '2530', supplyClass: 'Vehicular brake, steering, axle, wheel and track components', country: null } }] },
    ],
    usedIn: [{ assemblyId: ASSEMBLY_ID, code: '06-02', name: 'Master cylinder', callout: '1', quantity: 1, vehicleSlug: vehicle.slug, vehicleName: vehicle.name }],
    chain: {
      parts: [early, late, summary(PART_NEWER, 'Master cylinder, revised', 'FV-26602A', 'brake')],
      edges: [
        { id: 'e1', fromPartId: PART_EARLY, toPartId: PART_LATE, interchange: 'two_way', note: null, quantity: 1 },
        { id: 'e2', fromPartId: PART_LATE, toPartId: PART_NEWER, interchange: 'one_way', note: null, quantity: 1 },
      ],
      current: [PART_NEWER],
      fillers: [PART_EARLY, PART_LATE, PART_NEWER],
      problems: [],
    },
    cautions: [
      { code: 'brake_safety', text: 'Brakes stop the vehicle: a mistake here can injure or kill.' },
      { code: 'qualified_inspection', text: 'Have a qualified mechanic inspect the work.' },
    ],
    liveListings: 3,
    ...overrides,
  };
}
