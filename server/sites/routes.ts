// /api/sites: staff read every site; admins and technicians create, edit and archive.
import { Router } from 'express';
import { siteCreateSchema, siteListQuerySchema, siteUpdateSchema } from '@/db/requests/sites';
import { versionSchema } from '@/db/requests/common';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, query } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { idParam } from './params';
import { createSiteService } from './service';

export function sitesRouter(ctx: AppContext): Router {
  const r = Router();
  const sites = createSiteService(ctx);
  const staff = ctx.requireRole(...STAFF);
  const editors = ctx.requireRole(...EDITORS);
  const siteId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That site');

  r.get('/sites', staff, (req, res) => {
    const q = query(req, siteListQuerySchema);
    res.json({ ...sites.list(q), limit: q.limit, offset: q.offset });
  });
  r.post('/sites', editors, (req, res) => {
    res.status(201).json(sites.create(currentUser(req), body(req, siteCreateSchema)));
  });
  r.get('/sites/:id', staff, (req, res) => {
    res.json(sites.get(siteId(req)));
  });
  r.patch('/sites/:id', editors, (req, res) => {
    const id = siteId(req);
    res.json(sites.update(currentUser(req), id, body(req, siteUpdateSchema)));
  });
  r.post('/sites/:id/archive', editors, (req, res) => {
    const id = siteId(req);
    res.json(sites.setArchived(currentUser(req), id, body(req, versionSchema).version, true));
  });
  r.post('/sites/:id/restore', editors, (req, res) => {
    const id = siteId(req);
    res.json(sites.setArchived(currentUser(req), id, body(req, versionSchema).version, false));
  });
  r.get('/sites/:id/next-numbers', staff, (req, res) => {
    res.json(sites.nextNumbers(siteId(req)));
  });
  return r;
}
