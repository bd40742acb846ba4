// Rollout bundles through the API on the demo site: admin only, the preview's reasons for every plan state,
// a download that Info-ZIP accepts with 8.3 names, plans released and leads told only when the stream
// completes, a record fetched again byte for byte (and refused with 409 when the bytes would differ).
import { eq } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { bundleRecord } from '@/db/bundles';
import { planRevision } from '@/db/plans';
import { auditEvent, site, station, startupFile, surveyJack } from '@/db/schema';
import { bundleFileName } from '@/server/bundles/file-name';
import { surveyReportForSite } from '@/server/survey/report';
import { reportStamp } from '@/server/survey/view';
import { tempDir, unzipNames, unzipTest, zipEntries } from '../support/bundle-zip';
import { createPlan, getPlan, replaceAutoexec, stationIdOf, submitPlan, userIdOf, type PlanBody } from '../support/plan-helpers';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let admin: request.Agent;
let tech: request.Agent;
let lead: request.Agent;
let siteId: number;
beforeAll(async () => {
  t = await makeTestApp();
  admin = await t.signIn(DEMO.admin);
  tech = await t.signIn(DEMO.technician);
  lead = await t.signIn(DEMO.lead);
  siteId = t.ctx.db.select().from(site).where(eq(site.name, 'Halvorsen & Pike Architects')).get()!.id;
});
afterAll(async () => {
  await t.close();
});

/** Collects a binary body (supertest would otherwise try to parse the zip). */
const binary: Parameters<request.Test['parse']>[0] = (res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};
const getZip = (id: number) => admin.get(`/api/bundles/${id}/zip`).buffer(true).parse(binary);

async function sent(name: string): Promise<PlanBody> {
  const p = await createPlan(tech, stationIdOf(t, name));
  const reasons = Object.fromEntries(p.missingReasons.map((k) => [k, 'Checked on site with the office manager.']));
  const res = await submitPlan(tech, p, Object.keys(reasons).length ? reasons : undefined);
  expect(res.status).toBe(200);
  return res.body;
}

async function approved(name: string): Promise<PlanBody> {
  const p = await sent(name);
  const res = await lead.post(`/api/plans/${p.plan.id}/approve`).send({ version: p.plan.version, planHash: p.plan.planHash });
  expect(res.status).toBe(200);
  return res.body;
}

type Preview = { included: Array<{ name: string; folder: string; planId: number; approvedBy: string }>; leftOut: Array<{ name: string; code: string; reason: string }>; directoryCount: number };
const preview = async (qs = '') => (await admin.get(`/api/bundles/preview?siteId=${siteId}${qs}`).expect(200)).body as Preview;
const recordOf = (id: number) => t.ctx.db.select().from(bundleRecord).where(eq(bundleRecord.id, id)).get()!;
const stateOf = (planId: number) => t.ctx.db.select({ s: planRevision.state }).from(planRevision).where(eq(planRevision.id, planId)).get()!.s;
const bundleMails = () => t.ctx.mailer.fake!.list().filter((m) => /Rollout bundle/.test(m.subject));

/** The mail goes out after the last byte of the zip, through the local SMTP fake: wait for it to land. */
async function until(test: () => boolean, ms = 5000) {
  for (const end = Date.now() + ms; !test() && Date.now() < end; ) await new Promise((r) => setTimeout(r, 25));
}

// Independent of generators/dos/names.ts, from REFERENCES 5.2-5.4 ([M4D] FCB.ASM: 8 + 3 characters and the
// forbidden ones; [M4S] MSBDATA.INC: device names).
const PART = String.raw`[^\x00-\x20"/\\\[\]:|<>+=;,.*?]`;
const NAME_83 = new RegExp(`^${PART}{1,8}(\\.${PART}{1,3})?$`);
const DEVICE = /^(CON|AUX|PRN|NUL|CLOCK\$|COM[1-4]|LPT[1-3])(\.|$)/i;

let plans: Record<string, PlanBody>;

