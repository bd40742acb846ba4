// One plan revision as the screens read it: the engine's result, the hashes, who did what, the comments,
// whether it still matches its station, and what the reader may do with it.
import { checkKey } from '@/db/requests/plans';
import type { Check } from '@/generators/engine';
import type { PlanJson } from '../stations/plan-input';
import type { AppContext } from '../context';
import { notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { loadPlanInput } from '../stations/plan-input';
import { freshnessOf, type Freshness } from './current';
import { createPlanRepository, type PlanMeta } from './repository';
import { checkMove, type PlanAction } from './state-machine';

/** What a revision stores besides the engine's result: the profile and kit it was made from. */
export type StoredResult = PlanJson & {
  inputs: { profile: Record<string, unknown>; profileError: string | null; kit: { id: number; name: string } | null; source: 'technician' | 'user' };
};

export type PlanAllowed = Record<'submit' | 'approve' | 'return' | 'comment' | 'newRevision', { ok: boolean; why?: string }>;

/** Warnings that still lack a written reason. */
export function missingReasons(checks: Check[], reasons: Record<string, string>): Check[] {
  return checks.filter((c) => c.severity === 'warning' && !reasons[checkKey(c)]?.trim());
}

export function hasErrors(checks: Check[]): boolean {
  return checks.some((c) => c.severity === 'error');
}

function allowed(plan: PlanMeta, result: StoredResult, fresh: Freshness, me: SessionUser): PlanAllowed {
  const move = (action: PlanAction) => {
    const m = checkMove(action, plan.state, me.role);
    return m.ok ? { ok: true } : { ok: false, why: m.message };
  };
  const own = plan.createdBy === me.id || plan.submittedBy === me.id;
  const stale = fresh.current ? null : { ok: false, why: 'The station changed since this revision was made: make a new revision.' };
  const submit = move('submit');
  const approve = move('approve');
  return {
    submit: !submit.ok ? submit : stale ?? (hasErrors(result.checks) ? { ok: false, why: 'An error check blocks this plan.' } : { ok: true }),
    approve: !approve.ok ? approve : own ? { ok: false, why: 'Nobody approves a plan they made.' } : stale ?? { ok: true },
    return: move('return'),
    comment: me.role === 'user' || plan.state === 'superseded' ? { ok: false, why: 'Comments are closed on this revision.' } : { ok: true },
    newRevision: me.role === 'technician' || me.role === 'admin' ? { ok: true } : { ok: false, why: 'Your role may not make plans.' },
  };
}

export function buildPlanView(ctx: AppContext, planId: number, me: SessionUser) {
  const repo = createPlanRepository(ctx.db);
  const plan = repo.findMeta(planId);
  if (!plan) throw notFound('That plan');
  const input = loadPlanInput(ctx, plan.stationId);
  const fresh = freshnessOf(ctx, plan);
  const result = plan.result as unknown as StoredResult;
  const { result: _r, ...meta } = plan;
  return {
    plan: {
      ...meta,
      result,
      stale: !fresh.current && plan.state !== 'superseded' && plan.state !== 'released',
      changedInputs: fresh.changed,
      createdByUser: repo.userName(plan.createdBy),
      submittedByUser: repo.userName(plan.submittedBy),
      decidedByUser: repo.userName(plan.decidedBy),
    },
    station: { id: input.station.id, name: input.station.name, number: input.station.number, kind: input.station.kind, location: input.station.location },
    site: { id: input.site.id, name: input.site.name },
    comments: repo.comments(planId),
    revisions: repo.revisionsOf(plan.stationId),
    missingReasons: missingReasons(result.checks, plan.warningReasons).map(checkKey),
    allowed: allowed(plan, result, fresh, me),
  };
}

export type PlanView = ReturnType<typeof buildPlanView>;
