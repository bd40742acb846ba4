// The audit trail: every step of the plan loop and every role change is written with who, what, which ids
// and hashes; admins read it with filters; nothing can edit or delete it, not even SQL.
import type request from 'supertest';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { createPlan, stationIdOf, submitPlan, userIdOf } from '../support/plan-helpers';

let t: TestApp;
let admin: request.Agent;
beforeAll(async () => {
  t = await makeTestApp();
  admin = await t.signIn(DEMO.admin);
});
afterAll(async () => {
  await t.close();
});

type Event = { action: string; entity: string; entityId: string | null; actorEmail: string | null; siteId: number | null; details: Record<string, unknown> };
const list = async (q: string) => (await admin.get(`/api/audit?${q}`)).body.items as Event[];

describe('what is recorded', () => {
  it('records each plan step with its actor, site and hashes, and role changes', async () => {
    const tech = await t.signIn(DEMO.technician);
    const lead = await t.signIn(DEMO.lead);
    const p = await createPlan(tech, stationIdOf(t, 'RECEPT'));
    const s = (await submitPlan(tech, p)).body;
    await lead.post(`/api/plans/${p.plan.id}/comments`).send({ file: 'AUTOEXEC.BAT', line: 5, body: 'Fine.' });
    await lead.post(`/api/plans/${p.plan.id}/approve`).send({ version: s.plan.version, planHash: s.plan.planHash });
    const events = await list(`entity=plan`);
    const mine = events.filter((e) => e.entityId === String(p.plan.id)).reverse();
    expect(mine.map((e) => [e.action, e.actorEmail])).toEqual([
      ['plan.create', DEMO.technician],
      ['plan.submit', DEMO.technician],
      ['plan.comment', DEMO.lead],
      ['plan.approve', DEMO.lead],
    ]);
    expect(mine.every((e) => typeof e.siteId === 'number')).toBe(true);
    expect(mine[0]!.details).toMatchObject({ planHash: p.plan.planHash, profileHash: expect.stringMatching(/^[0-9a-f]{64}$/), autoexecInHash: expect.any(String), autoexecOutHash: expect.any(String) });
    expect(mine[3]!.details).toMatchObject({ planHash: p.plan.planHash, approvedHash: p.plan.planHash });

    await admin.patch(`/api/people/${userIdOf(t, DEMO.technician2)}/role`).send({ role: 'lead' });
    const roles = await list('action=role.change');
    expect(roles[0]).toMatchObject({ entity: 'user', entityId: userIdOf(t, DEMO.technician2), actorEmail: DEMO.admin, details: { from: 'technician', to: 'lead' } });
  });

  it('filters by action, actor and site, and is for admins only', async () => {
    const approvals = await list('action=plan.approve');
    expect(approvals.length).toBeGreaterThan(0);
    expect(approvals.every((e) => e.action === 'plan.approve')).toBe(true);
    const byLead = await list(`actorId=${userIdOf(t, DEMO.lead)}`);
    expect(byLead.every((e) => e.actorEmail === DEMO.lead)).toBe(true);
    const siteId = approvals[0]!.siteId!;
    expect((await list(`siteId=${siteId}`)).every((e) => e.siteId === siteId)).toBe(true);
    expect(await list('siteId=9999')).toEqual([]);
    for (const who of [DEMO.lead, DEMO.technician, DEMO.user]) expect((await (await t.signIn(who)).get('/api/audit')).status).toBe(403);
  });
});

describe('append-only', () => {
  it('has no API route that changes or removes an event', async () => {
    for (const method of ['put', 'patch', 'delete'] as const) {
      expect((await admin[method]('/api/audit').send({})).status).toBe(404);
      expect((await admin[method]('/api/audit/1').send({})).status).toBe(404);
    }
  });

  it('refuses SQL UPDATE and DELETE on audit_event', () => {
    const sqlite = t.ctx.db.$client;
    const n = (sqlite.prepare('select count(*) as n from audit_event').get() as { n: number }).n;
    expect(n).toBeGreaterThan(0);
    expect(() => sqlite.prepare("update audit_event set action = 'forged'").run()).toThrow(/append-only/);
    expect(() => sqlite.prepare('delete from audit_event').run()).toThrow(/append-only/);
    expect(() => sqlite.prepare('delete from audit_event where id = 1').run()).toThrow(/append-only/);
    expect((sqlite.prepare('select count(*) as n from audit_event').get() as { n: number }).n).toBe(n);
    expect((sqlite.prepare("select count(*) as n from audit_event where action = 'forged'").get() as { n: number }).n).toBe(0);
  });
});
