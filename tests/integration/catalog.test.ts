import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { getDb } from '../../server/db/client';
import { auditLog } from '../../server/db/schema/index';
import { addLine, createPart, createVehicleWithAssembly, supersede } from '../factories/catalog';
import { ORIGIN, signedInAs } from '../factories/users';

const app = createApp();

describe('number resolution', () => {
  it('when a number is typed in any shape, then the same part is found exactly or through the O/0 fold', async () => {
    const p = await createPart({ numbers: [{ number: 'QX-4410-B7' }] });
    for (const shape of ['QX-4410-B7', 'qx 4410 b7', 'QX4410B7', 'qx/4410.b7', '  QX-4410-B7  ']) {
      const r = await request(app).get('/api/parts/resolve').query({ number: shape });
      expect(r.status).toBe(200);
      expect(r.body.matches).toContainEqual(expect.objectContaining({ partId: p.id, matchedBy: 'exact' }));
    }
    const folded = await request(app).get('/api/parts/resolve').query({ number: 'QX-44I0-B7' });
    expect(folded.body.matches).toContainEqual(expect.objectContaining({ partId: p.id, matchedBy: 'alternate_number' }));
  });

  it('when an old number is replaced one-way, then the new part fills the old need but the old never fills the new', async () => {
    const old = await createPart();
    const neu = await createPart();
    await supersede(old, neu, 'one_way');
    const a = await request(app).get('/api/parts/resolve').query({ number: old.number });
    expect(a.body.fillers).toEqual(expect.arrayContaining([old.id, neu.id]));
    expect(a.body.current).toEqual([neu.id]);
    expect(a.body.matches).toContainEqual(expect.objectContaining({ partId: neu.id, matchedBy: 'replaced_by', interchange: 'one_way' }));
    const b = await request(app).get('/api/parts/resolve').query({ number: neu.number });
    expect(b.body.fillers).toContain(neu.id);
    expect(b.body.fillers).not.toContain(old.id);
    expect(b.body.matches).toContainEqual(expect.objectContaining({ partId: old.id, matchedBy: 'replaces' }));
  });

  it('when the data holds a loop, then resolve ends and reports it as a problem', async () => {
    const a = await createPart();
    const b = await createPart();
    const c = await createPart();
    await supersede(a, b, 'one_way');
    await supersede(b, c, 'one_way');
    await supersede(c, a, 'one_way');
    const r = await request(app).get('/api/parts/resolve').query({ number: a.number });
    expect(r.status).toBe(200);
    expect(r.body.problems.some((p: { kind: string }) => p.kind === 'loop')).toBe(true);
  });

  it('when the number is empty or too long, then a 400 names the field', async () => {
    expect((await request(app).get('/api/parts/resolve').query({ number: '' })).status).toBe(400);
    const long = await request(app).get('/api/parts/resolve').query({ number: 'X'.repeat(100) });
    expect(long.status).toBe(400);
    expect(long.body.error.details.fieldErrors.number).toBeDefined();
    expect((await request(app).get('/api/parts/resolve').query({ number: '---' })).status).toBe(400);
  });
});

describe('vehicles, assemblies and applicability', () => {
  it('when the demo catalog is seeded, then vehicles list with their systems and assemblies', async () => {
    const r = await request(app).get('/api/vehicles');
    expect(r.status).toBe(200);
    expect(r.body.vehicles.length).toBeGreaterThanOrEqual(2);
    const v = await request(app).get(`/api/vehicles/${r.body.vehicles[0].slug}`);
    expect(v.status).toBe(200);
    expect(v.body.systems.length).toBeGreaterThan(5);
    expect((await request(app).get('/api/vehicles/no-such-truck')).status).toBe(404);
    expect((await request(app).get('/api/vehicles/BAD SLUG!')).status).toBe(400);
  });

  it('when a serial is given, then lines outside their serial range are excluded with the reason', async () => {
    const { assembly } = await createVehicleWithAssembly();
    const early = await createPart({ name: 'Early cylinder' });
    const late = await createPart({ name: 'Late cylinder' });
    await addLine(assembly.id, early.id, { callout: '1', serialTo: 4999 });
    await addLine(assembly.id, late.id, { callout: '1', serialFrom: 5000 });
    const all = await request(app).get(`/api/assemblies/${assembly.id}`);
    expect(all.body.lines).toHaveLength(2);
    const r = await request(app).get(`/api/assemblies/${assembly.id}`).query({ serial: 'TT-06210' });
    expect(r.status).toBe(200);
    expect(r.body.lines.map((l: { part: { id: string } }) => l.part.id)).toEqual([late.id]);
    expect(r.body.excluded).toHaveLength(1);
    expect(r.body.excluded[0].reasons[0]).toContain('6,210');
    expect((await request(app).get(`/api/assemblies/${assembly.id}`).query({ serial: 'none' })).status).toBe(400);
    expect((await request(app).get('/api/assemblies/not-a-uuid')).status).toBe(400);
  });

  it('when a brake part is opened, then its numbers, chain and safety cautions are there', async () => {
    const old = await createPart({ category: 'brake_hose', safetyClass: 'brake' });
    const neu = await createPart({ category: 'brake_hose', safetyClass: 'brake' });
    await supersede(old, neu, 'two_way');
    const r = await request(app).get(`/api/parts/${old.id}`);
    expect(r.status).toBe(200);
    expect(r.body.numbers[0].numbers[0].printed).toBe(old.number);
    expect(r.body.chain.edges).toHaveLength(1);
    expect(r.body.chain.current).toEqual([neu.id]);
    expect(r.body.cautions.map((c: { code: string }) => c.code)).toEqual(expect.arrayContaining(['brake_safety', 'rubber_ages', 'qualified_inspection']));
    expect(r.body.liveListings).toBeTypeOf('number');
  });
});

