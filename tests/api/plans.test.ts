// Plan revisions: making one from the station's inputs, superseding, reasons for warnings, an error check
// blocking review, and the state machine: every move from every state by every role.
import { eq } from 'drizzle-orm';
import type request from 'supertest';
import { checkKey } from '@/db/requests/plans';
import { planRevision } from '@/db/plans';
import { createPlanService } from '@/server/plans/service';
import { loadPlanInput } from '@/server/stations/plan-input';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { createPlan, editProfile, forceState, getPlan, stationIdOf, submitPlan, userIdOf } from '../support/plan-helpers';

let t: TestApp;
const agents: Record<'admin' | 'lead' | 'technician' | 'user', request.Agent> = {} as never;
beforeAll(async () => {
  t = await makeTestApp();
  agents.admin = await t.signIn(DEMO.admin);
  agents.lead = await t.signIn(DEMO.lead);
  agents.technician = await t.signIn(DEMO.technician);
  agents.user = await t.signIn(DEMO.user);
});
afterAll(async () => {
  await t.close();
});

describe('making a revision', () => {
  it('saves the engine result with the hash of every input and output', async () => {
    const id = stationIdOf(t, 'STUDIO');
    const body = await createPlan(agents.technician, id);
    const row = t.ctx.db.select().from(planRevision).where(eq(planRevision.id, body.plan.id)).get()!;
    const input = loadPlanInput(t.ctx, id);
    expect(row).toMatchObject({ state: 'draft', revision: 1, profileHash: input.hashes.profile, kitHash: input.hashes.kit, autoexecInHash: input.hashes.autoexecIn, configInHash: input.hashes.configIn });
    for (const h of [row.autoexecOutHash, row.configOutHash, row.planHash]) expect(h).toMatch(/^[0-9a-f]{64}$/);
    expect(row.autoexecOut.toString('latin1')).toContain('C:\\THREAD\\TLRES.COM /S:5 /Q');
    expect(body.plan.result.diff).toContain('+@MODE LPT1:=COM1:');
    expect(body.plan.stale).toBe(false);
  });

  it('hands out the patched bytes and records the download', async () => {
    const p = await createPlan(agents.technician, stationIdOf(t, 'ARCHIVE'));
    const row = t.ctx.db.select().from(planRevision).where(eq(planRevision.id, p.plan.id)).get()!;
    const res = await agents.lead.get(`/api/plans/${p.plan.id}/files/AUTOEXEC.BAT`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(Buffer.compare(res.body as Buffer, row.autoexecOut)).toBe(0);
    expect(res.headers['content-disposition']).toBe('attachment; filename="AUTOEXEC.BAT"');
    expect((await agents.user.get(`/api/plans/${p.plan.id}/files/AUTOEXEC.BAT`)).status).toBe(403);
    expect((await agents.lead.get(`/api/plans/${p.plan.id}/files/OTHER.SYS`)).status).toBe(400);
    const audit = t.ctx.audit.list({ action: 'plan.download', limit: 5, offset: 0 });
    expect(audit[0]).toMatchObject({ entityId: String(p.plan.id), actorEmail: DEMO.lead, details: { file: 'AUTOEXEC.BAT', sha256: row.autoexecOutHash } });
  });

  it('supersedes the older revisions of the station but not other stations', async () => {
    const id = stationIdOf(t, 'DRAFT2');
    const first = await createPlan(agents.technician, id);
    const other = await createPlan(agents.technician, stationIdOf(t, 'DRAFT1'));
    const second = await createPlan(agents.admin, id);
    expect(second.plan.revision).toBe(first.plan.revision + 1);
    expect((await getPlan(agents.lead, first.plan.id)).plan.state).toBe('superseded');
    expect((await getPlan(agents.lead, other.plan.id)).plan.state).toBe('draft');
  });

  it('refuses a lead, a user and a visitor; refuses a printer', async () => {
    const id = stationIdOf(t, 'STUDIO');
    expect((await agents.lead.post('/api/plans').send({ stationId: id })).status).toBe(403);
    expect((await agents.user.post('/api/plans').send({ stationId: id })).status).toBe(403);
    const printer = stationIdOf(t, 'HALLPRN');
    expect((await agents.technician.post('/api/plans').send({ stationId: printer })).status).toBe(400);
    expect((await agents.technician.post('/api/plans').send({ stationId: 99999 })).status).toBe(404);
    expect((await agents.technician.post('/api/plans').send({ stationId: 'x' })).status).toBe(400);
  });
});

describe('plans board', () => {
  it('lists every PC with its newest revision, filterable by site', async () => {
    const id = stationIdOf(t, 'LIBRARY');
    await createPlan(agents.technician, id);
    const newest = await createPlan(agents.technician, id);
    const res = await agents.lead.get('/api/plans/board');
    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(10);
    const row = res.body.items.find((i: { station: { name: string } }) => i.station.name === 'LIBRARY');
    expect(row.plan).toEqual({ id: newest.plan.id, revision: newest.plan.revision, state: 'draft', stale: false });
    expect(res.body.items.find((i: { station: { name: string } }) => i.station.name === 'HALLPRN')).toBeUndefined();
    const siteId = row.station.siteId;
    expect((await agents.technician.get(`/api/plans/board?siteId=${siteId}`)).body.items).toHaveLength(10);
    expect((await agents.technician.get('/api/plans/board?siteId=9999')).body.items).toHaveLength(0);
  });
});

describe('sending for review', () => {
  it('refuses warnings without a written reason, then accepts them with one', async () => {
    const p = await createPlan(agents.technician, stationIdOf(t, 'ACCOUNTS'));
    const warning = p.plan.result.checks.find((c) => c.severity === 'warning')!;
    expect(warning).toBeDefined();
    const key = checkKey(warning);
    expect(p.missingReasons).toEqual([key]);
    const none = await submitPlan(agents.technician, p);
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toEqual({ [`reasons.${key}`]: expect.any(String) });
    const blank = await submitPlan(agents.technician, p, { [key]: '   ' });
    expect(blank.status).toBe(400);
    const unknown = await submitPlan(agents.technician, p, { 'no-such|X|1': 'because' });
    expect(unknown.status).toBe(400);
    const ok = await submitPlan(agents.technician, p, { [key]: 'The old MODE LPT1 line is turned into a REM; the office agreed.' });
    expect(ok.status).toBe(200);
    expect(ok.body.plan.state).toBe('in_review');
    expect(ok.body.plan.warningReasons[key]).toMatch(/office agreed/);
  });

  it('keeps reasons saved on a draft and needs the version it read', async () => {
    const p = await createPlan(agents.technician, stationIdOf(t, 'MODELS'));
    const key = checkKey(p.plan.result.checks.find((c) => c.severity === 'warning')!);
    const saved = await agents.technician.put(`/api/plans/${p.plan.id}/reasons`).send({ version: p.plan.version, reasons: { [key]: 'Model shop runs the CAD program only after hours.' } });
    expect(saved.status).toBe(200);
    expect(saved.body.missingReasons).toEqual([]);
    const old = await agents.technician.put(`/api/plans/${p.plan.id}/reasons`).send({ version: p.plan.version, reasons: { [key]: 'again' } });
    expect(old.status).toBe(409);
    expect((await submitPlan(agents.technician, saved.body)).status).toBe(200);
  });

  it('blocks a plan with an error check', async () => {
    const id = stationIdOf(t, 'INTERN');
    editProfile(t, id, { dos: '2.11' }); // below the kit's minimum DOS 3.30
    const p = await createPlan(agents.technician, id);
    expect(p.plan.result.checks.some((c) => c.severity === 'error')).toBe(true);
    expect(p.allowed.submit.ok).toBe(false);
    const res = await submitPlan(agents.technician, p);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('has_errors');
    expect((await getPlan(agents.lead, p.plan.id)).plan.state).toBe('draft');
    editProfile(t, id, { dos: '5.0' });
  });

  it('refuses to send a draft whose station changed since it was made', async () => {
    const id = stationIdOf(t, 'PRINCIPL');
    const p = await createPlan(agents.technician, id);
    editProfile(t, id, { memory: { freeKB: 600 } });
    const res = await submitPlan(agents.technician, p);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('stale');
  });
});

// The state machine over HTTP. For each state, action and role a fresh plan is put in that state and the
// move is tried once: 200 when allowed, 403 for a role that never may, 409 for the right role in the wrong state.
const STATES = ['draft', 'in_review', 'approved', 'returned', 'released', 'superseded'] as const;
const ROLES = ['admin', 'lead', 'technician', 'user'] as const;
const ACTIONS = {
  submit: { path: 'submit', roles: ['admin', 'technician'], from: 'draft', to: 'in_review' },
  approve: { path: 'approve', roles: ['lead'], from: 'in_review', to: 'approved' },
  return: { path: 'return', roles: ['lead'], from: 'in_review', to: 'returned' },
} as const;

describe('state machine over HTTP', () => {
  const cases = STATES.flatMap((state) => ROLES.flatMap((role) => (Object.keys(ACTIONS) as Array<keyof typeof ACTIONS>).map((action) => [state, role, action] as const)));

  it.each(cases)('%s plan, %s tries %s', async (state, role, action) => {
    const a = ACTIONS[action];
    const p = await createPlan(agents.technician, stationIdOf(t, 'RECEPT'));
    const row = forceState(t, p.plan.id, state, userIdOf(t, DEMO.technician));
    const body = action === 'submit' ? { version: row.version } : action === 'approve' ? { version: row.version, planHash: row.planHash } : { version: row.version, comment: 'Please use CALL.' };
    const res = await agents[role].post(`/api/plans/${p.plan.id}/${a.path}`).send(body);
    const roleOk = (a.roles as readonly string[]).includes(role);
    const expected = !roleOk ? 403 : state === a.from ? 200 : 409;
    expect(res.status).toBe(expected);
    const after = t.ctx.db.select().from(planRevision).where(eq(planRevision.id, p.plan.id)).get()!;
    expect(after.state).toBe(expected === 200 ? a.to : state);
    if (expected === 200) expect(after.version).toBe(row.version + 1);
  });

  it('lets only technicians and admins edit reasons, and only on a draft', async () => {
    for (const state of STATES) {
      for (const role of ROLES) {
        const p = await createPlan(agents.technician, stationIdOf(t, 'RECEPT'));
        const row = forceState(t, p.plan.id, state);
        const res = await agents[role].put(`/api/plans/${p.plan.id}/reasons`).send({ version: row.version, reasons: {} });
        const expected = role === 'lead' || role === 'user' ? 403 : state === 'draft' ? 200 : 409;
        expect([state, role, res.status]).toEqual([state, role, expected]);
      }
    }
  });

  it('releases only approved, current plans, and only for an admin', async () => {
    const plans = createPlanService(t.ctx);
    const users = { admin: userIdOf(t, DEMO.admin), lead: userIdOf(t, DEMO.lead), technician: userIdOf(t, DEMO.technician), user: userIdOf(t, DEMO.user) };
    for (const state of STATES) {
      for (const role of ROLES) {
        const p = await createPlan(agents.technician, stationIdOf(t, 'RECEPT'));
        forceState(t, p.plan.id, state);
        const actor = { id: users[role], email: `${role}@x`, name: role, role };
        let status = 200;
        try {
          plans.release(actor, [p.plan.id]);
        } catch (e) {
          status = (e as { status: number }).status;
        }
        const expected = role !== 'admin' ? 403 : state === 'approved' ? 200 : 409;
        expect([state, role, status]).toEqual([state, role, expected]);
      }
    }
  });

  it('answers a user and a visitor on every plan route without showing the plan', async () => {
    const p = await createPlan(agents.technician, stationIdOf(t, 'RECEPT'));
    for (const path of [`/api/plans/${p.plan.id}`, '/api/plans', '/api/plans/board', '/api/review/queue']) {
      expect((await agents.user.get(path)).status).toBe(403);
    }
    expect((await agents.technician.get('/api/review/queue')).status).toBe(403);
  });
});
