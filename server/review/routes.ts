// The lead's review: queue, approve, return, comments on lines.
import { Router } from 'express';
import { approvePlanSchema, commentSchema, returnPlanSchema, reviewQueueQuery } from '@/db/requests/plans';
import { isNull } from 'drizzle-orm';
import { site } from '@/db/schema';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, params, query } from '../http/validate';
import { idParams } from '../plans/routes';
import { buildPlanView } from '../plans/view';
import { STAFF } from '../roles';
import { createReviewService } from './service';

export function reviewRouter(ctx: AppContext): Router {
  const r = Router();
  const review = createReviewService(ctx);
  const readers = ctx.requireRole('lead', 'admin');
  const staff = ctx.requireRole(...STAFF);

  r.get('/review/queue', readers, (req, res) => {
    const { siteId } = query(req, reviewQueueQuery);
    const all = review.queue();
    const sites = ctx.db.select({ id: site.id, name: site.name }).from(site).where(isNull(site.archivedAt)).orderBy(site.name).all();
    res.json({
      items: siteId ? all.filter((p) => p.siteId === siteId) : all,
      sites: sites.map((s) => ({ ...s, waiting: all.filter((p) => p.siteId === s.id).length })),
    });
  });

  // Decisions are open to staff at the route; the state machine lets only a lead make them (403 otherwise).
  r.post('/plans/:id/approve', staff, async (req, res) => {
    const { id } = params(req, idParams);
    await review.approve(currentUser(req), id, body(req, approvePlanSchema));
    res.json(buildPlanView(ctx, id, currentUser(req)));
  });

  r.post('/plans/:id/return', staff, async (req, res) => {
    const { id } = params(req, idParams);
    await review.returnPlan(currentUser(req), id, body(req, returnPlanSchema));
    res.json(buildPlanView(ctx, id, currentUser(req)));
  });

  r.post('/plans/:id/comments', staff, (req, res) => {
    const { id } = params(req, idParams);
    const comment = review.comment(currentUser(req), id, body(req, commentSchema));
    res.status(201).json(comment);
  });

  return r;
}
