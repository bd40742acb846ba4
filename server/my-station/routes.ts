// The office user's own PC: read it, check pasted or uploaded startup files, send them to the technicians.
import { Router } from 'express';
import { z } from 'zod';
import { userEditSchema } from '@/db/requests/plans';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body, params } from '../http/validate';
import { createMyStationService } from './service';

const stationParams = z.object({ stationId: z.coerce.number().int().positive() });

export function myStationRouter(ctx: AppContext): Router {
  const r = Router();
  const mine = createMyStationService(ctx);
  const user = ctx.requireRole('user');

  r.get('/my-station', user, (req, res) => {
    res.json(mine.summary(currentUser(req)));
  });

  r.post('/my-station/:stationId/check', user, (req, res) => {
    const { stationId } = params(req, stationParams);
    res.json(mine.check(currentUser(req), stationId, body(req, userEditSchema)));
  });

  r.post('/my-station/:stationId/send', user, async (req, res) => {
    const { stationId } = params(req, stationParams);
    res.status(201).json(await mine.send(currentUser(req), stationId, body(req, userEditSchema)));
  });

  return r;
}
