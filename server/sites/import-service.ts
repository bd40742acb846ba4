// Writes a checked inventory: all rows in one transaction, or nothing when any row has an error.
import type { CsvImportInput } from '@/db/requests/sites';
import type { AppContext } from '../context';
import { badRequest, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { createKitRepository } from '../kits/repository';
import { createStationRepository } from '../stations/repository';
import { previewImport, type ImportPreview } from './csv-import';
import { createSiteRepository } from './repository';

export function createImportService(ctx: AppContext) {
  const sites = createSiteRepository(ctx.db);
  const stations = createStationRepository(ctx.db);
  const kits = createKitRepository(ctx.db);

  function preview(siteId: number, csv: string): ImportPreview {
    const s = sites.find(siteId);
    if (!s) throw notFound('That site');
    return previewImport(csv, s.numberRanges, stations.forSite(siteId));
  }

  function commit(actor: SessionUser, siteId: number, input: CsvImportInput) {
    const checked = preview(siteId, input.csv);
    if (checked.fileErrors.length || checked.invalid > 0) return { ok: false as const, preview: checked };
    if (input.kitId && !kits.find(input.kitId)) throw badRequest('That kit was not found.', { kitId: 'That kit was not found.' });
    const now = new Date();
    const created = ctx.db.transaction(() =>
      checked.rows.map((row) => {
        const v = row.values;
        const st = stations.insert({ siteId, kind: v.kind, name: v.name, number: v.number!, location: v.location, notes: v.notes, createdAt: now, updatedAt: now });
        if (st.kind === 'pc') {
          const data = { ...(v.dos ? { dos: v.dos } : {}), ...(v.networkPort ? { network: { port: v.networkPort } } : {}) };
          stations.insertProfile({ stationId: st.id, data, kitId: input.kitId ?? null, wizardStep: 'dos', updatedBy: actor.id, updatedAt: now });
        }
        return { id: st.id, name: st.name, number: st.number, kind: st.kind };
      }),
    );
    ctx.audit.record(actor, { action: 'site.import', entity: 'site', entityId: siteId, siteId, details: { stations: created.length } });
    return { ok: true as const, created };
  }

  return { preview, commit };
}
