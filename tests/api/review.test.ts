// The lead's review: the queue, approval pinned to the plan hash and the station's inputs, self-approval
// refused, two leads at once, comments on lines.
import type request from 'supertest';
import { currentApprovedPlans, planIsCurrent } from '@/server/plans/current';
import { createPlanService } from '@/server/plans/service';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { createPlan, currentAutoexec, editProfile, getPlan, replaceAutoexec, stationIdOf, submitPlan, userIdOf, type PlanBody } from '../support/plan-helpers';

let t: TestApp;
let tech: request.Agent;
let lead: request.Agent;
let lead2: request.Agent;
beforeAll(async () => {
  t = await makeTestApp();
  tech = await t.signIn(DEMO.technician);
  lead = await t.signIn(DEMO.lead);
  lead2 = await t.signIn(DEMO.lead2);
});
afterAll(async () => {
  await t.close();
});

async function inReview(name: string): Promise<PlanBody> {
  const p = await createPlan(tech, stationIdOf(t, name));
  const res = await submitPlan(tech, p);
  expect(res.status).toBe(200);
  return res.body;
}

const approve = (agent: request.Agent, p: PlanBody) => agent.post(`/api/plans/${p.plan.id}/approve`).send({ version: p.plan.version, planHash: p.plan.planHash });

describe('queue', () => {
  it('lists plans in review, oldest first, filterable by site, with counts per site', async () => {
    const a = await inReview('RECEPT');
    const b = await inReview('STUDIO');
    const res = await lead.get('/api/review/queue');
    expect(res.status).toBe(200);
    const ids = res.body.items.map((i: { id: number }) => i.id);
    expect(ids.indexOf(a.plan.id)).toBeLessThan(ids.indexOf(b.plan.id));
    const siteId = res.body.items[0].siteId;
    expect(res.body.sites).toEqual([expect.objectContaining({ id: siteId, name: 'Halvorsen & Pike Architects', waiting: ids.length })]);
    expect((await lead.get(`/api/review/queue?siteId=${siteId}`)).body.items).toHaveLength(ids.length);
    expect((await lead.get('/api/review/queue?siteId=9999')).body.items).toHaveLength(0);
    expect((await (await t.signIn(DEMO.admin)).get('/api/review/queue')).status).toBe(200);
  });
});

describe('approval', () => {
  it('records the hashes it saw and makes the plan bundleable', async () => {
    const p = await inReview('LIBRARY');
    const res = await approve(lead, p);
    expect(res.status).toBe(200);
    expect(res.body.plan).toMatchObject({ state: 'approved', approvedHash: p.plan.planHash, stale: false, decidedByUser: { name: 'Malik Osei' } });
    expect(planIsCurrent(t.ctx, p.plan.id)).toBe(true);
    const siteId = createPlanService(t.ctx).siteOf({ stationId: stationIdOf(t, 'LIBRARY') });
    expect(currentApprovedPlans(t.ctx, siteId).map((x) => x.planId)).toContain(p.plan.id);
  });

  it('refuses a plan hash other than the plan’s', async () => {
    const p = await inReview('DRAFT1');
    const res = await lead.post(`/api/plans/${p.plan.id}/approve`).send({ version: p.plan.version, planHash: '0'.repeat(64) });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('hash_mismatch');
  });

  it('refuses self-approval: a technician who became a lead cannot approve their own plan', async () => {
    const admin = await t.signIn(DEMO.admin);
    const tech2 = await t.signIn(DEMO.technician2);
    const p = await createPlan(tech2, stationIdOf(t, 'ARCHIVE'));
    const sent = (await submitPlan(tech2, p)).body as PlanBody;
    const tech2Id = userIdOf(t, DEMO.technician2);
    expect((await admin.patch(`/api/people/${tech2Id}/role`).send({ role: 'lead' })).status).toBe(200);
    const asLead = await t.signIn(DEMO.technician2);
    const view = await getPlan(asLead, sent.plan.id);
    expect(view.allowed.approve).toEqual({ ok: false, why: 'Nobody approves a plan they made.' });
    const res = await approve(asLead, sent);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/Nobody approves a plan they made/);
    expect((await getPlan(lead, sent.plan.id)).plan.state).toBe('in_review');
    expect((await approve(lead, sent)).status).toBe(200);
    await admin.patch(`/api/people/${tech2Id}/role`).send({ role: 'technician' });
  });

  it('goes stale when the AUTOEXEC.BAT is replaced after approval, and is then not bundleable', async () => {
    const id = stationIdOf(t, 'MODELS');
    const p = await createPlan(tech, id);
    const key = p.missingReasons[0]!;
    const sent = (await submitPlan(tech, p, { [key]: 'The CAD program is only run after hours.' })).body as PlanBody;
    const approved = (await approve(lead, sent)).body as PlanBody;
    expect(approved.plan.stale).toBe(false);
    replaceAutoexec(t, id, currentAutoexec(t, id) + 'ECHO Model shop ready\r\n', userIdOf(t, DEMO.technician));
    const view = await getPlan(lead, p.plan.id);
    expect(view.plan).toMatchObject({ state: 'approved', stale: true, changedInputs: ['AUTOEXEC.BAT'] });
    expect(planIsCurrent(t.ctx, p.plan.id)).toBe(false);
    const siteId = createPlanService(t.ctx).siteOf({ stationId: id });
    expect(currentApprovedPlans(t.ctx, siteId).map((x) => x.planId)).not.toContain(p.plan.id);
    const admin = { id: userIdOf(t, DEMO.admin), email: DEMO.admin, name: 'Rosa', role: 'admin' as const };
    expect(() => createPlanService(t.ctx).release(admin, [p.plan.id])).toThrow(/changed since this revision/);
  });

  it('stays current when the same bytes are recorded again, and goes stale on a profile or kit change', async () => {
    const id = stationIdOf(t, 'DRAFT2');
    const sent = await inReview('DRAFT2');
    await approve(lead, sent);
    replaceAutoexec(t, id, currentAutoexec(t, id), userIdOf(t, DEMO.technician));
    expect(planIsCurrent(t.ctx, sent.plan.id)).toBe(true);
    editProfile(t, id, { memory: { freeKB: 601, mainProgramKB: 500 } });
    expect((await getPlan(lead, sent.plan.id)).plan.changedInputs).toEqual(['profile']);
    // The kit is shared: a changed option makes every plan that uses it stale.
    const other = await inReview('RECEPT');
    await approve(lead, other);
    t.ctx.db.$client.prepare("update kit set program_args = '/Q /B'").run();
    expect((await getPlan(lead, other.plan.id)).plan.changedInputs).toEqual(expect.arrayContaining(['kit']));
    t.ctx.db.$client.prepare("update kit set program_args = '/Q'").run();
    expect(planIsCurrent(t.ctx, other.plan.id)).toBe(true);
  });

  it('refuses to approve a plan in review whose station changed', async () => {
    const id = stationIdOf(t, 'STUDIO');
    const sent = await inReview('STUDIO');
    replaceAutoexec(t, id, currentAutoexec(t, id).replace('PROMPT $P$G', 'PROMPT $N$G'), userIdOf(t, DEMO.technician));
    const res = await approve(lead, sent);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('stale');
  });
});

