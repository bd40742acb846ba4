// Office inventory import from CSV (papaparse): a preview that shows each row's errors and writes nothing,
// an import that writes all rows or none, and the directory exported as CSV.
import Papa from 'papaparse';
import { count } from 'drizzle-orm';
import { station } from '@/db/schema';
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

const stations = () => t.ctx.db.select({ n: count() }).from(station).get()!.n;

const BAD = [
  'name,number,kind,location,dos,network_port',
  'MODELS2,11,pc,Model shop bench,6.22,COM1', // line 2: fine
  'PRN,12,pc,Front desk,5.0,COM1', // line 3: device name
  'RECEPT,13,pc,Reception,6.22,COM1', // line 4: name taken at the site
  'MODELS2,14,pc,Second bench,6.22,COM1', // line 5: name repeated in the file
  'SCAN,5,other,Copy room,,', // line 6: number taken, and outside the other range
  'BIGPLOTTER,,printer,"Drafting room, by the window",,', // line 7: name too long
  'LAPTOP,15,laptop,Visitor,,', // line 8: unknown kind
  'OLDPC,16,pc,Storage,2.5,COM5', // line 9: unknown DOS, bad port
  '',
  'NEWPRN,,printer,Hall,,', // line 11: fine, number 102 suggested
].join('\r\n');

describe('CSV import preview', () => {
  it('shows every row with its own errors and file line, and writes nothing', async () => {
    const before = stations();
    const res = await tech.post('/api/sites/1/import/preview').send({ csv: BAD });
    expect(res.status).toBe(200);
    expect(stations()).toBe(before);
    const rows = res.body.rows as Array<{ line: number; values: { name: string; number: number | null }; errors: Record<string, string> }>;
    const byLine = Object.fromEntries(rows.map((r) => [r.line, r]));
    expect(rows.map((r) => r.line)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 11]);
    expect(byLine[2].errors).toEqual({});
    expect(byLine[3].errors.name).toMatch(/device name/);
    expect(byLine[4].errors.name).toBe('RECEPT is already used at this site.');
    expect(byLine[5].errors.name).toBe('MODELS2 is already used on line 2.');
    expect(byLine[6].errors.number).toBe('Number 5 is already used at this site.');
    expect(byLine[7].errors.name).toMatch(/at most 8/);
    expect(byLine[8].errors.kind).toMatch(/not a kind/);
    expect(byLine[9].errors).toMatchObject({ dos: expect.stringMatching(/not a DOS version/), network_port: expect.stringMatching(/COM1 to COM4/) });
    expect(byLine[11]).toMatchObject({ values: { name: 'NEWPRN', number: 102 }, errors: {} });
    expect(res.body).toMatchObject({ valid: 2, invalid: 7, fileErrors: [] });
  });

  it('names a missing name column and unknown columns before any row', async () => {
    const res = await tech.post('/api/sites/1/import/preview').send({ csv: 'station,numbr\r\nA,1\r\n' });
    expect(res.body.rows).toEqual([]);
    expect(res.body.fileErrors.join(' ')).toMatch(/needs a “name” column.*Unknown columns: station, numbr/);
  });

  it('puts a number outside its kind’s range on the row', async () => {
    const res = await tech.post('/api/sites/1/import/preview').send({ csv: 'name,number,kind\nFAXPC,120,pc\n' });
    expect(res.body.rows[0].errors.number).toBe('120 is outside this site’s pc range 1–99.');
  });
});

describe('CSV import', () => {
  it('writes nothing when any row has an error and answers with the preview', async () => {
    const before = stations();
    const res = await tech.post('/api/sites/1/import').send({ csv: BAD, kitId: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'import_invalid', message: 'Nothing was imported: 7 rows have errors.' });
    expect(res.body.preview.invalid).toBe(7);
    expect(stations()).toBe(before);
  });

  it('writes all rows of a clean file, numbering those without one, with PC profile drafts', async () => {
    const csv = 'name,number,kind,location,dos,network_port\nmodels2,,pc,Model shop bench,6.22,com2\nNEWPRN,,printer,Hall,,\nCAD3,20,pc,Drafting,5.0,COM1\n';
    const res = await tech.post('/api/sites/1/import').send({ csv, kitId: 1 });
    expect(res.status).toBe(201);
    expect(res.body.created).toEqual([
      { id: expect.any(Number), name: 'MODELS2', number: 11, kind: 'pc' },
      { id: expect.any(Number), name: 'NEWPRN', number: 102, kind: 'printer' },
      { id: expect.any(Number), name: 'CAD3', number: 20, kind: 'pc' },
    ]);
    const detail = (await tech.get(`/api/stations/${res.body.created[0].id}`)).body;
    expect(detail.profile).toMatchObject({ kitId: 1, wizardStep: 'dos', data: { dos: '6.22', network: { port: 'COM2' } } });
    const again = await tech.post('/api/sites/1/import/preview').send({ csv });
    expect(again.body.rows[0].errors.name).toBe('MODELS2 is already used at this site.');
  });
});

describe('CSV export', () => {
  it('exports the directory in import columns plus status, readable back by papaparse', async () => {
    const lead = await t.signIn(DEMO.lead);
    const res = await lead.get('/api/sites/1/export.csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?HALVORSE.CSV"?/);
    expect(res.text).toContain('\r\n');
    const parsed = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(['name', 'number', 'kind', 'location', 'notes', 'dos', 'network_port', 'plan_status', 'autoexec', 'config']);
    expect(parsed.data[0]).toMatchObject({ name: 'RECEPT', number: '1', kind: 'pc', dos: '6.22', network_port: 'COM1', autoexec: 'file', config: 'file' });
    expect(parsed.data.find((r) => r.name === 'HALLPRN')).toMatchObject({ kind: 'printer', plan_status: 'not-needed', autoexec: '' });
    // The export imports cleanly into an empty site (the extra columns aside).
    const empty = (await tech.post('/api/sites').send({ name: 'Copy of the office' })).body;
    const csv = Papa.unparse(parsed.data.map(({ name, number, kind, location, notes, dos, network_port }) => ({ name, number, kind, location, notes, dos, network_port })));
    const preview = await tech.post(`/api/sites/${empty.id}/import/preview`).send({ csv });
    expect(preview.body).toMatchObject({ invalid: 0, valid: parsed.data.length });
  });

  it('keeps a spreadsheet from running a cell as a formula', async () => {
    const st = (await tech.post('/api/stations').send({ siteId: 1, kind: 'other', name: 'KIOSK', number: 201, notes: '=HYPERLINK("x")' })).body;
    const text = (await tech.get('/api/sites/1/export.csv')).text;
    expect(text).toContain(`KIOSK,201,other,,"'=HYPERLINK(""x"")"`);
    expect(st.name).toBe('KIOSK');
  });
});
