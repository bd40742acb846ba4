// People and invitations: invite by e-mail, the link sets a password once and expires, role changes,
// deactivation, and the audit trail of each.
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { invitation, station, user } from '@/db/schema';
import { DEMO, makeTestApp, ORIGIN, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp();
});
afterAll(async () => {
  await t.close();
});

const tokenFrom = (text: string) => decodeURIComponent(text.match(/accept-invite\?token=([^\s]+)/)![1]);

async function invite(email: string, role = 'technician') {
  const admin = await t.signIn(DEMO.admin);
  const res = await admin.post('/api/people/invite').send({ email, name: 'Sam Invitee', role });
  expect(res.status).toBe(201);
  const mail = t.ctx.mailer.fake!.list().find((m) => m.to.includes(email));
  expect(mail).toBeDefined();
  return { res, mail: mail!, token: tokenFrom(mail!.text) };
}

describe('invitations', () => {
  it('mails a link that sets the password once; the person can then sign in with the role', async () => {
    const { mail, token } = await invite('sam@bootwright.test', 'lead');
    expect(mail.subject).toMatch(/invited/i);
    expect(mail.html).toContain('accept-invite?token=');
    expect(mail.text).toContain('http://localhost:3000/accept-invite?token=');

    const before = await request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: 'sam@bootwright.test', password: 'quiet-river-stone' });
    expect(before.status).toBe(401);

    const look = await request(t.app).get(`/api/invitations/${encodeURIComponent(token)}`);
    expect(look.status).toBe(200);
    expect(look.body).toMatchObject({ email: 'sam@bootwright.test', role: 'lead' });

    const ok = await request(t.app).post('/api/invitations/accept').send({ token, password: 'quiet-river-stone', confirm: 'quiet-river-stone' });
    expect(ok.status).toBe(200);
    const again = await request(t.app).post('/api/invitations/accept').send({ token, password: 'another-password', confirm: 'another-password' });
    expect(again.status).toBe(410);

    const agent = await t.signIn('sam@bootwright.test', 'quiet-river-stone');
    expect((await agent.get('/api/me')).body.user.role).toBe('lead');
  });

  it('links an office user invited for a station to that station once they accept', async () => {
    const admin = await t.signIn(DEMO.admin);
    const res = await admin.post('/api/people/invite').send({ email: 'desk@bootwright.test', name: 'Desk User', role: 'user', stationId: 2 });
    expect(res.status).toBe(201);
    expect((await admin.post('/api/people/invite').send({ email: 'ghost@bootwright.test', name: 'Ghost', role: 'user', stationId: 9999 })).status).toBe(400);
    const token = tokenFrom(t.ctx.mailer.fake!.list().find((m) => m.to.includes('desk@bootwright.test'))!.text);
    await request(t.app).post('/api/invitations/accept').send({ token, password: 'quiet-river-stone', confirm: 'quiet-river-stone' });
    const row = t.ctx.db.select().from(station).where(eq(station.id, 2)).get()!;
    expect(row.userId).toBe(res.body.id);
  });

  it('refuses an expired link', async () => {
    const { token } = await invite('late@bootwright.test');
    t.ctx.db.update(invitation).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitation.email, 'late@bootwright.test')).run();
    const res = await request(t.app).post('/api/invitations/accept').send({ token, password: 'quiet-river-stone', confirm: 'quiet-river-stone' });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/);
  });

  it('refuses a short password, mismatched passwords and an unknown token with clear messages', async () => {
    const { token } = await invite('short@bootwright.test');
    const short = await request(t.app).post('/api/invitations/accept').send({ token, password: 'short', confirm: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/at least 10/);
    const differ = await request(t.app).post('/api/invitations/accept').send({ token, password: 'long-enough-1', confirm: 'long-enough-2' });
    expect(differ.body.error.fields.confirm).toMatch(/differ/);
    const unknown = await request(t.app).post('/api/invitations/accept').send({ token: 'x'.repeat(43), password: 'long-enough-1', confirm: 'long-enough-1' });
    expect(unknown.status).toBe(410);
  });

  it('refuses an invitation to an e-mail that already has an account, and bad bodies', async () => {
    const admin = await t.signIn(DEMO.admin);
    const taken = await admin.post('/api/people/invite').send({ email: DEMO.lead, name: 'Dup', role: 'lead' });
    expect(taken.status).toBe(409);
    const bad = await admin.post('/api/people/invite').send({ email: 'nope', name: '', role: 'wizard' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'name', 'role']);
  });
});

