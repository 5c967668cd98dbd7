import { describe, expect, it } from 'vitest';
import { derivedSpecs, isHydraulicRubber, partCategories, safetyClassFor, specSchemas, validateSpecs } from './part-specs';

const byKey = (d: ReturnType<typeof derivedSpecs>) => Object.fromEntries(d.map((x) => [x.key, x]));

describe('validateSpecs', () => {
  it('when brake line specs use fractions, then they parse to numbers', () => {
    expect(validateSpecs('brake_line', { tubeOdIn: '3/16', lengthIn: '30-1/2', flare: 'double_inverted' })).toEqual({
      ok: true,
      value: { tubeOdIn: 0.1875, lengthIn: 30.5, flare: 'double_inverted' },
    });
  });

  it('when a brake line is single flared, then the flare field is rejected', () => {
    const r = validateSpecs('brake_line', { tubeOdIn: 0.1875, lengthIn: 30, flare: 'single' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.path)).toEqual(['flare']);
  });

  it('when a fastener thread is typed loosely, then it is stored as the normalised designation', () => {
    const r = validateSpecs('fastener', { thread: '3/8-24', lengthIn: 1, grade: 'SAE 5' });
    expect(r.ok && r.value.thread).toBe('3/8-24 UNF');
  });

  it('when a field is wrong, unknown or missing, then each error names its field', () => {
    const r = validateSpecs('fastener', { thread: '3/8-24 UNC', extra: 1 });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const paths = r.errors.map((e) => e.path);
    expect(paths).toContain('thread');
    expect(paths).toContain('lengthIn');
    expect(r.errors.find((e) => e.path === 'thread')!.message).toMatch(/16 threads per inch/);
    expect(r.errors.some((e) => /extra/.test(e.message))).toBe(true);
  });

  it('when a woodruff key or cotter pin size is not a real one, then it is rejected', () => {
    expect(validateSpecs('woodruff_key', { keyNumber: '12' }).ok).toBe(false);
    expect(validateSpecs('woodruff_key', { keyNumber: 606 })).toEqual({ ok: true, value: { keyNumber: '606' } });
    expect(validateSpecs('cotter_pin', { nominal: '1/2', lengthIn: 1 }).ok).toBe(false);
    expect(validateSpecs('cotter_pin', { nominal: 0.125, lengthIn: '3/4' })).toEqual({ ok: true, value: { nominal: '1/8', lengthIn: 0.75 } });
  });

  it('when a washer is smaller outside than inside, or a clamp range is inverted, then the refinement fails on the right field', () => {
    const w = validateSpecs('sealing_washer', { insideDiaIn: '3/8', outsideDiaIn: '1/4', material: 'copper' });
    expect(!w.ok && w.errors[0].path).toBe('outsideDiaIn');
    const c = validateSpecs('clamp', { type: 'worm_drive', minDiaIn: 2, maxDiaIn: 1 });
    expect(!c.ok && c.errors[0].path).toBe('maxDiaIn');
  });

  it('when a hose has two described ends, then it is valid; one end is not', () => {
    expect(validateSpecs('brake_hose', { lengthIn: 12, ends: ['female 3/8-24', 'banjo'] }).ok).toBe(true);
    expect(validateSpecs('hose', { lengthIn: 12, ends: ['x'] }).ok).toBe(false);
  });

  it('when a category has no schema of its own, then free-form short fields are accepted and nested objects are not', () => {
    expect(validateSpecs('bracket', { finish: 'olive drab', holes: 4, painted: true }).ok).toBe(true);
    expect(validateSpecs('generic', {}).ok).toBe(true);
    expect(validateSpecs('bracket', { nested: { a: 1 } }).ok).toBe(false);
  });

  it('when the category is unknown, then the error is on the category', () => {
    expect(validateSpecs('flux_capacitor', {})).toEqual({
      ok: false,
      errors: [{ path: 'category', message: 'Unknown part category "flux_capacitor".' }],
    });
  });

  it('when a lamp voltage is not a vehicle system voltage, then it is rejected', () => {
    expect(validateSpecs('lamp', { volts: 24, watts: 21 }).ok).toBe(true);
    expect(validateSpecs('lamp', { volts: 13 }).ok).toBe(false);
  });

  it('when every schema key is listed, then each is a known category', () => {
    for (const k of Object.keys(specSchemas)) expect(partCategories as readonly string[]).toContain(k);
  });
});

