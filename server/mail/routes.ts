import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../context';
import { notFound } from '../http/errors';
import { params } from '../http/validate';

/** Admin-only view of what the local mail fake received (absent when SMTP_URL points at a real server). */
export function devMailRouter(ctx: AppContext): Router {
  const r = Router();
  const admin = ctx.requireRole('admin');
  r.get('/dev/mail', admin, (_req, res) => {
    const fake = ctx.mailer.fake;
    res.json({ enabled: fake !== null, items: fake?.list() ?? [] });
  });
  r.get('/dev/mail/:id', admin, (req, res) => {
    const { id } = params(req, z.object({ id: z.coerce.number().int().positive() }));
    const mail = ctx.mailer.fake?.get(id);
    if (!mail) throw notFound('That message');
    res.json(mail);
  });
  return r;
}