describe('roles and deactivation', () => {
  const idOf = (email: string) => t.ctx.db.select().from(user).where(eq(user.email, email)).get()!.id;

  it('changes a role; the new role takes effect on the next request; the change is audited', async () => {
    const admin = await t.signIn(DEMO.admin);
    const id = idOf(DEMO.technician2);
    const tech2 = await t.signIn(DEMO.technician2);
    expect((await tech2.get('/api/people')).status).toBe(403);
    expect((await admin.patch(`/api/people/${id}/role`).send({ role: 'admin' })).status).toBe(200);
    expect((await tech2.get('/api/people')).status).toBe(200);
    expect((await admin.patch(`/api/people/${id}/role`).send({ role: 'technician' })).status).toBe(200);
    const audit = await admin.get('/api/audit?action=role.change');
    expect(audit.body.items.length).toBeGreaterThanOrEqual(2);
    expect(audit.body.items[0]).toMatchObject({ entity: 'user', entityId: id, details: { from: 'admin', to: 'technician' } });
  });

  it('refuses an unknown role and an unknown person', async () => {
    const admin = await t.signIn(DEMO.admin);
    expect((await admin.patch(`/api/people/${idOf(DEMO.lead)}/role`).send({ role: 'owner' })).status).toBe(400);
    expect((await admin.patch('/api/people/no-such-id/role').send({ role: 'lead' })).status).toBe(404);
  });

  it('deactivates a person: their session stops working and they cannot sign in; reactivation restores it', async () => {
    const admin = await t.signIn(DEMO.admin);
    const lead2 = await t.signIn(DEMO.lead2);
    const id = idOf(DEMO.lead2);
    expect((await admin.post(`/api/people/${id}/deactivate`).set('Origin', ORIGIN).send({})).status).toBe(200);
    expect((await lead2.get('/api/me')).status).toBe(401);
    const again = await request(t.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: DEMO.lead2, password: 'bootwright-demo-2026' });
    expect(again.status).toBe(403);
    expect((await admin.post(`/api/people/${id}/reactivate`).set('Origin', ORIGIN).send({})).status).toBe(200);
    await t.signIn(DEMO.lead2);
  });

  it('does not let an admin deactivate themselves or drop their own admin role', async () => {
    const admin = await t.signIn(DEMO.admin);
    const id = idOf(DEMO.admin);
    expect((await admin.post(`/api/people/${id}/deactivate`).send({})).status).toBe(400);
    expect((await admin.patch(`/api/people/${id}/role`).send({ role: 'user' })).status).toBe(400);
  });
});

describe('audit trail', () => {
  it('is append-only even for direct SQL', () => {
    const sqlite = t.ctx.db.$client;
    expect(() => sqlite.prepare('update audit_event set action = ?').run('x')).toThrow(/append-only/);
    expect(() => sqlite.prepare('delete from audit_event').run()).toThrow(/append-only/);
  });

  it('has no API route that edits or deletes it', async () => {
    const admin = await t.signIn(DEMO.admin);
    for (const method of ['put', 'patch', 'delete'] as const) {
      expect((await (admin as any)[method]('/api/audit').send({})).status).toBe(404);
      expect((await (admin as any)[method]('/api/audit/1').send({})).status).toBe(404);
    }
  });
});

describe('local mail page', () => {
  it('lists what the fake received, for admins', async () => {
    const admin = await t.signIn(DEMO.admin);
    const res = await admin.get('/api/dev/mail');
    expect(res.body.enabled).toBe(true);
    expect(res.body.items.length).toBeGreaterThan(0);
    const one = await admin.get(`/api/dev/mail/${res.body.items[0].id}`);
    expect(one.body.subject).toBe(res.body.items[0].subject);
    expect((await admin.get('/api/dev/mail/99999')).status).toBe(404);
  });
});
