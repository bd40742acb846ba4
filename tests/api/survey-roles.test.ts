// Survey API per role: every route answers 401 without a session and 403 to an office user; a lead reads
// but may not write; a technician and an admin go through every write route; unknown or foreign ids 404.
import request from 'supertest';
import { auditEvent } from '@/db/schema';
import { eq } from 'drizzle-orm';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { addEmptySite, byRef, demoSiteId, getView } from '../support/survey';

let t: TestApp;
let agents: Record<'admin' | 'lead' | 'technician' | 'user', request.Agent>;
let siteId: number;
let otherSiteId: number;

beforeAll(async () => {
  t = await makeTestApp();
  agents = {
    admin: await t.signIn(DEMO.admin),
    lead: await t.signIn(DEMO.lead),
    technician: await t.signIn(DEMO.technician),
    user: await t.signIn(DEMO.user),
  };
  siteId = await demoSiteId(agents.admin);
  otherSiteId = addEmptySite(t);
});
afterAll(async () => {
  await t.close();
});

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';
type Route = { method: Method; path: (s: number) => string; body?: object; write: boolean };

// Ids in these paths need not exist: the role check answers before any lookup.
const ROUTES: Route[] = [
  { method: 'get', path: () => '/api/survey/sites', write: false },
  { method: 'get', path: (s) => `/api/sites/${s}/survey`, write: false },
  { method: 'get', path: (s) => `/api/sites/${s}/survey/report.txt`, write: false },
  { method: 'put', path: (s) => `/api/sites/${s}/survey/settings`, body: { version: 1 }, write: true },
  { method: 'post', path: (s) => `/api/sites/${s}/survey/jacks`, body: { label: 'J-99' }, write: true },
  { method: 'patch', path: (s) => `/api/sites/${s}/survey/jacks/1`, body: { version: 1 }, write: true },
  { method: 'delete', path: (s) => `/api/sites/${s}/survey/jacks/1?version=1`, write: true },
  { method: 'post', path: (s) => `/api/sites/${s}/survey/jacks/1/readings`, body: { pair: '2', vdc: '0' }, write: true },
  { method: 'patch', path: (s) => `/api/sites/${s}/survey/readings/1`, body: { pair: '2', vdc: '0', version: 1 }, write: true },
  { method: 'delete', path: (s) => `/api/sites/${s}/survey/readings/1?version=1`, write: true },
  { method: 'post', path: (s) => `/api/sites/${s}/survey/nodes`, body: { kind: 'splitter', label: 'S' }, write: true },
  { method: 'patch', path: (s) => `/api/sites/${s}/survey/nodes/1`, body: { version: 1 }, write: true },
  { method: 'delete', path: (s) => `/api/sites/${s}/survey/nodes/1?version=1`, write: true },
  { method: 'post', path: (s) => `/api/sites/${s}/survey/runs`, body: { fromNodeId: 1, toNodeId: 2, lengthFt: 10, gauge: 22, reverses: false }, write: true },
  { method: 'patch', path: (s) => `/api/sites/${s}/survey/runs/1`, body: { version: 1 }, write: true },
  { method: 'delete', path: (s) => `/api/sites/${s}/survey/runs/1?version=1`, write: true },
  { method: 'post', path: (s) => `/api/sites/${s}/survey/terminators`, body: { nodeId: 1, ohms: 150 }, write: true },
  { method: 'patch', path: (s) => `/api/sites/${s}/survey/terminators/1`, body: { version: 1 }, write: true },
  { method: 'delete', path: (s) => `/api/sites/${s}/survey/terminators/1?version=1`, write: true },
];

function call(agent: request.Agent | request.SuperTest<request.Test>, r: Route, s: number) {
  const req = agent[r.method](r.path(s));
  return r.body ? req.send(r.body) : req;
}

