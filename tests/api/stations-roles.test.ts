// Every route of sites, kits and stations, for every role: who may read, who may write, and that an office
// user reaching a station that is not theirs gets 404 with none of its data.
import type request from 'supertest';
import supertest from 'supertest';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
const agents: Record<string, request.Agent> = {};
// Demo ids: site 1, kit 1, RECEPT is station 1 (the office user's own), DRAFT1 is station 2, HALLPRN 11.
const OWN = 1;
const OTHER = 2;

beforeAll(async () => {
  t = await makeTestApp();
  for (const role of ['admin', 'lead', 'technician', 'user'] as const) agents[role] = await t.signIn(DEMO[role]);
  agents.anonymous = supertest.agent(t.app);
});
afterAll(async () => {
  await t.close();
});

type Route = { method: 'get' | 'post' | 'patch' | 'put'; path: string; body?: object; expect: Record<string, number> };
const READ_STAFF = { anonymous: 401, user: 403, lead: 200, technician: 200, admin: 200 };
const WRITE = { anonymous: 401, user: 403, lead: 403 };

// Writes are sent with bodies that fail validation, so an allowed role answers 400 and nothing changes;
// the point here is who gets past the role check.
const ROUTES: Route[] = [
  { method: 'get', path: '/api/sites', expect: READ_STAFF },
  { method: 'post', path: '/api/sites', body: { name: '' }, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: '/api/sites/1', expect: READ_STAFF },
  { method: 'patch', path: '/api/sites/1', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/sites/1/archive', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/sites/1/restore', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: '/api/sites/1/next-numbers', expect: READ_STAFF },
  { method: 'get', path: '/api/sites/1/stations', expect: READ_STAFF },
  { method: 'get', path: '/api/sites/1/export.csv', expect: READ_STAFF },
  { method: 'post', path: '/api/sites/1/import/preview', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/sites/1/import', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: '/api/kits', expect: READ_STAFF },
  { method: 'post', path: '/api/kits', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: '/api/kits/1', expect: READ_STAFF },
  { method: 'patch', path: '/api/kits/1', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/kits/1/archive', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/kits/1/restore', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: '/api/stations', body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: '/api/stations/mine', expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OWN}`, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OTHER}`, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
  { method: 'patch', path: `/api/stations/${OWN}`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: `/api/stations/${OWN}/archive`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: `/api/stations/${OWN}/restore`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'put', path: `/api/stations/${OWN}/user`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: `/api/stations/${OWN}/profile`, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OTHER}/profile`, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
  { method: 'put', path: `/api/stations/${OWN}/profile`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'get', path: `/api/stations/${OWN}/files`, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OTHER}/files`, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OWN}/files/1`, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OTHER}/files/3`, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OWN}/files/1/raw`, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'get', path: `/api/stations/${OTHER}/files/3/raw`, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
  { method: 'post', path: `/api/stations/${OWN}/files`, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: `/api/stations/${OWN}/files/paste`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: `/api/stations/${OWN}/files/none`, body: {}, expect: { ...WRITE, technician: 400, admin: 400 } },
  { method: 'post', path: `/api/stations/${OWN}/plan`, body: {}, expect: { anonymous: 401, user: 200, lead: 200, technician: 200, admin: 200 } },
  { method: 'post', path: `/api/stations/${OTHER}/plan`, body: {}, expect: { anonymous: 401, user: 404, lead: 200, technician: 200, admin: 200 } },
];

describe.each(ROUTES)('$method $path', (route) => {
  it.each(Object.entries(route.expect))('as %s answers %i', async (role, status) => {
    const req = agents[role][route.method](route.path);
    const res = route.body ? await req.send(route.body) : await req;
    expect(res.status).toBe(status);
  });
});

describe('an office user reaching a station that is not theirs', () => {
  it('gets the same 404 as for an unknown id, with no name, file text or plan in the answer', async () => {
    const other = await agents.technician.get(`/api/stations/${OTHER}`);
    expect(other.body.station.name).toBe('DRAFT1');
    const fileText = (await agents.technician.get(`/api/stations/${OTHER}/files/3`)).body.text as string;
    expect(fileText.length).toBeGreaterThan(20);

    const paths = [`/api/stations/${OTHER}`, `/api/stations/${OTHER}/profile`, `/api/stations/${OTHER}/files`, `/api/stations/${OTHER}/files/3`, `/api/stations/${OTHER}/files/3/raw`];
    for (const path of paths) {
      const res = await agents.user.get(path);
      expect(res.status).toBe(404);
      const text = res.text;
      expect(text).not.toContain('DRAFT1');
      expect(text).not.toContain(fileText.slice(0, 20));
      expect(res.body).toEqual({ error: { code: 'not_found', message: 'That station was not found.' } });
    }
    const unknown = await agents.user.get('/api/stations/9999');
    expect(unknown.body).toEqual({ error: { code: 'not_found', message: 'That station was not found.' } });
    const plan = await agents.user.post(`/api/stations/${OTHER}/plan`).send({});
    expect(plan.status).toBe(404);
    expect(plan.text).not.toContain('DRAFT1');
    expect(plan.text).not.toContain('AUTOEXEC');
  });

  it('cannot list any site or its stations', async () => {
    for (const path of ['/api/sites', '/api/sites/1', '/api/sites/1/stations', '/api/sites/1/export.csv']) {
      const res = await agents.user.get(path);
      expect(res.status).toBe(403);
      expect(res.text).not.toContain('Halvorsen');
    }
  });

  it('finds their own station through /api/stations/mine', async () => {
    const res = await agents.user.get('/api/stations/mine');
    expect(res.body).toEqual({ stationId: OWN });
    const lead = await agents.lead.get('/api/stations/mine');
    expect(lead.body).toEqual({ stationId: null });
  });
});
