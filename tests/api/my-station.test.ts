// The office user's checked edit: their own station only; pasted text becomes CR LF code page 437 bytes,
// an upload keeps its bytes; sending stores a new file revision and opens a draft plan.
import { and, count, eq } from 'drizzle-orm';
import type request from 'supertest';
import { auditEvent, startupFile } from '@/db/schema';
import { planRevision } from '@/db/plans';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { createPlan, getPlan, stationIdOf, submitPlan, userIdOf } from '../support/plan-helpers';

let t: TestApp;
let user: request.Agent;
let recept: number;
beforeAll(async () => {
  t = await makeTestApp();
  user = await t.signIn(DEMO.user);
  recept = stationIdOf(t, 'RECEPT');
});
afterAll(async () => {
  await t.close();
});

const PASTED = ['@ECHO OFF', 'PROMPT $P$G', 'PATH C:\\DOS;C:\\WP51', 'C:\\DOS\\MOUSE.COM', 'WP'].join('\n');
const fileRows = () => t.ctx.db.select({ n: count() }).from(startupFile).where(eq(startupFile.stationId, recept)).get()!.n;

describe('reading the own station', () => {
  it('shows the user their station, its files and no other', async () => {
    const res = await user.get('/api/my-station');
    expect(res.status).toBe(200);
    expect(res.body.station).toMatchObject({ id: recept, name: 'RECEPT' });
    expect(res.body.files.autoexec.text).toContain('@ECHO OFF');
    expect((await (await t.signIn(DEMO.technician)).get('/api/my-station')).status).toBe(403);
  });
});

describe('checked edit', () => {
  it('checks pasted text against the station profile and stores nothing', async () => {
    const before = fileRows();
    const res = await user.post(`/api/my-station/${recept}/check`).send({ autoexec: { encoding: 'text', data: PASTED } });
    expect(res.status).toBe(200);
    const r = res.body.result;
    expect(r.files.autoexec.beforeText).toBe(PASTED.replace(/\n/g, '\r\n'));
    expect(r.files.autoexec.diff).toContain('+@MODE LPT1:=COM1:');
    expect(r.boot.after.map((s: { program: string }) => s.program)).toEqual(expect.arrayContaining(['C:\\THREAD\\TLRES.COM', 'WP']));
    // The block goes before WP, the program that may never return.
    const after: Array<{ program: string }> = r.boot.after;
    expect(after.findIndex((s) => s.program === 'C:\\THREAD\\TLRES.COM')).toBeLessThan(after.findIndex((s) => s.program === 'WP'));
    expect(fileRows()).toBe(before);
  });

  it('refuses another station, other roles and empty or non-DOS text', async () => {
    const other = stationIdOf(t, 'DRAFT1');
    const body = { autoexec: { encoding: 'text', data: PASTED } };
    const a = await user.post(`/api/my-station/${other}/check`).send(body);
    const b = await user.post(`/api/my-station/${other}/send`).send(body);
    const c = await user.post('/api/my-station/99999/check').send(body);
    expect([a.status, b.status, c.status]).toEqual([404, 404, 404]);
    expect(a.body).toEqual(c.body);
    const tech = await t.signIn(DEMO.technician);
    expect((await tech.post(`/api/my-station/${recept}/check`).send(body)).status).toBe(403);
    expect((await user.post(`/api/my-station/${recept}/check`).send({ autoexec: { encoding: 'text', data: '  ' } })).status).toBe(400);
    const euro = await user.post(`/api/my-station/${recept}/check`).send({ autoexec: { encoding: 'text', data: 'ECHO 5 €' } });
    expect(euro.status).toBe(400);
    expect(euro.body.error.fields.autoexec).toMatch(/code page 437/);
    const binary = await user.post(`/api/my-station/${recept}/check`).send({ autoexec: { encoding: 'base64', data: Buffer.from([0x4d, 0x5a, 0, 1, 2]).toString('base64') } });
    expect(binary.status).toBe(400);
    expect(binary.body.error.fields.autoexec).toMatch(/not a text file/);
  });

  it('keeps uploaded bytes exactly, including box-drawing bytes and a final Ctrl-Z', async () => {
    const bytes = Buffer.concat([Buffer.from('@ECHO OFF\r\nREM \xb3 menu \xb3\r\nMENU\r\n', 'latin1'), Buffer.from([0x1a])]);
    const res = await user.post(`/api/my-station/${recept}/send`).send({ autoexec: { encoding: 'base64', data: bytes.toString('base64') } });
    expect(res.status).toBe(201);
    const rows = t.ctx.db.select().from(startupFile).where(and(eq(startupFile.stationId, recept), eq(startupFile.kind, 'AUTOEXEC.BAT'))).orderBy(startupFile.id).all();
    expect(Buffer.compare(rows.at(-1)!.content, bytes)).toBe(0);
  });
});

