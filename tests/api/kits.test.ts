// Kits: the invented demo kit, create with checks on path, DOS version and CONFIG.SYS needs, versioned edits.
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import type request from 'supertest';

let t: TestApp;
let tech: request.Agent;
beforeAll(async () => {
  t = await makeTestApp();
  tech = await t.signIn(DEMO.technician);
});
afterAll(async () => {
  await t.close();
});

const LOOM = { name: 'Loomwire 1.4', programPath: 'c:\\loom\\lwres.exe', programArgs: '/R', baud: 4800, parity: 'E', dataBits: 7, stopBits: 1, minDos: '5.0', residentKB: 22 };

describe('kits', () => {
  it('lists the demo kit for every staff role', async () => {
    for (const email of [DEMO.admin, DEMO.lead, DEMO.technician]) {
      const res = await (await t.signIn(email)).get('/api/kits');
      expect(res.status).toBe(200);
      expect(res.body.items[0]).toMatchObject({ name: 'Threadline 2.1', programPath: 'C:\\THREAD\\TLRES.COM', minDos: '3.30', residentKB: 38 });
    }
  });

  it('creates a kit, upper-casing the path, and reads it back', async () => {
    const res = await tech.post('/api/kits').send({ ...LOOM, configLines: ['DEVICE=C:\\LOOM\\LWPORT.SYS'] });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ programPath: 'C:\\LOOM\\LWRES.EXE', configFiles: null, configLines: ['DEVICE=C:\\LOOM\\LWPORT.SYS'], version: 1 });
    expect((await tech.get(`/api/kits/${res.body.id}`)).body.name).toBe('Loomwire 1.4');
  });

  it('refuses a duplicate name (any case) with 409 on the name field', async () => {
    const res = await tech.post('/api/kits').send({ ...LOOM, name: 'threadline 2.1' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.name).toMatch(/exists already/);
  });

  it('checks the program path against the 8.3 rules and device names, the DOS version and the rates MODE accepts', async () => {
    const cases: Array<[object, string, RegExp]> = [
      [{ programPath: 'C:\\NETWORKING\\RES.COM' }, 'programPath', /at most 8 characters/],
      [{ programPath: 'C:\\AUX\\RES.COM' }, 'programPath', /device name/],
      [{ programPath: 'THREAD\\TLRES.COM' }, 'programPath', /drive/],
      [{ programPath: 'C:\\THREAD\\TLRES.TXT' }, 'programPath', /\.COM or \.EXE/],
      [{ minDos: '8.5' }, 'minDos', /Not a DOS version/],
      [{ baud: 14400 }, 'baud', /MODE accepts/],
      [{ residentKB: 700 }, 'residentKB', /640/],
      [{ configFiles: 300 }, 'configFiles', /255/],
      [{ configLines: ['X'.repeat(128)] }, 'configLines.0', /127/],
    ];
    for (const [patch, field, message] of cases) {
      const res = await tech.post('/api/kits').send({ ...LOOM, name: `Case ${field}`, ...patch });
      expect(res.status).toBe(400);
      expect(res.body.error.fields[field]).toMatch(message);
    }
  });

  it('updates with the version it read, refuses a stale one with 409, and archives', async () => {
    const kit = (await tech.post('/api/kits').send({ ...LOOM, name: 'Spindle 3' })).body;
    const ok = await tech.patch(`/api/kits/${kit.id}`).send({ version: 1, residentKB: 24 });
    expect(ok.body).toMatchObject({ residentKB: 24, version: 2, programArgs: '/R', baud: 4800 });
    const stale = await tech.patch(`/api/kits/${kit.id}`).send({ version: 1, residentKB: 99 });
    expect(stale.status).toBe(409);
    expect((await tech.get(`/api/kits/${kit.id}`)).body.residentKB).toBe(24);
    const archived = await tech.post(`/api/kits/${kit.id}/archive`).send({ version: 2 });
    expect(archived.body.archivedAt).not.toBeNull();
    expect((await tech.get('/api/kits?q=Spindle')).body.total).toBe(0);
    expect((await tech.get('/api/kits?q=Spindle&archived=true')).body.total).toBe(1);
    expect((await tech.patch('/api/kits/9999').send({ version: 1, residentKB: 1 })).status).toBe(404);
  });

  it('sorts by lowest DOS as a number', async () => {
    const res = await tech.get('/api/kits?sort=minDos&dir=asc');
    const versions = res.body.items.map((k: { minDos: string }) => Number(k.minDos));
    expect(versions).toEqual([...versions].sort((a, b) => a - b));
  });
});
