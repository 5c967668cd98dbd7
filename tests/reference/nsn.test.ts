// Checks against /work/shared/REFERENCES.md, "National Stock Numbers — NATO Codification System".
// The stock numbers are invented; the structure, NCB codes and class names are the reference values.
import { describe, expect, it } from 'vitest';
import { parseNsn } from '../../server/domain/nsn';
import { supplyClassName } from '../../server/domain/standards/supply-classes';

const parsed = (s: string) => {
  const r = parseNsn(s);
  if (!r.ok) throw r.error;
  return r.value;
};

describe('NSN structure against the NATO Codification System', () => {
  it('when an NSN is split, then FSC is 4 digits, NIIN 9, NCB the first two NIIN digits (source: NATO Codification System)', () => {
    // source: NATO Codification System via REFERENCES.md — NSN = FSC (4) + NIIN (9); NIIN = NCB (2) + 7 digits.
    const n = parsed('5315-00-123-4567');
    expect(n.fsc).toHaveLength(4);
    expect(n.niin).toHaveLength(9);
    expect(n.ncb).toBe(n.niin.slice(0, 2));
    expect(n.formatted).toBe('5315-00-123-4567');
  });

  it('when the group is read, then it is the first two FSC digits: 25 vehicular, 53 hardware (source: NATO Codification System)', () => {
    // source: REFERENCES.md — "First two FSC digits are the group (25 vehicular components, 53 hardware)".
    expect(parsed('2530-00-123-4567').fsg).toBe('25');
    expect(parsed('5306-00-123-4567').fsg).toBe('53');
  });

  // source: NATO codification publications via REFERENCES.md — NCB codes.
  it.each([
    ['00', 'United States'],
    ['01', 'United States'],
    ['20', 'Canada'],
    ['21', 'Canada'],
    ['99', 'United Kingdom'],
    ['12', 'Germany'],
    ['14', 'France'],
    ['15', 'Italy'],
    ['13', 'Belgium'],
    ['22', 'Denmark'],
    ['66', 'Australia'],
    ['30', 'Japan'],
  ])('when the NCB code is %s, then the country is %s (source: NATO codification publications)', (ncb, country) => {
    expect(parsed(`2530${ncb}1234567`).country).toBe(country);
  });
});

describe('Federal Supply Classes against the H2 handbook names', () => {
  // source: Federal Supply Classification, H2 handbook names, via REFERENCES.md (5315 confirmed on a
  // GSA-derived page; the rest consistent across public sources).
  it.each([
    ['2510', 'Vehicular Cab, Body, and Frame Structural Components'],
    ['2520', 'Vehicular Power Transmission Components'],
    ['2530', 'Vehicular Brake, Steering, Axle, Wheel, and Track Components'],
    ['2540', 'Vehicular Furniture and Accessories'],
    ['2590', 'Miscellaneous Vehicular Components'],
    ['2805', 'Gasoline Reciprocating Engines, Except Aircraft; and Components'],
    ['2910', 'Engine Fuel System Components, Nonaircraft'],
    ['2920', 'Engine Electrical System Components, Nonaircraft'],
    ['2930', 'Engine Cooling System Components, Nonaircraft'],
    ['4720', 'Hose and Tubing, Flexible'],
    ['4730', 'Hose, Pipe, Tube, Lubrication, and Railing Fittings'],
    ['5305', 'Screws'],
    ['5306', 'Bolts'],
    ['5310', 'Nuts and Washers'],
    ['5315', 'Nails, Machine Keys, and Pins'], // source: H2 name confirmed on a GSA-derived page
    ['5330', 'Packing and Gasket Materials'],
    ['5340', 'Hardware, Commercial'],
    ['6220', 'Electric Vehicular Lights and Fixtures'],
  ])('when FSC %s is looked up, then its name is "%s" (source: Federal Supply Classification H2)', (fsc, name) => {
    expect(supplyClassName(fsc)).toBe(name);
    expect(parsed(`${fsc}-00-123-4567`).supplyClassName).toBe(name);
  });
});
