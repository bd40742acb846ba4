// /api/sites/:id/import (preview, then write) and /api/sites/:id/export.csv: the station directory as CSV.
import { Router } from 'express';
import { csvImportSchema } from '@/db/requests/sites';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-role';
import { body } from '../http/validate';
import { EDITORS, STAFF } from '../roles';
import { directoryRows, filterAndSort } from '../stations/directory';
import { createStationRepository } from '../stations/repository';
import { directoryCsv } from './csv-export';
import { createImportService } from './import-service';
import { idParam } from './params';
import { createSiteService } from './service';
import { to83Base } from '@/generators/dos/names';

export function siteDirectoryRouter(ctx: AppContext): Router {
  const r = Router();
  const imports = createImportService(ctx);
  const sites = createSiteService(ctx);
  const stations = createStationRepository(ctx.db);
  const editors = ctx.requireRole(...EDITORS);
  const staff = ctx.requireRole(...STAFF);
  const siteId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That site');

  r.post('/sites/:id/import/preview', editors, (req, res) => {
    const id = siteId(req);
    res.json(imports.preview(id, body(req, csvImportSchema).csv));
  });
  r.post('/sites/:id/import', editors, (req, res) => {
    const id = siteId(req);
    const outcome = imports.commit(currentUser(req), id, body(req, csvImportSchema));
    if (!outcome.ok) {
      const n = outcome.preview.invalid;
      const message = n > 0 ? `Nothing was imported: ${n} row${n === 1 ? ' has' : 's have'} errors.` : 'Nothing was imported: the file has errors.';
      res.status(400).json({ error: { code: 'import_invalid', message }, preview: outcome.preview });
      return;
    }
    res.status(201).json({ created: outcome.created });
  });
  r.get('/sites/:id/export.csv', staff, (req, res) => {
    const s = sites.get(siteId(req));
    const rows = filterAndSort(directoryRows(stations, s.id), { sort: 'number', dir: 'asc', archived: false });
    ctx.audit.record(currentUser(req), { action: 'site.export', entity: 'site', entityId: s.id, siteId: s.id, details: { stations: rows.length } });
    res.type('text/csv; charset=utf-8').attachment(`${to83Base(s.name, 'SITE')}.CSV`).send(directoryCsv(rows));
  });
  return r;
}
