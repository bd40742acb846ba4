// Sites: list (paged, sorted, filtered), create, read, versioned update (409 when stale), archive, next numbers.
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import type request from 'supertest';

let t: TestApp;
let tech: request.Agent;
let admin: request.Agent;
beforeAll(async () => {
  t = await makeTestApp();
  tech = await t.signIn(DEMO.technician);
  admin = await t.signIn(DEMO.admin);
});
afterAll(async () => {
  await t.close();
});

describe('creating and listing sites', () => {
  it('creates a site with default number ranges and records it in the audit trail', async () => {
    const res = await tech.post('/api/sites').send({ name: 'Brannock Survey Office', address: '3 Mill Row' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Brannock Survey Office', address: '3 Mill Row', contact: '', version: 1, numberRanges: { pc: [1, 99] } });
    expect(res.body.nextNumbers).toEqual({ pc: 1, printer: 100, modem: 150, other: 200 });
    const audit = t.ctx.audit.list({ action: 'site.create', limit: 5, offset: 0 });
    expect(audit[0]).toMatchObject({ entity: 'site', entityId: String(res.body.id), actorEmail: DEMO.technician });
  });

  it('refuses an empty name and overlapping number ranges with field errors', async () => {
    const empty = await tech.post('/api/sites').send({ name: '  ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.name).toMatch(/office/);
    const overlap = await tech.post('/api/sites').send({ name: 'X', numberRanges: { pc: [1, 120], printer: [100, 149], modem: [150, 199], other: [200, 254] } });
    expect(overlap.status).toBe(400);
    expect(overlap.body.error.fields['numberRanges.printer']).toMatch(/Overlaps the PC range/);
    const backwards = await tech.post('/api/sites').send({ name: 'X', numberRanges: { pc: [50, 10], printer: [100, 149], modem: [150, 199], other: [200, 254] } });
    expect(backwards.body.error.fields['numberRanges.pc']).toMatch(/not be above/);
  });

  it('pages and sorts the list', async () => {
    for (const name of ['Aldous Dental', 'Zell Bakery', 'Marrow Print Shop']) await admin.post('/api/sites').send({ name });
    const all = await tech.get('/api/sites?limit=100');
    expect(all.body.total).toBe(5);
    const names = (all.body.items as { name: string }[]).map((s) => s.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    const page = await tech.get('/api/sites?sort=name&dir=desc&limit=2&offset=1');
    expect(page.body).toMatchObject({ total: 5, limit: 2, offset: 1 });
    expect(page.body.items.map((s: { name: string }) => s.name)).toEqual(['Marrow Print Shop', 'Halvorsen & Pike Architects']);
    const byStations = await tech.get('/api/sites?sort=stations&dir=desc&limit=1');
    expect(byStations.body.items[0]).toMatchObject({ name: 'Halvorsen & Pike Architects', stations: 13 });
    const found = await tech.get('/api/sites?q=bakery');
    expect(found.body.items.map((s: { name: string }) => s.name)).toEqual(['Zell Bakery']);
  });

  it('refuses a sort key it does not know and a limit over 500', async () => {
    expect((await tech.get('/api/sites?sort=password')).status).toBe(400);
    expect((await tech.get('/api/sites?limit=5000')).status).toBe(400);
  });
});

describe('reading and updating a site', () => {
  it('answers 404 for an unknown or malformed id', async () => {
    for (const id of ['9999', 'abc', '0', '-1', '1.5']) {
      const res = await tech.get(`/api/sites/${id}`);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await tech.patch('/api/sites/9999').send({ version: 1, name: 'x' })).status).toBe(404);
  });

  it('suggests the next free number per kind from the demo site’s ranges', async () => {
    const res = await tech.get('/api/sites/1/next-numbers');
    // Demo: PCs 1-10, printers 100-101, modem 150, no other stations.
    expect(res.body).toEqual({ pc: 11, printer: 102, modem: 151, other: 200 });
  });

  it('updates with the version it read and refuses a stale version with 409, keeping the first write', async () => {
    const site = (await tech.get('/api/sites/1')).body;
    const first = await tech.patch('/api/sites/1').send({ version: site.version, contact: 'June Halvorsen, 555-0142' });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ version: site.version + 1, contact: 'June Halvorsen, 555-0142', name: site.name, address: site.address });
    const second = await admin.patch('/api/sites/1').send({ version: site.version, contact: 'lost write' });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('stale');
    expect(second.body.error.message).toMatch(/changed by someone else/);
    expect((await tech.get('/api/sites/1')).body.contact).toBe('June Halvorsen, 555-0142');
  });

  it('archives and restores a site; archived sites leave the default list', async () => {
    const created = (await tech.post('/api/sites').send({ name: 'Temporary Office' })).body;
    const archived = await tech.post(`/api/sites/${created.id}/archive`).send({ version: created.version });
    expect(archived.status).toBe(200);
    expect(archived.body.archivedAt).not.toBeNull();
    expect((await tech.get('/api/sites?q=Temporary')).body.total).toBe(0);
    expect((await tech.get('/api/sites?q=Temporary&archived=true')).body.total).toBe(1);
    expect((await tech.post(`/api/sites/${created.id}/archive`).send({ version: created.version })).status).toBe(409);
    const restored = await tech.post(`/api/sites/${created.id}/restore`).send({ version: archived.body.version });
    expect(restored.body.archivedAt).toBeNull();
  });

  it('lets a lead read but not change a site', async () => {
    const lead = await t.signIn(DEMO.lead);
    expect((await lead.get('/api/sites/1')).status).toBe(200);
    const res = await lead.patch('/api/sites/1').send({ version: 1, name: 'Taken over' });
    expect(res.status).toBe(403);
    expect((await tech.get('/api/sites/1')).body.name).toBe('Halvorsen & Pike Architects');
  });
});
