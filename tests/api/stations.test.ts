// Stations: the site directory (sort, filter, pages, next numbers), create with 8.3 names unique per site,
// versioned updates, profile drafts and the plan preview that saves nothing.
import { count } from 'drizzle-orm';
import { planRevision, profile } from '@/db/schema';
import iconv from 'iconv-lite';
import { displayText, parseUnifiedDiff } from '@/components/diff/parse-diff';
import { applyWithGnuPatch } from '../unit/engine/helpers/gnu-patch';
import { splitDosLines } from '@/components/stations/dos-lines';
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

type Row = { name: string; number: number; kind: string; dos: string | null; networkPort: string | null; planStatus: string };
const list = async (qs = '') => (await tech.get(`/api/sites/1/stations${qs}`)).body as { items: Row[]; total: number; nextNumbers: Record<string, number> };

describe('the station directory', () => {
  it('lists the demo site’s 13 stations by number with DOS, network port and status', async () => {
    const res = await list();
    expect(res.total).toBe(13);
    expect(res.items[0]).toMatchObject({ name: 'RECEPT', number: 1, kind: 'pc', dos: '6.22', networkPort: 'COM1', planStatus: 'ready' });
    expect(res.items.find((r) => r.name === 'HALLPRN')).toMatchObject({ kind: 'printer', dos: null, planStatus: 'not-needed' });
    expect(res.nextNumbers).toEqual({ pc: 11, printer: 102, modem: 151, other: 200 });
  });

  it('sorts by DOS version as a number, printers and the modem last either way', async () => {
    const asc = (await list('?sort=dos&dir=asc')).items.map((r) => r.dos);
    expect(asc.slice(0, 2)).toEqual(['3.30', '3.30']);
    expect(asc.slice(-3)).toEqual([null, null, null]);
    const desc = (await list('?sort=dos&dir=desc')).items.map((r) => r.dos);
    expect(desc[0]).toBe('6.22');
    expect(desc.slice(-3)).toEqual([null, null, null]);
    const names = (await list('?sort=name&dir=desc&limit=3')).items.map((r) => r.name);
    expect(names).toEqual(['STUDIO', 'RECEPT', 'PRINCIPL']);
  });

  it('filters by kind and by text, and pages', async () => {
    expect((await list('?kind=printer')).items.map((r) => r.name)).toEqual(['HALLPRN', 'PLOTPRN']);
    expect((await list('?q=drafting')).items.map((r) => r.name)).toEqual(['DRAFT1', 'DRAFT2', 'PLOTPRN']);
    const page = await list('?limit=5&offset=10');
    expect(page.total).toBe(13);
    expect(page.items.map((r) => r.number)).toEqual([100, 101, 150]);
    expect((await tech.get('/api/sites/1/stations?kind=router')).status).toBe(400);
    expect((await tech.get('/api/sites/999/stations')).status).toBe(404);
  });
});

