// Plan revisions: a technician (or an office user's upload) turns a station's current profile and files into
// a saved revision; reasons for warnings; sending for review; releasing approved plans into a bundle.
import { checkKey } from '@/db/requests/plans';
import type { AppContext } from '../context';
import { badRequest, conflict, forbidden, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { loadPlanInput, runPlan } from '../stations/plan-input';
import { freshnessOf } from './current';
import { inputHashes, planHash } from './fingerprint';
import { sentForReview } from './notices';
import { createPlanRepository, type PlanMeta, type PlanRow } from './repository';
import { checkMove, type PlanAction } from './state-machine';
import { hasErrors, missingReasons, type StoredResult } from './view';

type Actor = SessionUser;

/** Turns a refused move into the HTTP answer (403 wrong role, 409 wrong state). */
export function assertMove(action: PlanAction, plan: Pick<PlanRow, 'state'>, actor: Actor) {
  const m = checkMove(action, plan.state, actor.role);
  if (!m.ok) throw m.status === 403 ? forbidden(m.message) : conflict(m.message, 'wrong_state');
  return m.to;
}

export const versionConflict = () =>
  conflict('Someone else changed this plan while you were reading it. The fresh version is shown now.', 'version_conflict');

export const staleConflict = (changed: string[]) =>
  conflict(`The station's ${changed.join(', ')} changed since this revision was made. Make a new revision.`, 'stale');

export function createPlanService(ctx: AppContext) {
  const repo = createPlanRepository(ctx.db);

  function get(id: number): PlanMeta {
    const plan = repo.findMeta(id);
    if (!plan) throw notFound('That plan');
    return plan;
  }

  /** Plans the station's current profile and files and saves the result as its next revision. */
  function createRevision(actor: Actor, stationId: number, source: 'technician' | 'user' = 'technician'): PlanMeta {
    const input = loadPlanInput(ctx, stationId);
    if (input.station.kind !== 'pc') throw badRequest('Only a PC has startup files to plan.');
    if (input.station.archivedAt) throw conflict('This station is archived.', 'archived');
    const { result, json } = runPlan(input);
    const inputs = inputHashes(input);
    const outputs = { autoexecOutHash: result.sha256.autoexecOut, configOutHash: result.sha256.configOut };
    const stored: StoredResult = {
      ...json,
      inputs: {
        profile: input.profile as unknown as Record<string, unknown>,
        profileError: input.profileError,
        kit: input.kit ? { id: input.kit.id, name: input.kit.name } : null,
        source,
      },
    };
    const { plan, superseded } = repo.insertRevision({
      stationId,
      state: 'draft',
      createdBy: actor.id,
      createdAt: new Date(),
      ...inputs,
      ...outputs,
      planHash: planHash(stationId, inputs, outputs),
      autoexecFileId: input.autoexec.file?.id ?? null,
      configFileId: input.config.file?.id ?? null,
      autoexecOut: Buffer.from(result.files.autoexec.after),
      configOut: result.files.config ? Buffer.from(result.files.config.after) : null,
      result: stored as unknown as Record<string, unknown>,
      warningReasons: {},
    });
    ctx.audit.record(actor, {
      action: 'plan.create',
      entity: 'plan',
      entityId: plan.id,
      siteId: input.site.id,
      details: { stationId, revision: plan.revision, source, planHash: plan.planHash, ...inputs, ...outputs, superseded, ok: result.ok },
    });
    return plan;
  }

  /** Keeps only reasons for this plan's warnings; a key naming no warning is a field error. */
  function checkedReasons(plan: PlanMeta, reasons: Record<string, string>): Record<string, string> {
    const warnings = new Set((plan.result as unknown as StoredResult).checks.filter((c) => c.severity === 'warning').map(checkKey));
    const unknown = Object.keys(reasons).filter((k) => !warnings.has(k));
    if (unknown.length) throw badRequest('Reasons can only be given for this plan’s warnings.', Object.fromEntries(unknown.map((k) => [`reasons.${k}`, 'No such warning on this plan.'])));
    return { ...plan.warningReasons, ...reasons };
  }

  function saveReasons(actor: Actor, id: number, version: number, reasons: Record<string, string>): PlanMeta {
    const plan = get(id);
    assertMove('edit-reasons', plan, actor);
    const merged = checkedReasons(plan, reasons);
    if (!repo.update(id, version, ['draft'], { warningReasons: merged })) throw versionConflict();
    ctx.audit.record(actor, { action: 'plan.reasons', entity: 'plan', entityId: id, siteId: siteOf(plan), details: { keys: Object.keys(reasons) } });
    return get(id);
  }

  /** draft → in_review: no error check, a reason for every warning, and the station unchanged since. */
  async function submit(actor: Actor, id: number, version: number, reasons?: Record<string, string>): Promise<PlanMeta> {
    const plan = get(id);
    const to = assertMove('submit', plan, actor);
    const result = plan.result as unknown as StoredResult;
    if (hasErrors(result.checks)) throw new HttpError(422, 'has_errors', 'An error check blocks this plan: fix the profile or the files and make a new revision.');
    const merged = reasons ? checkedReasons(plan, reasons) : plan.warningReasons;
    const missing = missingReasons(result.checks, merged);
    if (missing.length) {
      throw badRequest('Each warning needs a written reason before the plan goes to review.', Object.fromEntries(missing.map((c) => [`reasons.${checkKey(c)}`, 'Write why this warning is acceptable.'])));
    }
    const fresh = freshnessOf(ctx, plan);
    if (!fresh.current) throw staleConflict(fresh.changed);
    const ok = repo.update(id, version, ['draft'], { state: to, warningReasons: merged, submittedAt: new Date(), submittedBy: actor.id });
    if (!ok) throw versionConflict();
    const input = loadPlanInput(ctx, plan.stationId);
    ctx.audit.record(actor, { action: 'plan.submit', entity: 'plan', entityId: id, siteId: input.site.id, details: { planHash: plan.planHash, reasons: merged } });
    await sentForReview(ctx, { id, revision: plan.revision, stationName: input.station.name, siteName: input.site.name }, actor);
    return get(id);
  }

  /**
   * approved → released for the plans that went out in a rollout bundle (called by the bundle download).
   * Every plan must be approved for its exact hash and still current, else nothing is released.
   */
  function release(actor: Actor, ids: number[]): PlanMeta[] {
    const plans = ids.map(get);
    for (const plan of plans) {
      assertMove('release', plan, actor);
      if (plan.approvedHash !== plan.planHash) throw conflict(`Plan ${plan.id} was not approved for its content.`, 'not_approved');
      const fresh = freshnessOf(ctx, plan);
      if (!fresh.current) throw staleConflict(fresh.changed);
    }
    ctx.db.transaction(() => {
      for (const plan of plans) if (!repo.update(plan.id, plan.version, ['approved'], { state: 'released', releasedAt: new Date() })) throw versionConflict();
    });
    for (const plan of plans) {
      ctx.audit.record(actor, { action: 'plan.release', entity: 'plan', entityId: plan.id, siteId: siteOf(plan), details: { planHash: plan.planHash } });
    }
    return plans.map((p) => get(p.id));
  }

  function siteOf(plan: Pick<PlanRow, 'stationId'>): number {
    return loadPlanInput(ctx, plan.stationId).site.id;
  }

  return { get, createRevision, saveReasons, submit, release, siteOf };
}

export type PlanService = ReturnType<typeof createPlanService>;
