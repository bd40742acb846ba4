// /api/stations and /api/sites/:id/stations: staff read every station, a `user` only their own; admins and
// technicians create and edit stations, profiles and startup files. The plan preview saves nothing.
import { Router, type Request } from 'express';
import { eq } from 'drizzle-orm';
import { kit } from '@/db/schema';
import { versionSchema } from '@/db/requests/common';
import {
  fileKindSchema,
  linkUserSchema,
  pasteSchema,
  planPreviewSchema,
  profileWriteSchema,
  stationCreateSchema,
  stationListQuerySchema,
  stationUpdateSchema,
} from '@/db/requests/stations';
import type { AppContext } from '../context';
import { badRequest } from '../http/errors';
import { currentUser } from '../http/require-role';
import { body, query } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { idParam } from '../sites/params';
import { assertCanReadStation, ownStationId } from './access';
import { createFileService } from './files';
import { loadPlanInput, profileFrom, runPlan } from './plan-input';
import { createStationService } from './service';
import { uploadOne } from './upload';

export function stationsRouter(ctx: AppContext): Router {
  const r = Router();
  const stations = createStationService(ctx);
  const files = createFileService(ctx);
  const anyone = ctx.requireRole();
  const staff = ctx.requireRole(...STAFF);
  const editors = ctx.requireRole(...EDITORS);
  const stationId = (req: Request) => idParam(req, 'id', 'That station');
  /** The station when the signed-in person may read it (404 otherwise, for unknown and foreign alike). */
  const readable = (req: Request) => assertCanReadStation(ctx, currentUser(req), stationId(req));

  r.get('/sites/:id/stations', staff, (req, res) => {
    const id = idParam(req, 'id', 'That site');
    res.json(stations.list(id, query(req, stationListQuerySchema)));
  });
  r.post('/stations', editors, (req, res) => {
    res.status(201).json(stations.create(currentUser(req), body(req, stationCreateSchema)));
  });
  r.get('/stations/mine', anyone, (req, res) => {
    res.json({ stationId: ownStationId(ctx, currentUser(req)) });
  });
  r.get('/stations/:id', anyone, (req, res) => {
    res.json(stations.detail(readable(req).id));
  });
  r.patch('/stations/:id', editors, (req, res) => {
    const id = stations.get(stationId(req)).id;
    res.json(stations.update(currentUser(req), id, body(req, stationUpdateSchema)));
  });
  for (const [path, archived] of [['archive', true], ['restore', false]] as const) {
    r.post(`/stations/:id/${path}`, editors, (req, res) => {
      const id = stations.get(stationId(req)).id;
      res.json(stations.setArchived(currentUser(req), id, body(req, versionSchema).version, archived));
    });
  }

  r.put('/stations/:id/user', editors, (req, res) => {
    const id = stations.get(stationId(req)).id;
    res.json(stations.linkUser(currentUser(req), id, body(req, linkUserSchema)));
  });

  r.get('/stations/:id/profile', anyone, (req, res) => {
    res.json(stations.detail(readable(req).id).profile);
  });
  r.put('/stations/:id/profile', editors, (req, res) => {
    const id = stations.get(stationId(req)).id;
    res.json(stations.writeProfile(currentUser(req), id, body(req, profileWriteSchema)));
  });

  r.get('/stations/:id/files', anyone, (req, res) => {
    res.json({ items: files.list(readable(req).id) });
  });
  r.get('/stations/:id/files/:fileId', anyone, (req, res) => {
    const st = readable(req);
    res.json(files.read(st.id, idParam(req, 'fileId', 'That file revision')));
  });
  r.get('/stations/:id/files/:fileId/raw', anyone, (req, res) => {
    const st = readable(req);
    const row = files.raw(st.id, idParam(req, 'fileId', 'That file revision'));
    ctx.audit.record(currentUser(req), { action: 'file.download', entity: 'startup_file', entityId: row.id, siteId: st.siteId, details: { stationId: st.id } });
    res.type('application/octet-stream').attachment(row.kind).send(row.content);
  });
  r.post('/stations/:id/files', editors, uploadOne, (req, res) => {
    const st = stations.get(stationId(req));
    const { kind } = body(req, fileKindSchema);
    res.status(201).json(files.upload(currentUser(req), st, kind, req.file?.buffer));
  });
  r.post('/stations/:id/files/paste', editors, (req, res) => {
    const st = stations.get(stationId(req));
    const input = body(req, pasteSchema);
    res.status(201).json(files.paste(currentUser(req), st, input.kind, input.text));
  });
  r.post('/stations/:id/files/none', editors, (req, res) => {
    const st = stations.get(stationId(req));
    res.status(201).json(files.none(currentUser(req), st, body(req, fileKindSchema).kind));
  });

  r.post('/stations/:id/plan', anyone, (req, res) => {
    const st = readable(req);
    if (st.kind !== 'pc') throw badRequest('Only PC stations have startup files to plan.');
    const preview = body(req, planPreviewSchema);
    const input = loadPlanInput(ctx, st.id);
    if (preview.data) {
      const kitId = preview.kitId === undefined ? input.kit?.id : preview.kitId;
      const kitRow = kitId ? (ctx.db.select().from(kit).where(eq(kit.id, kitId)).get() ?? null) : null;
      if (kitId && !kitRow) throw badRequest('That kit was not found.', { kitId: 'That kit was not found.' });
      Object.assign(input, profileFrom(preview.data, kitRow), { kit: kitRow });
    }
    const { json } = runPlan(input);
    ctx.audit.record(currentUser(req), { action: 'plan.preview', entity: 'station', entityId: st.id, siteId: st.siteId, details: { ok: json.ok, changed: json.changed, output: json.sha256.output } });
    res.json({
      plan: json,
      profileError: input.profileError,
      kit: input.kit && { id: input.kit.id, name: input.kit.name, minDos: input.kit.minDos },
      inputs: { autoexec: input.autoexec.file, config: input.config.file },
    });
  });
  return r;
}