describe('plans in every state', () => {
  beforeAll(async () => {
    plans = {
      RECEPT: await approved('RECEPT'),
      DRAFT1: await approved('DRAFT1'),
      ACCOUNTS: await approved('ACCOUNTS'), // a warning with the technician's reason
      PRINCIPL: await approved('PRINCIPL'),
      LIBRARY: await approved('LIBRARY'),
      DRAFT2: await createPlan(tech, stationIdOf(t, 'DRAFT2')),
      STUDIO: await sent('STUDIO'),
    };
    const back = await sent('ARCHIVE');
    expect((await lead.post(`/api/plans/${back.plan.id}/return`).send({ version: back.plan.version, comment: 'Wrong port.' })).status).toBe(200);
    plans.ARCHIVE = back;
    // PRINCIPL's AUTOEXEC.BAT changed after approval: stale. LIBRARY's approval no longer names its hash.
    replaceAutoexec(t, stationIdOf(t, 'PRINCIPL'), 'ECHO OFF\r\nPATH C:\\DOS\r\n', userIdOf(t, DEMO.technician));
    t.ctx.db.update(planRevision).set({ approvedHash: '0'.repeat(64) }).where(eq(planRevision.id, plans.LIBRARY.plan.id)).run();
  });

  it('preview lists what goes in and, for everything else, why not', async () => {
    const p = await preview();
    expect(p.included.map((i) => i.name)).toEqual(['RECEPT', 'DRAFT1', 'ACCOUNTS']);
    expect(p.included[0]).toMatchObject({ folder: 'RECEPT', planId: plans.RECEPT.plan.id, approvedBy: 'Malik Osei' });
    const why = Object.fromEntries(p.leftOut.map((l) => [l.name, l.code]));
    expect(why).toEqual({
      DRAFT2: 'draft', STUDIO: 'in_review', ARCHIVE: 'returned', PRINCIPL: 'stale', LIBRARY: 'not_approved',
      INTERN: 'no_plan', MODELS: 'no_plan', HALLPRN: 'not_pc', PLOTPRN: 'not_pc', MODEM1: 'not_pc',
    });
    const reason = (name: string) => p.leftOut.find((l) => l.name === name)!.reason;
    expect(reason('PRINCIPL')).toMatch(/AUTOEXEC\.BAT changed since/);
    expect(reason('ARCHIVE')).toMatch(/returned by Malik Osei/);
    expect(reason('HALLPRN')).toMatch(/printer has no startup files/);
    expect(p.directoryCount).toBe(13);
  });

  it('a selection previews only the ticked stations, archived ones with their reason', async () => {
    const ids = [stationIdOf(t, 'DRAFT1'), stationIdOf(t, 'STUDIO')];
    const p = await preview(`&stations=${ids.join(',')}`);
    expect(p.included.map((i) => i.name)).toEqual(['DRAFT1']);
    expect(p.leftOut.map((l) => [l.name, l.code])).toEqual([['STUDIO', 'in_review']]);
    const models = stationIdOf(t, 'MODELS');
    t.ctx.db.update(station).set({ archivedAt: new Date() }).where(eq(station.id, models)).run();
    expect((await preview(`&stations=${models}`)).leftOut.map((l) => l.code)).toEqual(['archived']);
    expect((await preview()).leftOut.map((l) => l.name)).not.toContain('MODELS');
    t.ctx.db.update(station).set({ archivedAt: null }).where(eq(station.id, models)).run();
  });

  it('refuses bad input with field paths (zod)', async () => {
    const bad = async (path: string) => (await admin.get(path).expect(400)).body.error.fields;
    expect(await bad('/api/bundles/preview')).toHaveProperty('siteId');
    expect(await bad(`/api/bundles/preview?siteId=${siteId}&stations=1,,2`)).toHaveProperty('stations');
    expect(await bad(`/api/bundles/preview?siteId=${siteId}&stations=4,4`)).toHaveProperty('stations');
    expect(await bad(`/api/bundles/preview?siteId=${siteId}&stations=99999`)).toHaveProperty('stationIds');
    const post = async (b: unknown) => (await admin.post('/api/bundles').send(b as object).expect(400)).body.error.fields;
    expect(await post({})).toHaveProperty('siteId');
    expect(await post({ siteId, stationIds: [] })).toHaveProperty('stationIds');
    expect(await post({ siteId: 'one' })).toHaveProperty('siteId');
    expect(Object.keys(await post({ siteId, extra: 1 }))).toEqual(['_']);
    await admin.get('/api/bundles/preview?siteId=9999').expect(404);
    await admin.get('/api/bundles/abc/progress').expect(400);
    await admin.get('/api/bundles/9999/zip').expect(404);
  });

  it('a selection with nothing bundleable is refused with 409', async () => {
    const res = await admin.post('/api/bundles').send({ siteId, stationIds: [stationIdOf(t, 'STUDIO')] });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('nothing_to_bundle');
  });
});

