import { Router } from 'express';
import { z } from 'zod';
import { pageQuerySchema } from '@/db/requests/people';
import type { AppContext } from '../context';
import { query } from '../http/validate';

const auditQuery = pageQuerySchema.extend({
  action: z.string().max(64).optional(),
  entity: z.string().max(64).optional(),
  actorId: z.string().max(64).optional(),
  siteId: z.coerce.number().int().positive().optional(),
  from: z.coerce.date().optional(),
  to: z.coerce.date().optional(),
});

/** Admins read the audit trail with filters. There is deliberately no route that edits or deletes it. */
export function auditRouter(ctx: AppContext): Router {
  const r = Router();
  r.get('/audit', ctx.requireRole('admin'), (req, res) => {
    const q = query(req, auditQuery);
    res.json({ items: ctx.audit.list(q), limit: q.limit, offset: q.offset });
  });
  return r;
}
