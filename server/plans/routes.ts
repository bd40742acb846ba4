// Plan revisions: list, the board of each PC's newest revision, make a revision, read one, give reasons for
// warnings, send for review. Review decisions live in server/review.
import { Router } from 'express';
import { z } from 'zod';
import { createPlanSchema, planListQuery, saveReasonsSchema, submitPlanSchema } from '@/db/requests/plans';
import type { AppContext } from '../context';
import { notFound } from '../http/errors';
import { currentUser } from '../http/require-role';
import { body, params, query } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { planBoard } from './board';
import { freshnessOf } from './current';
import { createPlanRepository } from './repository';
import { createPlanService } from './service';
import { buildPlanView } from './view';

export const idParams = z.object({ id: z.coerce.number().int().positive() });

export function plansRouter(ctx: AppContext): Router {
  const r = Router();
  const plans = createPlanService(ctx);
  const repo = createPlanRepository(ctx.db);
  const staff = ctx.requireRole(...STAFF);
  const editors = ctx.requireRole(...EDITORS);

  r.get('/plans', staff, (req, res) => {
    const q = query(req, planListQuery);
    const items = repo.list(q).map((p) => ({
      ...p,
      stale: ['draft', 'in_review', 'approved', 'returned'].includes(p.state) && !freshnessOf(ctx, repo.findMeta(p.id)!).current,
    }));
    res.json({ items });
  });

  r.get('/plans/board', staff, (req, res) => {
    const { siteId } = query(req, z.object({ siteId: z.coerce.number().int().positive().optional() }));
    res.json(planBoard(ctx, siteId));
  });

  r.post('/plans', editors, (req, res) => {
    const { stationId } = body(req, createPlanSchema);
    const plan = plans.createRevision(currentUser(req), stationId);
    res.status(201).json(buildPlanView(ctx, plan.id, currentUser(req)));
  });

  r.get('/plans/:id', staff, (req, res) => {
    res.json(buildPlanView(ctx, params(req, idParams).id, currentUser(req)));
  });

  r.put('/plans/:id/reasons', staff, (req, res) => {
    const { id } = params(req, idParams);
    const input = body(req, saveReasonsSchema);
    plans.saveReasons(currentUser(req), id, input.version, input.reasons);
    res.json(buildPlanView(ctx, id, currentUser(req)));
  });

  r.post('/plans/:id/submit', staff, async (req, res) => {
    const { id } = params(req, idParams);
    const input = body(req, submitPlanSchema);
    await plans.submit(currentUser(req), id, input.version, input.reasons);
    res.json(buildPlanView(ctx, id, currentUser(req)));
  });

  // The patched file exactly as the plan holds it (code page 437 bytes), to copy by hand or compare.
  r.get('/plans/:id/files/:name', staff, (req, res) => {
    const { id, name } = params(req, idParams.extend({ name: z.enum(['AUTOEXEC.BAT', 'CONFIG.SYS']) }));
    const plan = repo.find(id);
    if (!plan) throw notFound('That plan');
    const bytes = name === 'AUTOEXEC.BAT' ? plan.autoexecOut : plan.configOut;
    if (!bytes) throw notFound('That file');
    ctx.audit.record(currentUser(req), { action: 'plan.download', entity: 'plan', entityId: id, siteId: plans.siteOf(plan), details: { file: name, sha256: name === 'AUTOEXEC.BAT' ? plan.autoexecOutHash : plan.configOutHash } });
    res.set('Content-Type', 'application/octet-stream').set('Content-Disposition', `attachment; filename="${name}"`).send(bytes);
  });

  return r;
}