describe('two leads at once', () => {
  it('lets one approval win; the other gets 409 and the fresh view shows the winner', async () => {
    const sent = await inReview('PRINCIPL');
    const [a, b] = await Promise.all([approve(lead, sent), approve(lead2, sent)]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const loser = a.status === 409 ? a : b;
    expect(['version_conflict', 'wrong_state']).toContain(loser.body.error.code);
    const fresh = await getPlan(lead2, sent.plan.id);
    expect(fresh.plan.state).toBe('approved');
    expect(fresh.plan.version).toBe(sent.plan.version + 1);
  });

  it('refuses a return made on the version another lead already decided', async () => {
    const p = await createPlan(tech, stationIdOf(t, 'ACCOUNTS'));
    const sent = (await submitPlan(tech, p, { [p.missingReasons[0]!]: 'The old redirection becomes a REM line.' })).body as PlanBody;
    expect((await approve(lead, sent)).status).toBe(200);
    const late = await lead2.post(`/api/plans/${sent.plan.id}/return`).send({ version: sent.plan.version, comment: 'Use COM2.' });
    expect(late.status).toBe(409);
    expect((await getPlan(lead2, sent.plan.id)).plan.state).toBe('approved');
  });

  it('refuses a decision on a version that changed between reading and writing', async () => {
    const sent = await inReview('INTERN');
    // Another write landed after this lead read the plan (same state, newer version).
    t.ctx.db.$client.prepare('update plan_revision set version = version + 1 where id = ?').run(sent.plan.id);
    const res = await approve(lead, sent);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('version_conflict');
    const fresh = await getPlan(lead, sent.plan.id);
    expect(fresh.plan.state).toBe('in_review');
    expect((await approve(lead, fresh)).status).toBe(200);
  });
});

describe('returning and comments', () => {
  it('returns with a comment, keeps line comments, and a new revision supersedes it', async () => {
    const sent = await inReview('RECEPT');
    const c = await lead.post(`/api/plans/${sent.plan.id}/comments`).send({ file: 'AUTOEXEC.BAT', line: 4, body: 'Load the resident program after MODE?' });
    expect(c.status).toBe(201);
    expect(c.body).toMatchObject({ file: 'AUTOEXEC.BAT', line: 4 });
    expect((await lead.post(`/api/plans/${sent.plan.id}/comments`).send({ line: 4, body: 'no file' })).status).toBe(400);
    expect((await lead.post(`/api/plans/${sent.plan.id}/comments`).send({ body: '' })).status).toBe(400);
    expect((await lead.post(`/api/plans/${sent.plan.id}/return`).send({ version: sent.plan.version, comment: ' ' })).status).toBe(400);
    const ret = await lead.post(`/api/plans/${sent.plan.id}/return`).send({ version: sent.plan.version, comment: 'Please confirm the final program.' });
    expect(ret.status).toBe(200);
    expect(ret.body.plan).toMatchObject({ state: 'returned', decisionComment: 'Please confirm the final program.' });
    expect(ret.body.comments).toEqual([expect.objectContaining({ line: 4, file: 'AUTOEXEC.BAT', authorName: 'Malik Osei' })]);
    const next = await createPlan(tech, stationIdOf(t, 'RECEPT'));
    expect(next.plan.revision).toBe(sent.plan.revision + 1);
    expect((await getPlan(lead, sent.plan.id)).plan.state).toBe('superseded');
    expect((await lead.post(`/api/plans/${sent.plan.id}/comments`).send({ body: 'late' })).status).toBe(409);
    const user = await t.signIn(DEMO.user);
    expect((await user.post(`/api/plans/${next.plan.id}/comments`).send({ body: 'hi' })).status).toBe(403);
  });
});
