// Fictional demo data: invented makers, models and numbers.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { filterByApplicability } from '../../domain/applicability';
import { parseNsn } from '../../domain/nsn';
import { foldedKey, partNumberKeys } from '../../domain/part-number';
import { findLoops, resolve, type SupersessionEdge } from '../../domain/supersession';
import { cotterPinNominals } from '../../domain/standards/cotter-pins';
import { invertedFlareNutThread } from '../../domain/standards/flare-fittings';
import { parseThread } from '../../domain/standards/unified-threads';
import { woodruffTableKeys } from '../../domain/standards/woodruff-keys';
import { buildDemoCatalog, DELIBERATE_LOOP_PART_KEYS, DEMO_KEYS, FICTIONAL_NOTICE, type DemoBomLine, type DemoCatalog } from './catalog-data';
import { PART_CATEGORIES } from './catalog-types';

const catalog: DemoCatalog = buildDemoCatalog();
const partByKey = new Map(catalog.parts.map((p) => [p.key, p]));
const assemblyByKey = new Map(catalog.assemblies.map((a) => [a.key, a]));
const linesOf = (assemblyKey: string) => catalog.bomLines.filter((l) => l.assemblyKey === assemblyKey);
const partWithNumber = (printed: string) => catalog.parts.find((p) => p.numbers.some((n) => n.number === printed));
const out = new Map<string, typeof catalog.supersessions>();
const inc = new Map<string, typeof catalog.supersessions>();
for (const e of catalog.supersessions) {
  out.set(e.fromPartKey, [...(out.get(e.fromPartKey) ?? []), e]);
  inc.set(e.toPartKey, [...(inc.get(e.toPartKey) ?? []), e]);
}
const edges: SupersessionEdge[] = catalog.supersessions.map((e) => ({ fromPartId: e.fromPartKey, toPartId: e.toPartKey, interchange: e.interchange, note: e.note, quantity: e.quantity }));
const applicable = (lines: DemoBomLine[], facts: { serial?: number; buildDate?: string; variant?: string }) =>
  filterByApplicability(
    lines.map((l) => ({ ...l, applicability: { serialFrom: l.serialFrom, serialTo: l.serialTo, builtFrom: l.builtFrom, builtTo: l.builtTo, variants: l.variants } })),
    facts,
  ).included;

/** Steps along the single replacement of each part until a part has none (kits and loops end the walk). */
function chainLength(start: string): number {
  let steps = 0;
  const seen = new Set([start]);
  let at = start;
  for (;;) {
    const next = out.get(at) ?? [];
    if (next.length !== 1 || seen.has(next[0].toPartKey)) return steps;
    at = next[0].toPartKey;
    seen.add(at);
    steps += 1;
  }
}