describe('only the admin', () => {
  it('every bundle route answers 401 signed out and 403 for lead, technician and user', async () => {
    const created = await admin.post('/api/bundles').send({ siteId, stationIds: [stationIdOf(t, 'DRAFT1')] }).expect(201);
    const id = created.body.record.id;
    const routes = [`/api/bundles/preview?siteId=${siteId}`, `/api/bundles?siteId=${siteId}`, `/api/bundles/${id}`, `/api/bundles/${id}/progress`, `/api/bundles/${id}/zip`];
    const anon = request(t.app);
    for (const path of routes) expect((await anon.get(path)).status).toBe(401);
    expect((await anon.post('/api/bundles').send({ siteId })).status).toBe(401);
    for (const email of [DEMO.lead, DEMO.technician, DEMO.user]) {
      const agent = await t.signIn(email);
      for (const path of routes) expect([path, (await agent.get(path)).status]).toEqual([path, 403]);
      expect((await agent.post('/api/bundles').send({ siteId })).status).toBe(403);
    }
    // Nobody else's attempt touched the record: it still waits for the admin's one download.
    expect(recordOf(id)).toMatchObject({ state: 'building', startedAt: null });
    expect(stateOf(plans.DRAFT1.plan.id)).toBe('approved');
  });
});

describe('download', () => {
  let id: number;
  let zip: Buffer;
  let dir: string;

  it('starts a building record with the exact plan revisions, hashes and a fixed time', async () => {
    const res = await admin.post('/api/bundles').send({ siteId }).expect(201);
    id = res.body.record.id;
    expect(res.body.record).toMatchObject({ state: 'building', zipSha256: null, createdBy: { name: expect.any(String) } });
    expect(res.body.record.fileName).toMatch(/^HALV\d{4}\.ZIP$/);
    expect(res.body.survey).toBe(true);
    const rec = recordOf(id);
    expect(rec.plans.map((p) => [p.stationName, p.planId, p.planHash])).toEqual(
      ['RECEPT', 'DRAFT1', 'ACCOUNTS'].map((n) => [n, plans[n].plan.id, plans[n].plan.planHash]),
    );
    expect(rec.generatedAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.000Z$/);
    expect(bundleMails()).toHaveLength(0);
  });

  it('streams application/zip under an 8.3 file name; Info-ZIP accepts it', async () => {
    const res = await getZip(id);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    const name = /attachment; filename="([^"]+)"/.exec(res.headers['content-disposition'])![1];
    expect(name).toMatch(NAME_83);
    zip = res.body as Buffer;
    dir = tempDir('bw-bundle-api-');
    const file = join(dir, name);
    writeFileSync(file, zip);
    // Info-ZIP's own integrity test (Debian package `unzip`).
    const verdict = unzipTest(file);
    expect(verdict.output).toMatch(/No errors detected/);
    expect(verdict.status).toBe(0);
    const names = unzipNames(file);
    expect(names).toContain('RECEPT/INSTALL.BAT');
    expect(names).toContain('ACCOUNTS/SHEET.TXT');
    expect(new Set(names.map((n) => n.toUpperCase())).size).toBe(names.length);
    for (const n of names) for (const part of n.split('/')) expect([part, NAME_83.test(part) && !DEVICE.test(part)]).toEqual([part, true]);
  });

  it('records done with the SHA-256 and size, releases the plans, audits who, when, which revisions and hashes', async () => {
    const rec = recordOf(id);
    expect(rec).toMatchObject({ state: 'done', zipSha256: createHash('sha256').update(zip).digest('hex'), zipSize: zip.length, failure: null });
    for (const n of ['RECEPT', 'DRAFT1', 'ACCOUNTS']) expect(stateOf(plans[n].plan.id)).toBe('released');
    expect(stateOf(plans.STUDIO.plan.id)).toBe('in_review');
    const audit = t.ctx.db.select().from(auditEvent).where(eq(auditEvent.action, 'bundle.download')).all();
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ actorEmail: DEMO.admin, entityId: String(id), siteId });
    expect(audit[0].details).toMatchObject({ zipSha256: rec.zipSha256, plans: [{ planId: plans.RECEPT.plan.id, planHash: plans.RECEPT.plan.planHash, revision: 1, stationName: 'RECEPT' }, expect.anything(), expect.anything()] });
    const progress = (await admin.get(`/api/bundles/${id}/progress`).expect(200)).body;
    expect(progress).toMatchObject({ state: 'done', done: 3, total: 3 });
  });

  it('holds the plans’ own bytes: new files, the originals they were made from, the survey report', async () => {
    const entries = await zipEntries(zip);
    const patched = await admin.get(`/api/plans/${plans.RECEPT.plan.id}/files/AUTOEXEC.BAT`).buffer(true).parse(binary);
    expect(Buffer.from(entries.get('RECEPT/AUTOEXEC.BAT')!).equals(patched.body)).toBe(true);
    const original = t.ctx.db.select().from(startupFile).where(eq(startupFile.stationId, stationIdOf(t, 'RECEPT'))).all().filter((f) => f.kind === 'AUTOEXEC.BAT')[0];
    expect(Buffer.from(entries.get('RECEPT/AUTOEXEC.OLD')!).equals(original.content)).toBe(true);
    const rec = recordOf(id);
    const survey = surveyReportForSite(t.ctx, siteId, { generatedAt: reportStamp(new Date(rec.generatedAt)) })!;
    expect(Buffer.from(entries.get('SURVEY.TXT')!).equals(Buffer.from(survey))).toBe(true);
    const manifest = Buffer.from(entries.get('MANIFEST.CSV')!).toString('latin1');
    expect(manifest).toContain(`1,RECEPT,RECEPT,AUTOEXEC.BAT,1 (#${plans.RECEPT.plan.id}),${plans.RECEPT.plan.planHash},Malik Osei,`);
    const sheet = Buffer.from(entries.get('ACCOUNTS/SHEET.TXT')!).toString('latin1');
    expect(sheet).toContain('Checked on site with the office manager.');
  });

  it('mails every active lead once, and nobody else', async () => {
    await until(() => bundleMails().length > 0);
    const mails = bundleMails();
    expect(mails).toHaveLength(1);
    expect([...mails[0].to].sort()).toEqual([DEMO.lead, DEMO.lead2].sort());
    expect(mails[0].subject).toBe('Rollout bundle for Halvorsen & Pike Architects downloaded');
    expect(mails[0].text).toContain('RECEPT, DRAFT1, ACCOUNTS');
    expect(mails[0].text).toContain(recordOf(id).zipSha256!);
  });

  it('the preview now says those plans went out in this bundle', async () => {
    const p = await preview();
    expect(p.included).toEqual([]);
    expect(p.leftOut.find((l) => l.name === 'RECEPT')).toMatchObject({ code: 'released', reason: expect.stringContaining(`bundle #${id}`) });
  });

  it('lists the record in the site’s history with its hash', async () => {
    const res = await admin.get(`/api/bundles?siteId=${siteId}`).expect(200);
    const item = res.body.items.find((i: { id: number }) => i.id === id);
    expect(item).toMatchObject({ state: 'done', zipSha256: recordOf(id).zipSha256, zipSize: zip.length, createdBy: { name: expect.any(String) } });
    expect(item.plans).toHaveLength(3);
  });

  it('fetches the record again byte for byte, after the station was renamed, the site moved and the survey changed', async () => {
    const recept = stationIdOf(t, 'RECEPT');
    t.ctx.db.update(station).set({ name: 'FRONTDSK', location: 'Front desk' }).where(eq(station.id, recept)).run();
    t.ctx.db.update(site).set({ address: 'Moved to 9 Quay Street' }).where(eq(site.id, siteId)).run();
    const rec = recordOf(id);
    const surveyThen = surveyReportForSite(t.ctx, siteId, { generatedAt: reportStamp(new Date(rec.generatedAt)) })!;
    t.ctx.db.update(surveyJack).set({ room: 'Moved to the loft' }).where(eq(surveyJack.siteId, siteId)).run();
    const surveyNow = surveyReportForSite(t.ctx, siteId, { generatedAt: reportStamp(new Date(rec.generatedAt)) })!;
    expect(Buffer.from(surveyNow).equals(Buffer.from(surveyThen))).toBe(false);
    const again = await getZip(id);
    expect(again.status).toBe(200);
    expect(again.headers['x-bundle-sha256']).toBe(recordOf(id).zipSha256);
    expect(Buffer.compare(again.body, zip)).toBe(0);
    t.ctx.db.update(station).set({ name: 'RECEPT', location: 'Reception' }).where(eq(station.id, recept)).run();
    expect(recordOf(id).state).toBe('done');
    expect(bundleMails()).toHaveLength(1);
    expect(t.ctx.db.select().from(auditEvent).where(eq(auditEvent.action, 'bundle.refetch')).all()).toHaveLength(1);
  });

  it('refuses with 409 and sends nothing when the rebuilt bytes would not match the record', async () => {
    const recorded = recordOf(id).zipSha256!;
    t.ctx.db.update(bundleRecord).set({ zipSha256: 'f'.repeat(64) }).where(eq(bundleRecord.id, id)).run();
    const res = await admin.get(`/api/bundles/${id}/zip`);
    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error).toMatchObject({ code: 'hash_mismatch', message: expect.stringContaining('cannot be fetched again byte for byte') });
    expect(res.body.error.message).toContain(recorded.slice(0, 12));
    t.ctx.db.update(bundleRecord).set({ zipSha256: recorded }).where(eq(bundleRecord.id, id)).run();
  });
});