describe('creating a station', () => {
  it('creates a PC with an empty profile draft and upper-cases its name', async () => {
    const res = await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'survey', number: 11, location: 'Survey room, jack J-13', kitId: 1 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'SURVEY', number: 11, kind: 'pc', version: 1 });
    const detail = (await tech.get(`/api/stations/${res.body.id}`)).body;
    expect(detail.profile).toMatchObject({ data: {}, kitId: 1, wizardStep: 'dos', version: 1 });
    expect(detail.files).toEqual({ autoexec: null, config: null });
    expect((await list()).nextNumbers.pc).toBe(12);
  });

  it('refuses names DOS cannot hold and device names, saying why', async () => {
    const cases: Array<[string, RegExp]> = [
      ['PRN', /device name/],
      ['com1', /device name/],
      ['RECEPTION', /at most 8/],
      ['ROOM 2', /spaces/],
      ['A.B', /no dot/],
      ['', /Enter a station name/],
    ];
    for (const [name, message] of cases) {
      const res = await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name, number: 60 });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.name).toMatch(message);
    }
  });

  it('refuses a name or number another station of the site holds (409 on that field), but not at another site', async () => {
    const name = await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'recept', number: 61 });
    expect(name.status).toBe(409);
    expect(name.body.error.fields.name).toBe('RECEPT is already station 1 at this site.');
    const number = await tech.post('/api/stations').send({ siteId: 1, kind: 'printer', name: 'NEWPRN', number: 100 });
    expect(number.status).toBe(409);
    expect(number.body.error.fields.number).toBe('Number 100 already belongs to HALLPRN.');
    const other = (await tech.post('/api/sites').send({ name: 'Second Office' })).body;
    expect((await tech.post('/api/stations').send({ siteId: other.id, kind: 'pc', name: 'RECEPT', number: 1 })).status).toBe(201);
    expect((await tech.post('/api/stations').send({ siteId: 999, kind: 'pc', name: 'X', number: 1 })).status).toBe(404);
    expect((await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'X', number: 255 })).status).toBe(400);
  });

  it('refuses an unknown kit', async () => {
    const res = await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'NOKIT', number: 62, kitId: 999 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.kitId).toMatch(/not found/);
  });
});

describe('updating a station', () => {
  it('applies an update with its version and answers 409 for a stale one without losing the first write', async () => {
    const st = (await tech.get('/api/stations/5')).body.station;
    const ok = await tech.patch('/api/stations/5').send({ version: st.version, location: 'Studio, by the window, jack J-08' });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ version: st.version + 1, name: 'STUDIO', location: 'Studio, by the window, jack J-08' });
    const admin = await t.signIn(DEMO.admin);
    const stale = await admin.patch('/api/stations/5').send({ version: st.version, location: 'lost write' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale');
    expect((await tech.get('/api/stations/5')).body.station.location).toBe('Studio, by the window, jack J-08');
  });

  it('refuses renaming onto another station’s name and answers 404 for unknown ids', async () => {
    const res = await tech.patch('/api/stations/5').send({ version: 2, name: 'DRAFT1' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.name).toMatch(/DRAFT1 is already station 2/);
    expect((await tech.patch('/api/stations/9999').send({ version: 1, notes: 'x' })).status).toBe(404);
    expect((await tech.get('/api/stations/nope')).status).toBe(404);
  });

  it('archives a station; it leaves the directory but keeps its number', async () => {
    const created = (await tech.post('/api/stations').send({ siteId: 1, kind: 'other', name: 'SCANNER', number: 200 })).body;
    const archived = await tech.post(`/api/stations/${created.id}/archive`).send({ version: 1 });
    expect(archived.body.archivedAt).not.toBeNull();
    expect((await list()).items.some((r) => r.name === 'SCANNER')).toBe(false);
    expect((await list('?archived=true')).items.map((r) => r.name)).toContain('SCANNER');
    expect((await list()).nextNumbers.other).toBe(201);
  });
});

describe('profile drafts', () => {
  it('saves a half-filled draft, moves the wizard step, and refuses a stale version', async () => {
    const st = (await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'DRAFTING', number: 70, kitId: 1 })).body;
    const first = await tech.put(`/api/stations/${st.id}/profile`).send({ version: 1, kitId: 1, wizardStep: 'ports', data: { dos: '5.0', bootDrive: 'c', dosDir: 'C:\\DOS' } });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ version: 2, wizardStep: 'ports', data: { dos: '5.0', bootDrive: 'C' } });
    const stale = await tech.put(`/api/stations/${st.id}/profile`).send({ version: 1, kitId: 1, wizardStep: 'network', data: {} });
    expect(stale.status).toBe(409);
    const read = await tech.get(`/api/stations/${st.id}/profile`);
    expect(read.body).toMatchObject({ version: 2, wizardStep: 'ports', data: { dos: '5.0' } });
  });

  it('validates the draft’s parts (ports, baud) and refuses a profile for a printer', async () => {
    const bad = await tech.put('/api/stations/2/profile').send({ version: 1, kitId: 1, wizardStep: 'ports', data: { ports: [{ name: 'USB1', present: true, attached: 'none' }] } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['data.ports.0.name']).toMatch(/COM1 or LPT1/);
    const baud = await tech.put('/api/stations/2/profile').send({ version: 1, kitId: 1, wizardStep: 'network', data: { network: { baud: 14400 } } });
    expect(baud.body.error.fields['data.network.baud']).toMatch(/110 to 19200/);
    const printer = await tech.put('/api/stations/11/profile').send({ version: 0, kitId: null, wizardStep: 'dos', data: {} });
    expect(printer.status).toBe(400);
    expect(printer.body.error.message).toMatch(/Only PC stations/);
  });
});

