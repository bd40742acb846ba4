// The demo's seeded plans (npm start on an empty database): every state a demo shows, made through the
// same services as the API, and two approved plans ready for the bundle.
import { eq } from 'drizzle-orm';
import { planComment, planRevision, station } from '@/db/schema';
import { seedDemoPlans } from '@/server/seed/demo-plans';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoPlans(t.ctx);
});
afterAll(async () => {
  await t.close();
});

function stateOf(name: string): string | undefined {
  const st = t.ctx.db.select().from(station).where(eq(station.name, name)).get()!;
  return t.ctx.db.select().from(planRevision).where(eq(planRevision.stationId, st.id)).get()?.state;
}

it('puts the demo plans in approved, in review, returned and draft states', () => {
  expect(stateOf('RECEPT')).toBe('approved');
  expect(stateOf('DRAFT1')).toBe('approved');
  expect(stateOf('STUDIO')).toBe('in_review');
  expect(stateOf('DRAFT2')).toBe('returned');
  expect(stateOf('ACCOUNTS')).toBe('draft');
  expect(stateOf('ARCHIVE')).toBeUndefined();
  const comments = t.ctx.db.select().from(planComment).all();
  expect(comments).toHaveLength(1);
  expect(comments[0]).toMatchObject({ file: 'AUTOEXEC.BAT' });
  expect(comments[0].line).toBeGreaterThan(0);
});

it('leaves the two approved plans ready for the bundle and the review queue with one plan', async () => {
  const admin = await t.signIn(DEMO.admin);
  const preview = await admin.get('/api/bundles/preview?siteId=1');
  expect(preview.status).toBe(200);
  expect(JSON.stringify(preview.body)).toContain('RECEPT');
  const lead = await t.signIn(DEMO.lead);
  const queue = await lead.get('/api/review/queue');
  expect(queue.status).toBe(200);
  expect(JSON.stringify(queue.body)).toContain('STUDIO');
  expect(JSON.stringify(queue.body)).not.toContain('DRAFT2');
});

it('mailed the leads and the technician as the real flow does', () => {
  const mail = t.ctx.mailer.fake!.list();
  expect(mail.some((m) => m.to.includes(DEMO.lead) && /review/i.test(m.subject))).toBe(true);
  expect(mail.some((m) => m.to.includes(DEMO.technician) && /returned/i.test(m.subject))).toBe(true);
});