describe('admin catalog editing', () => {
  it('when a buyer or anonymous person edits the catalog, then 403 / 401 and nothing changes', async () => {
    const { agent } = await signedInAs(app, ['buyer']);
    const body = { name: 'Sneaky part', category: 'generic', numbers: [{ number: 'SNEAK-1', kind: 'maker' }] };
    expect((await agent.post('/api/admin/parts').set('Origin', ORIGIN).send(body)).status).toBe(403);
    expect((await request(app).post('/api/admin/parts').set('Origin', ORIGIN).send(body)).status).toBe(401);
    const { agent: seller } = await signedInAs(app, ['buyer', 'seller']);
    expect((await seller.get('/api/admin/data-quality')).status).toBe(403);
    expect((await request(app).get('/api/parts/resolve').query({ number: 'SNEAK-1' })).body.matches).toEqual([]);
  });

  it('when an administrator creates a part, a number and a supersession, then each change is audited with before and after', async () => {
    const { agent, user } = await signedInAs(app, ['buyer', 'admin']);
    const t = Date.now().toString(36).toUpperCase();
    const created = await agent
      .post('/api/admin/parts')
      .set('Origin', ORIGIN)
      .send({ name: 'Key, woodruff', category: 'woodruff_key', specs: { keyNumber: '606' }, numbers: [{ number: `WK-${t}`, kind: 'maker' }, { number: '5315-00-123-4567', kind: 'nsn' }] });
    expect(created.status).toBe(201);
    const id = created.body.part.id;
    const badSpecs = await agent.post('/api/admin/parts').set('Origin', ORIGIN).send({ name: 'Key', category: 'woodruff_key', specs: { keyNumber: 'banana' }, numbers: [{ number: `WK2-${t}`, kind: 'maker' }] });
    expect(badSpecs.status).toBe(400);
    const badNsn = await agent.post(`/api/admin/parts/${id}/numbers`).set('Origin', ORIGIN).send({ number: '5315-00-123', kind: 'nsn' });
    expect(badNsn.status).toBe(400);
    const num = await agent.post(`/api/admin/parts/${id}/numbers`).set('Origin', ORIGIN).send({ number: `WK-${t}-R`, kind: 'reproduction' });
    expect(num.status).toBe(201);
    const other = await createPart();
    const noNote = await agent.post('/api/admin/supersessions').set('Origin', ORIGIN).send({ from: `WK-${t}`, to: other.id, interchange: 'conditional' });
    expect(noNote.status).toBe(400);
    const sup = await agent.post('/api/admin/supersessions').set('Origin', ORIGIN).send({ from: `wk ${t}`, to: other.number, interchange: 'one_way' });
    expect(sup.status).toBe(201);
    const patched = await agent.patch(`/api/admin/parts/${id}`).set('Origin', ORIGIN).send({ name: 'Key, woodruff, 3/16 x 3/4' });
    expect(patched.status).toBe(200);
    const rows = await getDb().select().from(auditLog).where(and(eq(auditLog.actorId, user.id)));
    expect(rows.map((r) => r.action).sort()).toEqual(['part.create', 'part.update', 'part_number.create', 'supersession.create']);
    const upd = rows.find((r) => r.action === 'part.update')!;
    expect((upd.before as { name: string }).name).toBe('Key, woodruff');
    expect((upd.after as { name: string }).name).toBe('Key, woodruff, 3/16 x 3/4');
    const part = await request(app).get(`/api/parts/${id}`);
    expect(part.body.part.derivedSpecs.some((d: { source: string }) => /B17\.2/.test(d.source))).toBe(true);
  });

  it('when the catalog holds the demo loop, then the data-quality report lists it', async () => {
    const { agent } = await signedInAs(app, ['buyer', 'admin']);
    const r = await agent.get('/api/admin/data-quality');
    expect(r.status).toBe(200);
    expect(r.body.loops.length).toBeGreaterThanOrEqual(1);
    expect(r.body.partsInNoAssembly.count).toBeTypeOf('number');
    expect(Array.isArray(r.body.numbersOnSeveralParts)).toBe(true);
    expect(Array.isArray(r.body.overlappingLines)).toBe(true);
  });
});