describe.each(ROUTES.map((r) => ({ ...r, name: `${r.method.toUpperCase()} ${r.path(0).replace('/sites/0/', '/sites/:site/')}` })))('$name', (r) => {
  it('answers 401 without a session', async () => {
    const res = await call(request(t.app) as never, r, siteId);
    expect(res.status).toBe(401);
  });

  it('answers 403 to an office user', async () => {
    const res = await call(agents.user, r, siteId);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it(r.write ? 'answers 403 to a lead' : 'lets a lead read', async () => {
    const res = await call(agents.lead, r, siteId);
    expect(res.status).toBe(r.write ? 403 : 200);
  });

  if (r.path(1).includes('/sites/')) {
    it('answers 404 for an unknown site', async () => {
      const res = await call(agents.technician, r, 987654);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    });
  }
});

describe.each(['technician', 'admin'] as const)('%s goes through every write route', (role) => {
  it('creates, updates and deletes each kind of row, each write audited', async () => {
    const a = agents[role];
    const p = `/api/sites/${siteId}/survey`;
    const auditBefore = t.ctx.db.select().from(auditEvent).where(eq(auditEvent.siteId, siteId)).all().length;

    const jack = await a.post(`${p}/jacks`).send({ label: `J-${role}`, room: 'Store room', station: 'SPARE' });
    expect(jack.status).toBe(201);
    expect(jack.body).toMatchObject({ label: `J-${role}`, room: 'Store room', station: 'SPARE', version: 1 });
    expect((await a.patch(`${p}/jacks/${jack.body.id}`).send({ room: 'Store', version: 1 })).body).toMatchObject({ room: 'Store', version: 2 });

    const reading = await a.post(`${p}/jacks/${jack.body.id}/readings`).send({ pair: '3 (white/blue)', vdc: '0.05', vac: '0.2', continuity: 'good' });
    expect(reading.status).toBe(201);
    const fixed = await a.patch(`${p}/readings/${reading.body.id}`).send({ pair: '3 (white/blue)', vdc: '0.04', vac: '0.2', continuity: 'good', version: 1 });
    expect(fixed.status).toBe(200);
    expect((await a.delete(`${p}/readings/${reading.body.id}?version=2`)).status).toBe(200);

    const jackNode = await a.post(`${p}/nodes`).send({ kind: 'jack', label: `Jack ${role}`, jackId: jack.body.id });
    expect(jackNode.status).toBe(201);
    const adapter = await a.post(`${p}/nodes`).send({ kind: 'adapter', label: `Adapter ${role}` });
    expect(adapter.status).toBe(201);
    expect((await a.patch(`${p}/nodes/${adapter.body.id}`).send({ label: 'Adapter SPARE', version: 1 })).status).toBe(200);

    const run = await a.post(`${p}/runs`).send({ fromNodeId: jackNode.body.id, toNodeId: adapter.body.id, lengthFt: 7, gauge: 26, reverses: true });
    expect(run.status).toBe(201);
    expect(run.body.ref).toMatch(/^c-\d+$/); // touches an adapter: a cord
    expect((await a.patch(`${p}/runs/${run.body.id}`).send({ lengthFt: 9, version: 1 })).body).toMatchObject({ lengthFt: 9, version: 2 });

    const term = await a.post(`${p}/terminators`).send({ nodeId: adapter.body.id, ohms: 150 });
    expect(term.status).toBe(201);
    expect((await a.patch(`${p}/terminators/${term.body.id}`).send({ ohms: '150', version: 1 })).status).toBe(200);
    expect((await a.delete(`${p}/terminators/${term.body.id}?version=2`)).status).toBe(200);

    const view = await getView(a, siteId);
    expect((await a.put(`${p}/settings`).send({ networkPair: '2 (black/yellow)', version: view.settings.version })).status).toBe(200);

    expect((await a.delete(`${p}/runs/${run.body.id}?version=2`)).status).toBe(200);
    expect((await a.delete(`${p}/nodes/${adapter.body.id}?version=2`)).status).toBe(200);
    expect((await a.delete(`${p}/nodes/${jackNode.body.id}?version=1`)).status).toBe(200);
    expect((await a.delete(`${p}/jacks/${jack.body.id}?version=2`)).status).toBe(200);

    const events = t.ctx.db.select().from(auditEvent).where(eq(auditEvent.siteId, siteId)).all().slice(auditBefore);
    expect(events.map((e) => e.action)).toEqual([
      'survey.jack.create', 'survey.jack.update',
      'survey.reading.create', 'survey.reading.update', 'survey.reading.delete',
      'survey.node.create', 'survey.node.create', 'survey.node.update',
      'survey.run.create', 'survey.run.update',
      'survey.terminator.create', 'survey.terminator.update', 'survey.terminator.delete',
      'survey.settings.update',
      'survey.run.delete', 'survey.node.delete', 'survey.node.delete', 'survey.jack.delete',
    ]);
    expect(events.every((e) => e.actorEmail === DEMO[role])).toBe(true);
  });
});

describe('ids that are unknown or belong to another site', () => {
  it('answers 404 for an unknown row and for the demo site row asked for through another site', async () => {
    const a = agents.technician;
    const view = await getView(a, siteId);
    const jack = byRef(view.jacks, 'j-09');
    const run = byRef(view.runs, 'r-09');
    const node = byRef(view.nodes, 'b-1');
    const reading = view.readings[0];
    const other = `/api/sites/${otherSiteId}/survey`;
    const own = `/api/sites/${siteId}/survey`;
    const cases: Array<[string, request.Test]> = [
      ['unknown jack', a.patch(`${own}/jacks/999999`).send({ label: 'x', version: 1 })],
      ['unknown reading', a.delete(`${own}/readings/999999?version=1`)],
      ['unknown run', a.patch(`${own}/runs/999999`).send({ lengthFt: 1, version: 1 })],
      ['unknown terminator', a.delete(`${own}/terminators/999999?version=1`)],
      ['readings at an unknown jack', a.post(`${own}/jacks/999999/readings`).send({ pair: '2', vdc: '0' })],
      ['jack through another site', a.patch(`${other}/jacks/${jack.id}`).send({ label: 'x', version: jack.version })],
      ['run through another site', a.patch(`${other}/runs/${run.id}`).send({ lengthFt: 1, version: run.version })],
      ['node through another site', a.delete(`${other}/nodes/${node.id}?version=${node.version}`)],
      ['reading through another site', a.patch(`${other}/readings/${reading.id}`).send({ pair: '2', vdc: '0', version: reading.version })],
      ['readings at another site’s jack', a.post(`${other}/jacks/${jack.id}/readings`).send({ pair: '2', vdc: '0' })],
    ];
    for (const [what, pending] of cases) {
      const res = await pending;
      expect({ what, status: res.status, code: res.body.error?.code }).toEqual({ what, status: 404, code: 'not_found' });
    }
    // Nothing changed in the demo survey.
    expect(byRef((await getView(a, siteId)).runs, 'r-09')).toEqual(run);
  });

  it('refuses, with a field error, a run to a node of another site', async () => {
    const a = agents.technician;
    const foreign = await a.post(`/api/sites/${otherSiteId}/survey/nodes`).send({ kind: 'block', label: 'Other block' });
    expect(foreign.status).toBe(201);
    const view = await getView(a, siteId);
    const res = await a.post(`/api/sites/${siteId}/survey/runs`).send({
      fromNodeId: byRef(view.nodes, 'b-1').id, toNodeId: foreign.body.id, lengthFt: 50, gauge: 22, reverses: false,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('toNodeId');
  });
});