describe('demo catalog: size and shape', () => {
  it('when the catalog is built, then it meets the minimum counts', () => {
    const numbers = catalog.parts.reduce((n, p) => n + p.numbers.length, 0);
    expect(catalog.vehicles.length).toBeGreaterThanOrEqual(2);
    expect(catalog.systems.length).toBeGreaterThanOrEqual(12);
    expect(catalog.assemblies.length).toBeGreaterThanOrEqual(60);
    expect(catalog.parts.length).toBeGreaterThanOrEqual(800);
    expect(numbers).toBeGreaterThanOrEqual(1500);
    expect(catalog.supersessions.length).toBeGreaterThanOrEqual(150);
  });

  it('when the systems are listed, then the trade systems are all there in order', () => {
    const slugs = catalog.systems.map((s) => s.slug);
    for (const s of ['engine', 'clutch', 'transmission', 'transfer-case', 'axles', 'brakes', 'steering', 'electrical', 'fuel', 'cooling', 'exhaust', 'frame', 'body', 'wheels-tires', 'accessories']) {
      expect(slugs).toContain(s);
    }
    const orders = catalog.systems.map((s) => s.sortOrder);
    expect([...orders].sort((a, b) => a - b)).toEqual(orders);
  });

  it('when keys are collected, then vehicle slugs, assembly keys and part keys are unique', () => {
    const unique = (xs: string[]) => new Set(xs).size === xs.length;
    expect(unique(catalog.vehicles.map((v) => v.slug))).toBe(true);
    expect(unique(catalog.assemblies.map((a) => a.key))).toBe(true);
    expect(unique(catalog.parts.map((p) => p.key))).toBe(true);
    for (const p of catalog.parts) expect(p.numbers.length, p.key).toBeGreaterThan(0);
  });

  it('when every printed number is folded (O->0, I->1, punctuation dropped), then no two numbers collide', () => {
    const seen = new Map<string, string>();
    for (const p of catalog.parts) {
      for (const n of p.numbers) {
        const k = foldedKey(n.number);
        expect(seen.get(k), `${n.number} on ${p.key}`).toBeUndefined();
        seen.set(k, p.key);
      }
    }
  });

  it('when references are followed, then every line, supersession and parent points at something that exists', () => {
    const vehicles = new Set(catalog.vehicles.map((v) => v.slug));
    const systems = new Set(catalog.systems.map((s) => s.slug));
    for (const a of catalog.assemblies) {
      expect(vehicles.has(a.vehicleSlug)).toBe(true);
      expect(systems.has(a.systemSlug)).toBe(true);
      if (a.parentKey !== null) {
        const parent = assemblyByKey.get(a.parentKey);
        expect(parent, a.key).toBeDefined();
        expect(parent?.vehicleSlug).toBe(a.vehicleSlug);
      }
    }
    expect(catalog.assemblies.some((a) => a.parentKey !== null)).toBe(true);
    for (const l of catalog.bomLines) {
      expect(assemblyByKey.has(l.assemblyKey), l.assemblyKey).toBe(true);
      expect(partByKey.has(l.partKey), l.partKey).toBe(true);
      expect(l.quantity).toBeGreaterThan(0);
    }
    for (const e of catalog.supersessions) {
      expect(partByKey.has(e.fromPartKey), e.fromPartKey).toBe(true);
      expect(partByKey.has(e.toPartKey), e.toPartKey).toBe(true);
      expect(e.quantity).toBeGreaterThan(0);
    }
  });

  it('when the file header and notice are read, then the data is marked as fictional', () => {
    expect(FICTIONAL_NOTICE).toMatch(/fictional/i);
    const source = readFileSync(new URL('./catalog-data.ts', import.meta.url), 'utf8');
    expect(source.split('\n')[0]).toContain('Fictional demo data: invented makers, models and numbers');
  });
});

describe('demo catalog: vehicles and effectivity', () => {
  it('when vehicles are read, then each has years, a prefixed serial range and variants', () => {
    for (const v of catalog.vehicles) {
      expect(v.yearTo).toBeGreaterThanOrEqual(v.yearFrom);
      expect(v.serialTo).toBeGreaterThan(v.serialFrom);
      expect(v.serialPrefix.length).toBeGreaterThan(0);
      expect(v.variants.length).toBeGreaterThanOrEqual(2);
    }
  });

  it('when a line names variants, dates or serials, then they belong to its vehicle', () => {
    for (const l of catalog.bomLines) {
      const a = assemblyByKey.get(l.assemblyKey)!;
      const v = catalog.vehicles.find((x) => x.slug === a.vehicleSlug)!;
      for (const code of l.variants ?? []) expect(v.variants.map((x) => x.code)).toContain(code);
      for (const s of [l.serialFrom, l.serialTo]) if (s !== null) expect(s >= v.serialFrom && s <= v.serialTo).toBe(true);
      for (const d of [l.builtFrom, l.builtTo]) {
        if (d === null) continue;
        expect(d).toMatch(/^\d{4}-\d{2}-\d{2}$/);
        expect(Number(d.slice(0, 4))).toBeGreaterThanOrEqual(v.yearFrom);
        expect(Number(d.slice(0, 4))).toBeLessThanOrEqual(v.yearTo);
      }
    }
  });

  it('when vehicle 1 is filtered by serial, then serial 4999 gets the early master cylinder and 5000 the late one', () => {
    const mc = linesOf(DEMO_KEYS.masterCylinderAssembly).filter((l) => l.callout === '1');
    expect(applicable(mc, { serial: DEMO_KEYS.lastEarlySerial }).map((l) => l.partKey)).toEqual([DEMO_KEYS.masterCylinderPart]);
    expect(applicable(mc, { serial: DEMO_KEYS.firstLateSerial }).map((l) => l.partKey)).toEqual([DEMO_KEYS.masterCylinderLatePart]);
  });

  it('when vehicle 1 is filtered by build date, then the early handed front hoses give way to the either-side hose', () => {
    const hoses = linesOf('kv4:brakes.front-lines').filter((l) => l.callout === '5');
    expect(applicable(hoses, { buildDate: '1952-05-01' }).map((l) => l.partKey).sort()).toEqual(['kv4.brakes.hose-front-left-early', 'kv4.brakes.hose-front-right-early']);
    expect(applicable(hoses, { buildDate: DEMO_KEYS.lateBuiltFrom }).map((l) => l.partKey)).toEqual([DEMO_KEYS.consolidationToPartKey]);
  });

  it('when the variant is not the winch one, then the winch assembly lists nothing', () => {
    const winch = linesOf(DEMO_KEYS.winchAssembly);
    expect(winch.length).toBeGreaterThan(3);
    expect(winch.every((l) => l.variants?.join() === DEMO_KEYS.winchVariant)).toBe(true);
    expect(applicable(winch, { variant: 'STD' })).toEqual([]);
    expect(applicable(winch, { variant: DEMO_KEYS.winchVariant }).length).toBe(winch.length);
  });

  it('when the long-wheelbase variant is chosen, then the rear lines use the longer frame line', () => {
    const frameLine = linesOf(DEMO_KEYS.rearLinesAssembly).filter((l) => l.callout === '1');
    const std = applicable(frameLine, { variant: 'STD' });
    const lwb = applicable(frameLine, { variant: DEMO_KEYS.longWheelbaseVariant });
    expect(std).toHaveLength(1);
    expect(lwb).toHaveLength(1);
    expect((partByKey.get(lwb[0].partKey)!.specs.lengthIn as number) > (partByKey.get(std[0].partKey)!.specs.lengthIn as number)).toBe(true);
  });

  it('when early/late splits are counted, then both serial and build-date splits occur across the catalog', () => {
    expect(catalog.bomLines.filter((l) => l.serialTo !== null).length).toBeGreaterThan(10);
    expect(catalog.bomLines.filter((l) => l.builtFrom !== null).length).toBeGreaterThan(5);
  });
});

