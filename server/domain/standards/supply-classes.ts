/**
 * Federal Supply Classes that a vintage military vehicle's parts fall in.
 * source: Federal Supply Classification, H2 handbook names, via REFERENCES.md (5315 confirmed on a
 * GSA-derived page, the rest consistent across public sources).
 */
export const SUPPLY_CLASS_SOURCE = 'Federal Supply Classification, H2 handbook names, via REFERENCES.md';

export const supplyClasses: Readonly<Record<string, string>> = {
  '2510': 'Vehicular Cab, Body, and Frame Structural Components',
  '2520': 'Vehicular Power Transmission Components',
  '2530': 'Vehicular Brake, Steering, Axle, Wheel, and Track Components',
  '2540': 'Vehicular Furniture and Accessories',
  '2590': 'Miscellaneous Vehicular Components',
  '2805': 'Gasoline Reciprocating Engines, Except Aircraft; and Components',
  '2910': 'Engine Fuel System Components, Nonaircraft',
  '2920': 'Engine Electrical System Components, Nonaircraft',
  '2930': 'Engine Cooling System Components, Nonaircraft',
  '4720': 'Hose and Tubing, Flexible',
  '4730': 'Hose, Pipe, Tube, Lubrication, and Railing Fittings',
  '5305': 'Screws',
  '5306': 'Bolts',
  '5310': 'Nuts and Washers',
  '5315': 'Nails, Machine Keys, and Pins',
  '5330': 'Packing and Gasket Materials',
  '5340': 'Hardware, Commercial',
  '6220': 'Electric Vehicular Lights and Fixtures',
};

/**
 * Federal Supply Groups (first two FSC digits). REFERENCES.md only says "25 vehicular components,
 * 53 hardware"; the full H2 group names below are from memory.
 */
export const supplyGroups: Readonly<Record<string, { name: string; confirmation: 'from_memory' }>> = {
  '25': { name: 'Vehicular Equipment Components', confirmation: 'from_memory' },
  '28': { name: 'Engines, Turbines, and Components', confirmation: 'from_memory' },
  '29': { name: 'Engine Accessories', confirmation: 'from_memory' },
  '47': { name: 'Pipe, Tubing, Hose, and Fittings', confirmation: 'from_memory' },
  '53': { name: 'Hardware and Abrasives', confirmation: 'from_memory' },
  '62': { name: 'Lighting Fixtures and Lamps', confirmation: 'from_memory' },
};

/** The H2 name of a 4-digit FSC, or null when it is not in our table. */
export function supplyClassName(fsc: string): string | null {
  return Object.hasOwn(supplyClasses, fsc) ? supplyClasses[fsc] : null;
}

/** The name of a 2-digit Federal Supply Group, or null (names from memory, see above). */
export function supplyGroupName(fsg: string): string | null {
  return Object.hasOwn(supplyGroups, fsg) ? supplyGroups[fsg].name : null;
}
