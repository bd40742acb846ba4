// The lead's review: the queue of plans waiting, approve the exact plan hash seen, return with a comment,
// comments on lines. Nobody approves a plan they made; two leads at once: the second gets a 409.
import type { CommentInput } from '@/db/requests/plans';
import type { AppContext } from '../context';
import { conflict, forbidden } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { loadPlanInput } from '../stations/plan-input';
import { freshnessOf } from '../plans/current';
import { decided } from '../plans/notices';
import { createPlanRepository } from '../plans/repository';
import { assertMove, createPlanService, staleConflict, versionConflict } from '../plans/service';
import type { StoredResult } from '../plans/view';

type Actor = SessionUser;

export function createReviewService(ctx: AppContext) {
  const repo = createPlanRepository(ctx.db);
  const plans = createPlanService(ctx);

  /** Plans in review (optionally of one site), oldest first, with warnings counted and staleness shown. */
  function queue(siteId?: number) {
    return repo
      .list({ state: 'in_review', siteId })
      .reverse()
      .map((p) => {
        const full = repo.findMeta(p.id)!;
        const checks = (full.result as unknown as StoredResult).checks;
        return {
          ...p,
          warnings: checks.filter((c) => c.severity === 'warning').length,
          notes: checks.filter((c) => c.severity === 'note').length,
          stale: !freshnessOf(ctx, full).current,
          submittedByName: repo.userName(full.submittedBy)?.name ?? p.createdByName,
        };
      });
  }

  function refuseOwn(actor: Actor, plan: { createdBy: string; submittedBy: string | null }) {
    if (plan.createdBy === actor.id || plan.submittedBy === actor.id) throw forbidden('Nobody approves a plan they made.');
  }

  async function approve(actor: Actor, id: number, input: { version: number; planHash: string; comment?: string }) {
    const plan = plans.get(id);
    const to = assertMove('approve', plan, actor);
    refuseOwn(actor, plan);
    if (input.planHash !== plan.planHash) throw conflict('This plan is not the one you read. The fresh version is shown now.', 'hash_mismatch');
    const fresh = freshnessOf(ctx, plan);
    if (!fresh.current) throw staleConflict(fresh.changed);
    const comment = input.comment?.trim() || null;
    const ok = repo.update(id, input.version, ['in_review'], { state: to, decidedBy: actor.id, decidedAt: new Date(), decisionComment: comment, approvedHash: input.planHash });
    if (!ok) throw versionConflict();
    await after(actor, id, 'approved', comment);
    return plans.get(id);
  }

  async function returnPlan(actor: Actor, id: number, input: { version: number; comment: string }) {
    const plan = plans.get(id);
    const to = assertMove('return', plan, actor);
    const ok = repo.update(id, input.version, ['in_review'], { state: to, decidedBy: actor.id, decidedAt: new Date(), decisionComment: input.comment });
    if (!ok) throw versionConflict();
    await after(actor, id, 'returned', input.comment);
    return plans.get(id);
  }

  /** Audit and tell the plan's technician (who sent it; the maker when nobody did). */
  async function after(actor: Actor, id: number, outcome: 'approved' | 'returned', comment: string | null) {
    const plan = plans.get(id);
    const input = loadPlanInput(ctx, plan.stationId);
    ctx.audit.record(actor, {
      action: outcome === 'approved' ? 'plan.approve' : 'plan.return',
      entity: 'plan',
      entityId: id,
      siteId: input.site.id,
      details: { planHash: plan.planHash, approvedHash: plan.approvedHash, profileHash: plan.profileHash, kitHash: plan.kitHash, autoexecInHash: plan.autoexecInHash, configInHash: plan.configInHash, comment },
    });
    const techId = plan.submittedBy ?? plan.createdBy;
    const tech = repo.userContact(techId);
    if (tech) await decided(ctx, { id, revision: plan.revision, stationName: input.station.name, siteName: input.site.name }, tech.email, actor, outcome, comment);
  }

  function comment(actor: Actor, id: number, input: Required<Pick<CommentInput, 'body'>> & { file: CommentInput['file']; line: CommentInput['line'] }) {
    const plan = plans.get(id);
    if (plan.state === 'superseded') throw conflict('Comments are closed on a superseded revision.', 'wrong_state');
    const row = repo.addComment({ planId: id, authorId: actor.id, file: input.file ?? null, line: input.line ?? null, body: input.body, createdAt: new Date() });
    ctx.audit.record(actor, { action: 'plan.comment', entity: 'plan', entityId: id, siteId: plans.siteOf(plan), details: { commentId: row.id, file: row.file, line: row.line } });
    return row;
  }

  return { queue, approve, returnPlan, comment };
}