describe('demo catalog: brake diagrams', () => {
  const brakeAssemblies = catalog.assemblies.filter((a) => a.systemSlug === 'brakes');

  it('when each vehicle is checked, then it has the brake assemblies restorers work through', () => {
    for (const v of catalog.vehicles) {
      const names = brakeAssemblies.filter((a) => a.vehicleSlug === v.slug).map((a) => a.name.toLowerCase());
      for (const word of ['pedal', 'master cylinder', 'front brake lines', 'rear brake lines', 'wheel cylinder', 'parking brake']) {
        expect(names.some((n) => n.includes(word)), `${v.slug}: ${word}`).toBe(true);
      }
    }
  });

  it('when a brake assembly is drawn, then its data-callout bubbles, its callouts and its lines agree', () => {
    expect(brakeAssemblies.length).toBeGreaterThanOrEqual(12);
    for (const a of brakeAssemblies) {
      expect(a.diagramSvg, a.key).not.toBeNull();
      const svg = a.diagramSvg!;
      const inSvg = [...svg.matchAll(/data-callout="([^"]+)"/g)].map((m) => m[1]);
      const listed = a.callouts.map((c) => c.callout);
      const onLines = new Set(linesOf(a.key).map((l) => l.callout));
      expect(new Set(inSvg).size, a.key).toBe(inSvg.length);
      expect([...inSvg].sort(), a.key).toEqual([...listed].sort());
      expect(new Set(listed), a.key).toEqual(onLines);
      for (const c of a.callouts) {
        const group = new RegExp(`<g data-callout="${c.callout}">.*?<circle cx="([\\d.]+)" cy="([\\d.]+)"`).exec(svg);
        expect(group, `${a.key} #${c.callout}`).not.toBeNull();
        expect([Number(group![1]), Number(group![2])]).toEqual([c.x, c.y]);
        expect(c.x > 0 && c.x < 800 && c.y > 0 && c.y < 600).toBe(true);
      }
    }
  });

  it('when the SVG markup is inspected, then it is clean: no scripts, handlers, links, external refs or odd fonts', () => {
    for (const a of catalog.assemblies) {
      if (a.diagramSvg === null) {
        expect(a.callouts).toEqual([]);
        continue;
      }
      const svg = a.diagramSvg;
      expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 800 600"')).toBe(true);
      expect(svg).not.toMatch(/<script|<foreignObject|<image|<use|<a\b|href=|\son\w+=|url\(|javascript:|<style|@import/i);
      const fonts = new Set([...svg.matchAll(/font-family="([^"]+)"/g)].map((m) => m[1]));
      expect([...fonts]).toEqual(['sans-serif']);
    }
  });
});

describe('demo catalog: numbers and standards', () => {
  const allNumbers = catalog.parts.flatMap((p) => p.numbers.map((n) => ({ ...n, part: p })));

  it('when NSNs are read, then each is 13 digits printed 4-2-3-4 in a known supply class with a US NCB code', () => {
    const nsns = allNumbers.filter((n) => n.kind === 'nsn');
    expect(nsns.length).toBeGreaterThan(300);
    for (const n of nsns) {
      // source: NATO Codification System, via REFERENCES.md
      expect(n.number).toMatch(/^\d{4}-\d{2}-\d{3}-\d{4}$/);
      const r = parseNsn(n.number);
      expect(r.ok).toBe(true);
      if (r.ok) {
        expect(r.value.warnings, n.number).toEqual([]);
        expect(['00', '01']).toContain(r.value.ncb);
      }
    }
  });

  it('when number kinds are counted, then every kind appears, and some numbers carry letter O or I', () => {
    const kinds = new Set(allNumbers.map((n) => n.kind));
    expect([...kinds].sort()).toEqual(['hardware_standard', 'maker', 'nsn', 'ordnance', 'reproduction', 'vendor']);
    const lookalikes = allNumbers.filter((n) => n.kind !== 'hardware_standard' && /[OI]/.test(n.number.replace(/^(OPR|QH|ST|KV|TRV|BBS|FRW|HT)\b/, '')));
    expect(lookalikes.length).toBeGreaterThanOrEqual(10);
    expect(foldedKey(DEMO_KEYS.lookalikeNumber)).toBe(foldedKey(DEMO_KEYS.lookalikeTypedAs));
    expect(partNumberKeys(DEMO_KEYS.lookalikeNumber).key).not.toBe(partNumberKeys(DEMO_KEYS.lookalikeTypedAs).key);
    expect(foldedKey(DEMO_KEYS.lookalikeINumber)).toBe(foldedKey(DEMO_KEYS.lookalikeITypedAs));
  });

  it('when Woodruff keys are read, then the number is the ASME B17.2 key number in the specs', () => {
    const keys = catalog.parts.filter((p) => p.category === 'woodruff_key');
    expect(keys.length).toBeGreaterThanOrEqual(5);
    for (const p of keys) {
      // source: ASME B17.2-1967, via REFERENCES.md
      expect(woodruffTableKeys).toContain(p.specs.keyNumber);
      // A maker's own number for a key (early parts lists) is replaced by the standard part.
      const standard = p.numbers.some((n) => n.kind === 'hardware_standard') ? p : partByKey.get(out.get(p.key)?.[0]?.toPartKey ?? '');
      expect(standard?.numbers.some((n) => n.kind === 'hardware_standard' && n.number === p.specs.keyNumber), p.key).toBe(true);
    }
  });

  it('when cotter pins are read, then their nominal sizes come from the ASME B18.8.1 list', () => {
    const pins = catalog.parts.filter((p) => p.category === 'cotter_pin');
    expect(pins.length).toBeGreaterThanOrEqual(8);
    // source: ASME B18.8.1, via REFERENCES.md
    for (const p of pins) {
      expect(cotterPinNominals as readonly unknown[]).toContain(p.specs.nominal);
      expect(typeof p.specs.lengthIn).toBe('number');
    }
  });

  it('when fasteners are read, then each names a unified thread that parses, and a length', () => {
    const fasteners = catalog.parts.filter((p) => p.category === 'fastener');
    expect(fasteners.length).toBeGreaterThan(30);
    for (const p of fasteners) {
      // source: ASME B1.1, via REFERENCES.md
      const r = parseThread(String(p.specs.thread));
      expect(r.ok, `${p.key}: ${String(p.specs.thread)}`).toBe(true);
      expect(typeof p.specs.lengthIn).toBe('number');
    }
    const threads = new Set(fasteners.map((p) => p.specs.thread));
    expect(threads.has('3/8-24 UNF')).toBe(true);
    expect(threads.has('5/16-18 UNC')).toBe(true);
  });

  it('when brake lines and hoses are read, then tubes are 3/16 or 1/4 double flared with the matching J512 nut thread', () => {
    const tubes = catalog.parts.filter((p) => p.category === 'brake_line');
    expect(tubes.length).toBeGreaterThanOrEqual(8);
    for (const p of tubes) {
      expect([0.1875, 0.25]).toContain(p.specs.tubeOdIn);
      expect(p.specs.flare).toBe('double_inverted');
      expect(typeof p.specs.lengthIn).toBe('number');
      // source: SAE J512, via REFERENCES.md (3/16 -> 3/8-24, 1/4 -> 7/16-24, both confirmed)
      expect(p.specs.nutThread).toBe(invertedFlareNutThread(p.specs.tubeOdIn as number)?.nutThread);
    }
    for (const p of catalog.parts.filter((x) => x.category === 'brake_hose')) {
      expect(['female-female', 'male-female']).toContain(p.specs.ends);
      expect(typeof p.specs.lengthIn).toBe('number');
    }
  });
});

describe('demo catalog: categories, safety, weights', () => {
  it('when categories are read, then each is one of the agreed strings and the scarce small hardware is plentiful', () => {
    for (const p of catalog.parts) expect(PART_CATEGORIES as readonly string[]).toContain(p.category);
    const count = (c: string) => catalog.parts.filter((p) => p.category === c).length;
    for (const c of ['clamp', 'clip', 'brake_fitting', 'brake_hose', 'brake_line', 'sealing_washer', 'boot', 'seal', 'spring']) expect(count(c), c).toBeGreaterThanOrEqual(4);
  });

  it('when safety classes are read, then brake, steering and suspension parts are marked', () => {
    const brakeLineParts = new Set(catalog.bomLines.filter((l) => assemblyByKey.get(l.assemblyKey)!.systemSlug === 'brakes').map((l) => l.partKey));
    for (const key of brakeLineParts) {
      if (key.startsWith('hw.')) continue; // shared standard hardware is not itself a brake part
      expect(partByKey.get(key)!.safetyClass, key).toBe('brake');
    }
    const classes = new Set(catalog.parts.map((p) => p.safetyClass));
    expect([...classes].sort()).toEqual(['brake', 'none', 'steering', 'suspension']);
  });

  it('when restricted parts are read, then 2 to 4 display mounts are restricted and nothing else is', () => {
    const restricted = catalog.parts.filter((p) => p.restricted === true);
    expect(restricted.length).toBeGreaterThanOrEqual(2);
    expect(restricted.length).toBeLessThanOrEqual(4);
    expect(restricted.every((p) => p.category === 'weapon_mount')).toBe(true);
    expect(catalog.parts.filter((p) => p.category === 'weapon_mount').every((p) => p.restricted === true)).toBe(true);
    expect(partByKey.get(DEMO_KEYS.restrictedPartKey)?.restricted).toBe(true);
  });

  it('when weights and sizes are read, then axle housings are heavy and large and clips are light', () => {
    for (const p of catalog.parts) {
      expect(p.weightGrams).toBeGreaterThan(0);
      expect(Math.min(p.lengthMm, p.widthMm, p.heightMm)).toBeGreaterThan(0);
    }
    const housings = catalog.parts.filter((p) => /^Housing, .*axle/.test(p.name));
    expect(housings.length).toBeGreaterThanOrEqual(4);
    for (const p of housings) {
      expect(p.weightGrams).toBeGreaterThanOrEqual(60_000);
      expect(p.lengthMm).toBeGreaterThan(1000);
    }
    for (const p of catalog.parts.filter((x) => x.category === 'clip')) expect(p.weightGrams, p.key).toBeLessThan(100);
    for (const p of catalog.parts.filter((x) => x.category === 'cotter_pin')) expect(p.weightGrams, p.key).toBeLessThan(50);
    expect(partByKey.get('kv4.brakes.hose-clip')!.weightGrams).toBeLessThanOrEqual(10);
  });
});

describe('demo catalog: supersessions', () => {
  it('when interchanges are read, then all three kinds occur and every conditional step carries its condition', () => {
    const kinds = new Set(catalog.supersessions.map((e) => e.interchange));
    expect([...kinds].sort()).toEqual(['conditional', 'one_way', 'two_way']);
    for (const e of catalog.supersessions.filter((x) => x.interchange === 'conditional')) expect(e.note?.length ?? 0).toBeGreaterThan(5);
  });

  it('when loops are searched, then exactly one exists and it is the deliberate A -> B -> C -> A', () => {
    const loops = findLoops(edges);
    expect(loops).toEqual([[...DELIBERATE_LOOP_PART_KEYS].sort()]);
  });

  it('when chains are walked, then at least three run four or more steps', () => {
    const starts = catalog.parts.map((p) => p.key).filter((k) => !inc.has(k) && out.has(k));
    const long = starts.filter((k) => chainLength(k) >= 4);
    expect(long.length).toBeGreaterThanOrEqual(3);
    expect(chainLength(DEMO_KEYS.chain4StartPartKey)).toBe(4);
    expect(partByKey.get(DEMO_KEYS.chain4EndPartKey)?.numbers.map((n) => n.number)).toContain(DEMO_KEYS.chain4CurrentNumber);
    expect(chainLength(DEMO_KEYS.chain4bStartPartKey)).toBeGreaterThanOrEqual(4);
  });

  it('when kits are read, then the early rear wheel cylinder is replaced by 2 cups, 2 boots and 1 spring', () => {
    const kit = out.get(DEMO_KEYS.kitFromPartKey) ?? [];
    const byCategory = kit.map((e) => `${partByKey.get(e.toPartKey)!.category}x${e.quantity}`).sort();
    expect(byCategory).toEqual(['bootx2', 'sealx2', 'springx1']);
    const kits = [...out.values()].filter((es) => es.length > 1);
    expect(kits.length).toBeGreaterThanOrEqual(3);
  });

  it('when consolidations are read, then several old numbers point at one part, the demo hoses among them', () => {
    const into = (inc.get(DEMO_KEYS.consolidationToPartKey) ?? []).map((e) => partByKey.get(e.fromPartKey)!.numbers[0].number).sort();
    expect(into).toEqual([...DEMO_KEYS.consolidationFromNumbers].sort());
    const consolidated = [...inc.entries()].filter(([, es]) => es.filter((e) => (out.get(e.fromPartKey) ?? []).length === 1).length >= 2);
    expect(consolidated.length).toBeGreaterThanOrEqual(5);
  });

  it('when a part has several replacements, then it is a kit (never two rival single replacements)', () => {
    for (const [from, es] of out) {
      if (es.length < 2) continue;
      expect(new Set(es.map((e) => e.toPartKey)).size, from).toBe(es.length);
    }
  });

  it('when the named demo numbers are checked, then each sits where DEMO_KEYS says', () => {
    const mc = partByKey.get(DEMO_KEYS.masterCylinderPart)!;
    expect(mc.category).toBe('master_cylinder');
    expect(mc.numbers.map((n) => n.number)).toContain(DEMO_KEYS.supersededNumber);
    expect(linesOf(DEMO_KEYS.masterCylinderAssembly).some((l) => l.partKey === mc.key)).toBe(true);
    const step = (out.get(mc.key) ?? [])[0];
    expect(partByKey.get(step.toPartKey)!.numbers.map((n) => n.number)).toContain(DEMO_KEYS.replacementNumber);
    const oneWay = out.get(partWithNumber(DEMO_KEYS.oneWayOldNumber)!.key)![0];
    expect(oneWay.interchange).toBe('one_way');
    expect(oneWay.toPartKey).toBe(partWithNumber(DEMO_KEYS.oneWayNewNumber)!.key);
    const cond = out.get(partWithNumber(DEMO_KEYS.conditionalOldNumber)!.key)![0];
    expect(cond.interchange).toBe('conditional');
    expect(cond.note).toBe(DEMO_KEYS.conditionalNote);
    expect(assemblyByKey.get(DEMO_KEYS.masterCylinderAssembly)?.vehicleSlug).toBe(DEMO_KEYS.vehicle1Slug);
  });

  it('when the resolver is asked for the superseded number, then the current number is the replacement', () => {
    const numbers = catalog.parts.flatMap((p) => p.numbers.map((n) => ({ partId: p.key, number: n.number, kind: n.kind, ...partNumberKeys(n.number) })));
    const r = resolve({ query: DEMO_KEYS.supersededNumber, numbers, edges });
    expect(r.current).toEqual([DEMO_KEYS.masterCylinderLatePart]);
    const typed = resolve({ query: DEMO_KEYS.lookalikeTypedAs, numbers, edges });
    expect(typed.matches.find((m) => m.partId === DEMO_KEYS.masterCylinderPart)?.matchedBy).toBe('alternate_number');
    const loop = resolve({ query: partByKey.get(DEMO_KEYS.loopPartKey)!.numbers[0].number, numbers, edges });
    expect(loop.problems.some((p) => p.kind === 'loop')).toBe(true);
  });
});

describe('demo catalog: determinism and speed', () => {
  it('when built twice, then both catalogs are deep-equal', () => {
    expect(buildDemoCatalog()).toEqual(catalog);
  });

  it('when built, then generation takes well under a second', () => {
    const t0 = performance.now();
    buildDemoCatalog();
    expect(performance.now() - t0).toBeLessThan(500);
  });
});