describe('a plan that moves between start and stream', () => {
  it('fails the record with 409 and releases nothing', async () => {
    const p = await approved('INTERN');
    const created = await admin.post('/api/bundles').send({ siteId, stationIds: [stationIdOf(t, 'INTERN')] }).expect(201);
    const id = created.body.record.id;
    replaceAutoexec(t, stationIdOf(t, 'INTERN'), '@ECHO OFF\r\nPATH C:\\DOS\r\n', userIdOf(t, DEMO.technician));
    const res = await admin.get(`/api/bundles/${id}/zip`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('plans_changed');
    expect(recordOf(id)).toMatchObject({ state: 'failed', zipSha256: null, failure: expect.stringContaining('INTERN') });
    expect((await getPlan(admin, p.plan.id)).plan.state).toBe('approved');
    const again = await admin.get(`/api/bundles/${id}/zip`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('bundle_failed');
    const listed = (await admin.get(`/api/bundles?siteId=${siteId}`)).body.items.find((i: { id: number }) => i.id === id);
    expect(listed).toMatchObject({ state: 'failed', failure: expect.stringContaining('changed since the bundle was started') });
  });
});

describe('the leads’ mail', () => {
  it('goes to active leads only', async () => {
    expect((await admin.post(`/api/people/${userIdOf(t, DEMO.lead2)}/deactivate`).send({})).status).toBe(200);
    await approved('MODELS');
    const created = await admin.post('/api/bundles').send({ siteId, stationIds: [stationIdOf(t, 'MODELS')] }).expect(201);
    const before = bundleMails().length;
    expect((await getZip(created.body.record.id)).status).toBe(200);
    await until(() => bundleMails().length > before);
    const newest = bundleMails()[0]; // the fake lists newest first
    expect(newest.to).toEqual([DEMO.lead]);
    expect(newest.text).toContain('1 PC: MODELS');
  });
});

describe('the download’s file name', () => {
  it('is 8.3-valid for any site name and record number', () => {
    expect(bundleFileName('Halvorsen & Pike Architects', 7)).toBe('HALV0007.ZIP');
    expect(bundleFileName('Ærø Tegnestue', 12)).toBe('RTEG0012.ZIP');
    expect(bundleFileName('  & ', 3)).toBe('BNDL0003.ZIP');
    expect(bundleFileName('CON', 1)).toBe('CON0001.ZIP');
    expect(bundleFileName('Büro Weiß', 123456)).toBe('BU123456.ZIP');
    for (const [name, id] of [['a.b/c\\d', 1], ['LPT1', 99], ['日本', 5], ['x'.repeat(300), 1_000_000]] as const) {
      const file = bundleFileName(name, id);
      const base = file.slice(0, -4);
      expect([file, NAME_83.test(file) && !DEVICE.test(base)]).toEqual([file, true]);
    }
  });
});
