// /api/kits: staff read kits (the wizard needs them); admins and technicians create, edit and archive.
import { Router } from 'express';
import { versionSchema } from '@/db/requests/common';
import { kitCreateSchema, kitListQuerySchema, kitUpdateSchema } from '@/db/requests/kits';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, query } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { idParam } from '../sites/params';
import { createKitService } from './service';

export function kitsRouter(ctx: AppContext): Router {
  const r = Router();
  const kits = createKitService(ctx);
  const staff = ctx.requireRole(...STAFF);
  const editors = ctx.requireRole(...EDITORS);
  const kitId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That kit');

  r.get('/kits', staff, (req, res) => {
    const q = query(req, kitListQuerySchema);
    res.json({ ...kits.list(q), limit: q.limit, offset: q.offset });
  });
  r.post('/kits', editors, (req, res) => {
    res.status(201).json(kits.create(currentUser(req), body(req, kitCreateSchema)));
  });
  r.get('/kits/:id', staff, (req, res) => {
    res.json(kits.get(kitId(req)));
  });
  r.patch('/kits/:id', editors, (req, res) => {
    const id = kitId(req);
    res.json(kits.update(currentUser(req), id, body(req, kitUpdateSchema)));
  });
  r.post('/kits/:id/archive', editors, (req, res) => {
    const id = kitId(req);
    res.json(kits.setArchived(currentUser(req), id, body(req, versionSchema).version, true));
  });
  r.post('/kits/:id/restore', editors, (req, res) => {
    const id = kitId(req);
    res.json(kits.setArchived(currentUser(req), id, body(req, versionSchema).version, false));
  });
  return r;
}
