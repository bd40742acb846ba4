import { fromNodeHeaders } from 'better-auth/node';
import { Router } from 'express';
import { z } from 'zod';
import { acceptInviteSchema, inviteSchema, pageQuerySchema, setRoleSchema } from '@/db/requests/people';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, params, query } from '../http/validate';
import { createPeopleService } from './service';

const idParams = z.object({ id: z.string().min(1).max(64) });

export function peopleRouter(ctx: AppContext): Router {
  const r = Router();
  const people = createPeopleService(ctx);
  const admin = ctx.requireRole('admin');

  r.get('/people', admin, (req, res) => {
    const { limit, offset } = query(req, pageQuerySchema);
    res.json(people.list(limit, offset));
  });

  r.post('/people/invite', admin, async (req, res) => {
    res.status(201).json(await people.invite(currentUser(req), body(req, inviteSchema)));
  });

  r.patch('/people/:id/role', admin, (req, res) => {
    const { id } = params(req, idParams);
    res.json(people.setRole(currentUser(req), id, body(req, setRoleSchema).role));
  });

  r.post('/people/:id/deactivate', admin, async (req, res) => {
    const { id } = params(req, idParams);
    res.json(await people.setActive(currentUser(req), id, false, fromNodeHeaders(req.headers)));
  });

  r.post('/people/:id/reactivate', admin, async (req, res) => {
    const { id } = params(req, idParams);
    res.json(await people.setActive(currentUser(req), id, true, fromNodeHeaders(req.headers)));
  });

  // Public: the invitation link itself is the credential.
  r.get('/invitations/:token', (req, res) => {
    const { token } = params(req, z.object({ token: z.string().min(20).max(200) }));
    const row = people.openInvitation(token);
    res.json({ email: row.email, name: row.name, role: row.role, expiresAt: row.expiresAt });
  });

  r.post('/invitations/accept', async (req, res) => {
    const input = body(req, acceptInviteSchema);
    res.json(await people.accept(input.token, input.password));
  });

  return r;
}