describe('the plan preview', () => {
  it('puts the kit’s loader above the final program and saves nothing', async () => {
    const plansBefore = t.ctx.db.select({ n: count() }).from(planRevision).get()!.n;
    const profileBefore = t.ctx.db.select().from(profile).all().map((p) => p.version);
    const res = await tech.post('/api/stations/1/plan').send({});
    expect(res.status).toBe(200);
    const plan = res.body.plan;
    expect(plan.finalProgram).toMatchObject({ line: 6, program: 'C:\\OFFMENU\\OFFMENU.EXE', detected: true });
    const lines: string[] = plan.files.autoexec.afterText.split('\r\n');
    const loader = lines.findIndex((l) => l.includes('C:\\THREAD\\TLRES.COM /S:1 /Q'));
    const menu = lines.findIndex((l) => l === 'C:\\OFFMENU\\OFFMENU.EXE');
    expect(loader).toBeGreaterThan(0);
    expect(loader).toBeLessThan(menu);
    expect(plan.diff).toContain('+++ b/AUTOEXEC.BAT');
    expect(plan.boot.after.map((s: { program: string }) => s.program)).toContain('C:\\THREAD\\TLRES.COM');
    expect(res.body.inputs.autoexec).toMatchObject({ kind: 'AUTOEXEC.BAT', source: 'seed' });
    expect(res.body.inputs.autoexec.content).toBeUndefined();
    expect(t.ctx.db.select({ n: count() }).from(planRevision).get()!.n).toBe(plansBefore);
    expect(t.ctx.db.select().from(profile).all().map((p) => p.version)).toEqual(profileBefore);
  });

  it('gives a diff whose line numbers, as the screen reads them, point at the same text in both files', async () => {
    for (const id of [1, 2, 3, 4, 5, 6, 7, 8, 9, 10]) {
      const plan = (await tech.post(`/api/stations/${id}/plan`).send({})).body.plan;
      const before = splitDosLines(plan.files.autoexec.beforeText ?? '');
      const after = splitDosLines(plan.files.autoexec.afterText);
      const rows = parseUnifiedDiff(plan.files.autoexec.diff).flatMap((h) => h.rows);
      expect(rows.some((r) => r.kind === 'add')).toBe(true);
      for (const r of rows) {
        if (r.kind !== 'del') expect(displayText(after[r.newNo! - 1])).toBe(r.text);
        if (r.kind !== 'add') expect(displayText(before[r.oldNo! - 1])).toBe(r.text);
      }
    }
  });

  it('returns a diff GNU patch applies to the stored files, giving the patched files byte for byte', async () => {
    // INTERN (8) has no AUTOEXEC.BAT: its plan writes a new file rather than patching one.
    const ids = [1, 2, 3, 4, 5, 6, 7, 9, 10];
    const cases = [];
    const expected: Array<Record<string, Buffer>> = [];
    for (const id of ids) {
      const plan = (await tech.post(`/api/stations/${id}/plan`).send({})).body.plan;
      const files = (await tech.get(`/api/stations/${id}`)).body.files;
      const enc = (t: string) => iconv.encode(t, 'cp437');
      // Code page 437 decodes one byte to one character, so encoding the shown text gives the stored bytes back.
      const raw = async (f: { id: number; absent: boolean } | null) => (f && !f.absent ? enc((await tech.get(`/api/stations/${id}/files/${f.id}`)).body.text) : null);
      cases.push({ files: { 'AUTOEXEC.BAT': await raw(files.autoexec), 'CONFIG.SYS': await raw(files.config) }, diff: enc(plan.diff) });
      expected.push({ 'AUTOEXEC.BAT': enc(plan.files.autoexec.afterText), ...(plan.files.config ? { 'CONFIG.SYS': enc(plan.files.config.afterText) } : {}) });
    }
    applyWithGnuPatch(cases).forEach((out, i) => {
      expect(out.ok).toBe(true);
      for (const [name, bytes] of Object.entries(expected[i])) expect(out.files[name]?.equals(bytes)).toBe(true);
    });
  });

  it('plans an unsaved draft when one is sent, and shows the kit’s minimum-DOS check', async () => {
    const res = await tech.post('/api/stations/1/plan').send({ data: { ...(await tech.get('/api/stations/1/profile')).body.data, dos: '3.10' } });
    const below = res.body.plan.checks.find((c: { slug: string }) => c.slug === 'dos-below-kit');
    expect(below).toMatchObject({ severity: 'error', message: 'Threadline 2.1 needs DOS 3.30 or later; this PC runs 3.10.' });
    expect(res.body.plan.ok).toBe(false);
  });

  it('answers a half-filled profile with the field that is missing instead of failing', async () => {
    const st = (await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'HALF', number: 71, kitId: 1 })).body;
    const res = await tech.post(`/api/stations/${st.id}/plan`).send({});
    expect(res.status).toBe(200);
    expect(res.body.profileError).toMatch(/^dos: /);
    expect(res.body.plan.ok).toBe(false);
    expect(res.body.plan.checks[0].slug).toBe('profile-invalid');
  });

  it('refuses to plan a printer and answers 404 for an unknown station', async () => {
    expect((await tech.post('/api/stations/11/plan').send({})).status).toBe(400);
    expect((await tech.post('/api/stations/9999/plan').send({})).status).toBe(404);
  });
});

