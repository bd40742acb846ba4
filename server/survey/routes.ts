// Survey API: staff (admin, lead, technician) read; admin and technician edit; an office user gets 403.
// Every body, query and path is checked with the shared zod schemas.
import { Router, type Request } from 'express';
import type { z } from 'zod';
import {
  deleteQuerySchema, emptyQuerySchema, itemParamsSchema, jackCreateSchema, jackUpdateSchema, nodeCreateSchema,
  nodeUpdateSchema, readingCreateSchema, readingUpdateSchema, reportQuerySchema, runCreateSchema, runUpdateSchema,
  settingsUpdateSchema, siteParamsSchema, sitesQuerySchema, terminatorCreateSchema, terminatorUpdateSchema,
} from '@/db/requests/survey';
import type { AppContext } from '../context';
import { currentUser, type SessionUser } from '../http/require-role';
import { body, params, query } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { createSurveyService } from './service';

type Create<S extends z.ZodType> = (actor: SessionUser, siteId: number, input: z.output<S>) => unknown;
type Update<S extends z.ZodType> = (actor: SessionUser, siteId: number, id: number, input: z.output<S>) => unknown;
type Delete = (actor: SessionUser, siteId: number, id: number, version: number) => unknown;

export function surveyRouter(ctx: AppContext): Router {
  const r = Router();
  const survey = createSurveyService(ctx);
  const read = ctx.requireRole(...STAFF);
  const edit = ctx.requireRole(...EDITORS);
  const base = '/sites/:siteId/survey';

  // Writes take no query (a DELETE names its version there); anything else in the query is refused.
  const siteId = (req: Request) => {
    if (req.method !== 'GET' && req.method !== 'DELETE') query(req, emptyQuerySchema);
    return params(req, siteParamsSchema).siteId;
  };
  const item = (req: Request) => {
    if (req.method !== 'DELETE') query(req, emptyQuerySchema);
    return params(req, itemParamsSchema);
  };

  r.get('/survey/sites', read, (req, res) => {
    res.json({ items: survey.sites(query(req, sitesQuerySchema).q) });
  });

  r.get(base, read, (req, res) => {
    const id = siteId(req);
    query(req, emptyQuerySchema);
    res.json(survey.view(id));
  });

  r.get(`${base}/report.txt`, read, (req, res) => {
    const id = siteId(req);
    const { download } = query(req, reportQuerySchema);
    const { bytes } = survey.report(currentUser(req), id);
    res.set('Content-Type', 'text/plain; charset=IBM437');
    if (download === '1') res.set('Content-Disposition', `attachment; filename="SURVEY${id}.TXT"`);
    res.send(Buffer.from(bytes));
  });

  r.put(`${base}/settings`, edit, (req, res) => {
    const id = siteId(req);
    res.json(survey.updateSettings(currentUser(req), id, body(req, settingsUpdateSchema)));
  });

  /** POST to create, PATCH to update, DELETE ?version= to remove, for one kind of survey row. */
  function crud<C extends z.ZodType, U extends z.ZodType>(path: string, s: { create: C; update: U }, f: { create: Create<C>; update: Update<U>; remove: Delete }) {
    r.post(`${base}/${path}`, edit, (req, res) => {
      const id = siteId(req);
      res.status(201).json(f.create(currentUser(req), id, body(req, s.create)));
    });
    r.patch(`${base}/${path}/:itemId`, edit, (req, res) => {
      const p = item(req);
      res.json(f.update(currentUser(req), p.siteId, p.itemId, body(req, s.update)));
    });
    r.delete(`${base}/${path}/:itemId`, edit, (req, res) => {
      const p = item(req);
      res.json(f.remove(currentUser(req), p.siteId, p.itemId, query(req, deleteQuerySchema).version));
    });
  }

  crud('jacks', { create: jackCreateSchema, update: jackUpdateSchema }, { create: survey.createJack, update: survey.updateJack, remove: survey.deleteJack });
  crud('nodes', { create: nodeCreateSchema, update: nodeUpdateSchema }, { create: survey.createNode, update: survey.updateNode, remove: survey.deleteNode });
  crud('runs', { create: runCreateSchema, update: runUpdateSchema }, { create: survey.createRun, update: survey.updateRun, remove: survey.deleteRun });
  crud('terminators', { create: terminatorCreateSchema, update: terminatorUpdateSchema }, {
    create: survey.createTerminator, update: survey.updateTerminator, remove: survey.deleteTerminator,
  });

  // Readings are taken at a jack; once taken they are corrected or removed by their own id.
  r.post(`${base}/jacks/:itemId/readings`, edit, (req, res) => {
    const p = item(req);
    res.status(201).json(survey.createReading(currentUser(req), p.siteId, p.itemId, body(req, readingCreateSchema)));
  });
  r.patch(`${base}/readings/:itemId`, edit, (req, res) => {
    const p = item(req);
    res.json(survey.updateReading(currentUser(req), p.siteId, p.itemId, body(req, readingUpdateSchema)));
  });
  r.delete(`${base}/readings/:itemId`, edit, (req, res) => {
    const p = item(req);
    res.json(survey.deleteReading(currentUser(req), p.siteId, p.itemId, query(req, deleteQuerySchema).version));
  });

  return r;
}
