// The foundation's API: health, error shapes, sign-in and its bad input, roles on every route so far.
import express from 'express';
import request from 'supertest';
import { errorHandler } from '@/server/http/errors';
import { DEMO, makeTestApp, ORIGIN, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('health and errors', () => {
  it('answers health with the version and the database state', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, version: expect.stringMatching(/^\d+\.\d+\.\d+/), database: true });
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await request(t.app).get('/api/no/such/route');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('answers malformed JSON with a 400', async () => {
    const agent = await t.signIn(DEMO.admin);
    const res = await agent.post('/api/people/invite').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('answers a thrown error with a 500 that does not leak the stack', async () => {
    const logged: string[] = [];
    const app = express();
    app.get('/boom', () => {
      throw new Error('secret internal detail at /srv/app/file.ts:12');
    });
    app.use(errorHandler((m) => logged.push(m)));
    const res = await request(app).get('/boom');
    expect(res.status).toBe(500);
    expect(JSON.stringify(res.body)).not.toContain('secret internal detail');
    expect(res.body.error.code).toBe('internal');
    expect(logged).toHaveLength(1);
  });
});

describe('sign-in', () => {
  const post = (body: object) => request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send(body);

  it('signs each demo role in and /api/me tells its role', async () => {
    for (const [role, email] of Object.entries({ admin: DEMO.admin, lead: DEMO.lead, technician: DEMO.technician, user: DEMO.user })) {
      const agent = await t.signIn(email);
      const me = await agent.get('/api/me');
      expect(me.status).toBe(200);
      expect(me.body.user).toMatchObject({ email, role });
    }
  });

  it('refuses a wrong password and an unknown e-mail with the same 401', async () => {
    const wrong = await post({ email: DEMO.admin, password: 'not-the-password' });
    const unknown = await post({ email: 'nobody@bootwright.test', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.code).toBe(unknown.body.code);
  });

  it('refuses empty fields, a malformed e-mail and a 10 KB password without crashing', async () => {
    expect((await post({ email: '', password: '' })).status).toBeGreaterThanOrEqual(400);
    expect((await post({ email: 'not-an-email', password: 'whatever-123' })).status).toBe(400);
    const huge = await post({ email: DEMO.admin, password: 'x'.repeat(10 * 1024) });
    expect([400, 401]).toContain(huge.status);
    expect((await request(t.app).get('/api/health')).status).toBe(200);
  });

  it('has no public sign-up', async () => {
    const res = await request(t.app).post('/api/auth/sign-up/email').set('Origin', ORIGIN).send({ email: 'new@bootwright.test', password: 'a-long-password', name: 'New' });
    expect(res.status).toBeGreaterThanOrEqual(400);
    const login = await request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: 'new@bootwright.test', password: 'a-long-password' });
    expect(login.status).toBe(401);
  });

  it('signs out: the session no longer works', async () => {
    const agent = await t.signIn(DEMO.lead);
    expect((await agent.post('/api/auth/sign-out').set('Origin', ORIGIN).send({})).status).toBe(200);
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});

describe('roles on every route', () => {
  const adminOnly: Array<[string, string, object]> = [
    ['get', '/api/people', {}],
    ['post', '/api/people/invite', { email: 'x@bootwright.test', name: 'X', role: 'user' }],
    ['patch', '/api/people/someone/role', { role: 'lead' }],
    ['post', '/api/people/someone/deactivate', {}],
    ['post', '/api/people/someone/reactivate', {}],
    ['get', '/api/audit', {}],
    ['get', '/api/dev/mail', {}],
  ];

  it.each(adminOnly)('%s %s: 401 signed out, 403 for lead, technician and user', async (method, url, payload) => {
    const anon = await (request(t.app) as any)[method](url).send(payload);
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthenticated');
    for (const email of [DEMO.lead, DEMO.technician, DEMO.user]) {
      const agent = await t.signIn(email);
      const res = await (agent as any)[method](url).send(payload);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });

  it('lets the admin list people', async () => {
    const agent = await t.signIn(DEMO.admin);
    const res = await agent.get('/api/people');
    expect(res.status).toBe(200);
    expect(res.body.items.map((p: { email: string }) => p.email)).toEqual(expect.arrayContaining(Object.values(DEMO)));
  });

  it('answers /api/me with 401 when signed out', async () => {
    expect((await request(t.app).get('/api/me')).status).toBe(401);
  });
});