describe('sending to the technician', () => {
  it('stores a new file revision, opens a draft plan made by the user, and supersedes an approved plan', async () => {
    const tech = await t.signIn(DEMO.technician);
    const lead = await t.signIn(DEMO.lead);
    const p = await createPlan(tech, recept);
    const sent = (await submitPlan(tech, p)).body;
    expect((await lead.post(`/api/plans/${p.plan.id}/approve`).send({ version: sent.plan.version, planHash: sent.plan.planHash })).status).toBe(200);
    const before = fileRows();
    const res = await user.post(`/api/my-station/${recept}/send`).send({ autoexec: { encoding: 'text', data: PASTED }, config: { encoding: 'text', data: 'FILES=30\nBUFFERS=20\n' } });
    expect(res.status).toBe(201);
    expect(res.body.stored).toEqual(['AUTOEXEC.BAT', 'CONFIG.SYS']);
    expect(fileRows()).toBe(before + 2);
    const row = t.ctx.db.select().from(startupFile).where(eq(startupFile.stationId, recept)).orderBy(startupFile.id).all().at(-2)!;
    expect(row).toMatchObject({ kind: 'AUTOEXEC.BAT', source: 'user', uploadedBy: userIdOf(t, DEMO.user) });
    expect(row.content.toString('latin1')).toBe(PASTED.replace(/\n/g, '\r\n'));
    const plan = t.ctx.db.select().from(planRevision).where(eq(planRevision.id, res.body.planId)).get()!;
    expect(plan).toMatchObject({ state: 'draft', createdBy: userIdOf(t, DEMO.user), autoexecInHash: row.sha256 });
    const old = await getPlan(lead, p.plan.id);
    expect(old.plan.state).toBe('superseded');
    const audit = t.ctx.db.select().from(auditEvent).where(eq(auditEvent.action, 'file.user')).orderBy(auditEvent.id).all();
    expect(audit.at(-2)).toMatchObject({ actorEmail: DEMO.user, entity: 'startup_file', entityId: String(row.id), details: expect.objectContaining({ stationId: recept, sha256: row.sha256 }) });
    // The draft came from the user: a technician sends it, and a lead may approve it.
    const draft = await getPlan(tech, res.body.planId);
    const submitted = await submitPlan(tech, draft, Object.fromEntries(draft.missingReasons.map((k) => [k, 'Checked with Priya at the desk.'])));
    expect(submitted.status).toBe(200);
    expect((await lead.post(`/api/plans/${draft.plan.id}/approve`).send({ version: submitted.body.plan.version, planHash: draft.plan.planHash })).status).toBe(200);
  });

  it('does not store a file that is byte for byte the one on record', async () => {
    const current = (await user.get('/api/my-station')).body.files.autoexec.text as string;
    const before = fileRows();
    const res = await user.post(`/api/my-station/${recept}/send`).send({ autoexec: { encoding: 'base64', data: Buffer.from(current, 'latin1').toString('base64') } });
    expect(res.status).toBe(201);
    expect(res.body.stored).toEqual([]);
    expect(fileRows()).toBe(before);
  });
});