describe('derivedSpecs', () => {
  it('when a woodruff key is in the table, then width, diameter, heights, depths and length come with the standard', () => {
    const d = byKey(derivedSpecs('woodruff_key', { keyNumber: '505' }));
    expect(d.widthIn.display).toBe('5/32 in');
    expect(d.diameterIn.display).toBe('5/8 in');
    expect(d.lengthFIn.note).toBe('from memory');
    expect(d.widthIn.source).toMatch(/ASME B17\.2/);
  });

  it('when a woodruff key is valid but not a table row, then only width and diameter are derived', () => {
    expect(derivedSpecs('woodruff_key', { keyNumber: '1212' }).map((x) => x.key)).toEqual(['widthIn', 'diameterIn']);
  });

  it('when a brake line has a partly confirmed tube size, then the flare nut thread carries that note', () => {
    const d = byKey(derivedSpecs('brake_line', { tubeOdIn: '3/8', lengthIn: 20, flare: 'double_inverted' }));
    expect(d.flareNutThread.value).toBe('5/8-18');
    expect(d.flareNutThread.note).toMatch(/partly confirmed/);
    expect(d.flareAngleDeg.value).toBe(45);
  });

  it('when a brake line tube size has no table row, then only the flare facts are derived', () => {
    const d = derivedSpecs('brake_line', { tubeOdIn: '1/2', lengthIn: 20, flare: 'double_inverted' });
    expect(d.map((x) => x.key)).toEqual(['flareAngleDeg', 'flare']);
  });

  it('when a fastener has a numbered thread, then the pitch diameter is marked from memory', () => {
    const d = byKey(derivedSpecs('fastener', { thread: '#10-32', lengthIn: 0.5 }));
    expect(d.threadBasicPitchDiameterIn.note).toMatch(/from memory/);
  });

  it('when specs are invalid or the category has no table, then nothing is derived', () => {
    expect(derivedSpecs('woodruff_key', { keyNumber: 'x' })).toEqual([]);
    expect(derivedSpecs('bracket', { holes: 2 })).toEqual([]);
  });
});

describe('safety classes and hydraulic rubber', () => {
  it('when a category is a brake, steering or suspension part, then it gets that class; others none', () => {
    expect(safetyClassFor('wheel_cylinder')).toBe('brake');
    expect(safetyClassFor('brake_fluid')).toBe('brake');
    expect(safetyClassFor('tie_rod_end')).toBe('steering');
    expect(safetyClassFor('leaf_spring')).toBe('suspension');
    expect(safetyClassFor('lamp')).toBe('none');
    expect(safetyClassFor('not_a_category')).toBe('none');
  });

  it('when a category is hydraulic brake rubber or holds it, then isHydraulicRubber is true; steel line and shoes are not', () => {
    for (const c of ['brake_hose', 'wheel_cylinder_cup', 'brake_boot', 'master_cylinder_kit', 'wheel_cylinder']) expect(isHydraulicRubber(c), c).toBe(true);
    for (const c of ['brake_line', 'brake_shoe', 'hose', 'seal']) expect(isHydraulicRubber(c), c).toBe(false);
  });

  it('when every hydraulic rubber category is checked, then it is also a brake category', () => {
    for (const c of partCategories) if (isHydraulicRubber(c)) expect(safetyClassFor(c), c).toBe('brake');
  });

  it('when the list is read, then it has the required categories and no repeats', () => {
    for (const c of ['brake_hose', 'wheel_cylinder', 'master_cylinder', 'brake_shoe', 'brake_line', 'clamp', 'clip', 'fastener', 'washer', 'sealing_washer', 'woodruff_key', 'cotter_pin', 'seal', 'gasket', 'bearing', 'spring', 'bracket', 'pedal', 'linkage', 'lamp', 'switch', 'housing', 'shaft', 'gear', 'filter', 'weapon_mount', 'generic'])
      expect(partCategories as readonly string[], c).toContain(c);
    expect(new Set(partCategories).size).toBe(partCategories.length);
  });
});