describe('linking an office user to their station', () => {
  it('moves the link, after which the user reads only the new station', async () => {
    const user = await t.signIn(DEMO.user);
    const draft1 = (await tech.get('/api/stations/2')).body.station;
    const taken = await tech.put('/api/stations/2/user').send({ version: draft1.version, email: DEMO.user });
    expect(taken.status).toBe(409);
    expect(taken.body.error.message).toMatch(/already linked to station RECEPT/);
    const technician = await tech.put('/api/stations/2/user').send({ version: draft1.version, email: DEMO.technician });
    expect(technician.status).toBe(400);
    expect(technician.body.error.fields.email).toMatch(/office user/);
    const lead = await t.signIn(DEMO.lead);
    expect((await lead.put('/api/stations/2/user').send({ version: draft1.version, email: DEMO.user })).status).toBe(403);

    const recept = (await tech.get('/api/stations/1')).body.station;
    expect((await tech.put('/api/stations/1/user').send({ version: recept.version, email: null })).body).toMatchObject({ linkedUser: false });
    expect((await tech.put('/api/stations/2/user').send({ version: draft1.version, email: DEMO.user.toUpperCase() })).body).toMatchObject({ linkedUser: true });
    expect((await user.get('/api/stations/mine')).body).toEqual({ stationId: 2 });
    expect((await user.get('/api/stations/2')).status).toBe(200);
    expect((await user.get('/api/stations/1')).status).toBe(404);
    // The stale version the link read is refused like any other update.
    expect((await tech.put('/api/stations/2/user').send({ version: draft1.version, email: null })).status).toBe(409);
  });
});
