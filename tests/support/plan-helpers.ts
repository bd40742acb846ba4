// Helpers for the plan-loop API tests: find demo stations, make revisions, move them along.
import { eq } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import type request from 'supertest';
import { planRevision } from '@/db/plans';
import { profile, startupFile, station, user } from '@/db/schema';
import type { TestApp } from './test-app';

export function stationIdOf(t: TestApp, name: string): number {
  const row = t.ctx.db.select({ id: station.id }).from(station).where(eq(station.name, name)).get();
  if (!row) throw new Error(`no demo station ${name}`);
  return row.id;
}

export function userIdOf(t: TestApp, email: string): string {
  return t.ctx.db.select({ id: user.id }).from(user).where(eq(user.email, email)).get()!.id;
}

export type PlanBody = {
  plan: { id: number; state: string; version: number; planHash: string; revision: number; stale: boolean; changedInputs: string[]; result: { checks: Array<{ slug: string; severity: string; file: string | null; line: number | null }>; diff: string } };
  allowed: Record<string, { ok: boolean; why?: string }>;
  comments: Array<{ file: string | null; line: number | null; body: string; authorName: string }>;
  missingReasons: string[];
};

export async function createPlan(agent: request.Agent, stationId: number): Promise<PlanBody> {
  const res = await agent.post('/api/plans').send({ stationId });
  if (res.status !== 201) throw new Error(`create plan: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as PlanBody;
}

export async function getPlan(agent: request.Agent, id: number): Promise<PlanBody> {
  const res = await agent.get(`/api/plans/${id}`);
  if (res.status !== 200) throw new Error(`get plan: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as PlanBody;
}

export async function submitPlan(agent: request.Agent, p: PlanBody, reasons?: Record<string, string>) {
  return agent.post(`/api/plans/${p.plan.id}/submit`).send({ version: p.plan.version, ...(reasons ? { reasons } : {}) });
}

/** Puts a plan straight into a state (test setup only), as if `by` had sent it. */
export function forceState(t: TestApp, planId: number, state: (typeof planRevision.$inferSelect)['state'], submittedBy?: string) {
  const row = t.ctx.db.select().from(planRevision).where(eq(planRevision.id, planId)).get()!;
  t.ctx.db
    .update(planRevision)
    .set({ state, submittedBy: submittedBy ?? row.submittedBy, approvedHash: state === 'approved' || state === 'released' ? row.planHash : null })
    .where(eq(planRevision.id, planId))
    .run();
  return t.ctx.db.select().from(planRevision).where(eq(planRevision.id, planId)).get()!;
}

/** Records a new AUTOEXEC.BAT revision for a station, the way an upload stores it. */
export function replaceAutoexec(t: TestApp, stationId: number, text: string, by: string) {
  const content = Buffer.from(text, 'latin1');
  t.ctx.db
    .insert(startupFile)
    .values({ stationId, kind: 'AUTOEXEC.BAT', absent: false, content, sha256: createHash('sha256').update(content).digest('hex'), size: content.length, source: 'upload', uploadedBy: by, uploadedAt: new Date() })
    .run();
}

export function currentAutoexec(t: TestApp, stationId: number): string {
  const rows = t.ctx.db.select().from(startupFile).where(eq(startupFile.stationId, stationId)).orderBy(startupFile.id).all();
  return rows.filter((r) => r.kind === 'AUTOEXEC.BAT').at(-1)!.content.toString('latin1');
}

/** Changes one field of a station's stored profile (as the wizard would). */
export function editProfile(t: TestApp, stationId: number, patch: Record<string, unknown>) {
  const row = t.ctx.db.select().from(profile).where(eq(profile.stationId, stationId)).get()!;
  t.ctx.db
    .update(profile)
    .set({ data: { ...row.data, ...patch }, version: row.version + 1 })
    .where(eq(profile.stationId, stationId))
    .run();
}
