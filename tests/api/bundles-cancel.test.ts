// A download cut off mid-stream: on a site large enough that the zip is still being made when the client
// goes away (160 approved PCs, about 2 MB), the record ends failed, no plan is released, nobody is mailed.
// Progress reads "stations done of total" while the stream runs.
import { and, eq } from 'drizzle-orm';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { bundleRecord } from '@/db/bundles';
import { planRevision } from '@/db/plans';
import { auditEvent, profile, site, startupFile, station } from '@/db/schema';
import { createPlanService } from '@/server/plans/service';
import { DEMO_PASSWORD } from '@/server/seed/demo-data';
import { forceState, stationIdOf, userIdOf } from '../support/plan-helpers';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';

const EXTRA_PCS = 160;

let t: TestApp;
let server: Server;
let base: string;
let cookie: string;
let siteId: number;
let planIds: number[];

/** Copies RECEPT (profile and files) into `count` more PCs and gives each an approved plan. */
function manyApprovedPcs(count: number): number[] {
  const db = t.ctx.db;
  const recept = stationIdOf(t, 'RECEPT');
  const src = db.select().from(station).where(eq(station.id, recept)).get()!;
  const prof = db.select().from(profile).where(eq(profile.stationId, recept)).get()!;
  const files = db.select().from(startupFile).where(eq(startupFile.stationId, recept)).all();
  const techId = userIdOf(t, DEMO.technician);
  const tech = { id: techId, email: DEMO.technician, name: 'tech', role: 'technician' as const };
  const plans = createPlanService(t.ctx);
  const ids: number[] = [];
  for (let i = 0; i < count; i++) {
    const now = new Date();
    const st = db.insert(station).values({ siteId: src.siteId, kind: 'pc', name: `DESK${i}`, number: 300 + i, location: `Desk ${i}`, createdAt: now, updatedAt: now }).returning().get();
    db.insert(profile).values({ ...prof, stationId: st.id }).run();
    for (const { id: _id, ...f } of files) db.insert(startupFile).values({ ...f, stationId: st.id }).run();
    const plan = plans.createRevision(tech, st.id);
    forceState(t, plan.id, 'approved', techId);
    db.update(planRevision).set({ decidedBy: userIdOf(t, DEMO.lead), decidedAt: now }).where(eq(planRevision.id, plan.id)).run();
    ids.push(plan.id);
  }
  return ids;
}

beforeAll(async () => {
  t = await makeTestApp();
  siteId = t.ctx.db.select().from(site).where(eq(site.name, 'Halvorsen & Pike Architects')).get()!.id;
  planIds = manyApprovedPcs(EXTRA_PCS);
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: 'http://localhost:3000' },
    body: JSON.stringify({ email: DEMO.admin, password: DEMO_PASSWORD }),
  });
  expect(res.status).toBe(200);
  cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  await t.close();
});

const api = (path: string, init: RequestInit = {}) => fetch(`${base}${path}`, { ...init, headers: { cookie, 'Content-Type': 'application/json', ...(init.headers ?? {}) } });
const recordOf = (id: number) => t.ctx.db.select().from(bundleRecord).where(eq(bundleRecord.id, id)).get()!;

async function until(test: () => boolean, ms = 10_000) {
  for (const end = Date.now() + ms; !test() && Date.now() < end; ) await new Promise((r) => setTimeout(r, 20));
}

it('a client that stops reading after the first block leaves a failed record and no released plan', async () => {
  const created = await api('/api/bundles', { method: 'POST', body: JSON.stringify({ siteId }) });
  expect(created.status).toBe(201);
  const { record } = (await created.json()) as { record: { id: number; plans: unknown[] } };
  expect(record.plans).toHaveLength(EXTRA_PCS);

  const abort = new AbortController();
  const res = await api(`/api/bundles/${record.id}/zip`, { signal: abort.signal });
  expect(res.status).toBe(200);
  const reader = res.body!.getReader();
  const first = await reader.read();
  expect(first.done).toBe(false);
  expect(Buffer.from(first.value!).subarray(0, 4)).toEqual(Buffer.from('PK\x03\x04', 'latin1'));

  // Mid-stream the progress endpoint counts PC folders: some, not all.
  const mid = (await (await api(`/api/bundles/${record.id}/progress`)).json()) as { state: string; phase: string; done: number; total: number };
  expect(mid).toMatchObject({ state: 'building', phase: 'sending', total: EXTRA_PCS });
  expect(mid.done).toBeLessThan(EXTRA_PCS);

  abort.abort();
  await until(() => recordOf(record.id).state !== 'building');
  const rec = recordOf(record.id);
  expect(rec).toMatchObject({ state: 'failed', zipSha256: null, zipSize: null });
  expect(rec.failure).toMatch(/cancelled or cut off after \d+ of 160 stations/);

  const released = t.ctx.db.select().from(planRevision).where(eq(planRevision.state, 'released')).all();
  expect(released).toHaveLength(0);
  for (const id of planIds.slice(0, 5)) expect(t.ctx.db.select().from(planRevision).where(eq(planRevision.id, id)).get()!.state).toBe('approved');
  expect(t.ctx.db.select().from(auditEvent).where(and(eq(auditEvent.action, 'bundle.fail'), eq(auditEvent.entityId, String(record.id)))).all()).toHaveLength(1);
  expect(t.ctx.db.select().from(auditEvent).where(eq(auditEvent.action, 'bundle.download')).all()).toHaveLength(0);
  await new Promise((r) => setTimeout(r, 200));
  expect(t.ctx.mailer.fake!.list().filter((m) => /Rollout bundle/.test(m.subject))).toHaveLength(0);

  // The failed record cannot be streamed again; a new bundle of the same plans downloads and releases them.
  expect((await api(`/api/bundles/${record.id}/zip`)).status).toBe(409);
  const next = (await (await api('/api/bundles', { method: 'POST', body: JSON.stringify({ siteId }) })).json()) as { record: { id: number } };
  const whole = await api(`/api/bundles/${next.record.id}/zip`);
  expect(whole.status).toBe(200);
  const bytes = Buffer.from(await whole.arrayBuffer());
  await until(() => recordOf(next.record.id).state !== 'building');
  expect(recordOf(next.record.id)).toMatchObject({ state: 'done', zipSize: bytes.length });
  expect(t.ctx.db.select().from(planRevision).where(eq(planRevision.state, 'released')).all()).toHaveLength(EXTRA_PCS);
});
