// Sites: list, read, create, update (optimistic locking), archive and restore.
import type { SiteCreateInput, SiteUpdateInput } from '@/db/requests/sites';
import { siteCreateSchema } from '@/db/requests/sites';
import type { AppContext } from '../context';
import { conflict, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { nextFreeNumbers } from './next-number';
import { createSiteRepository, type SiteListFilter, type SiteRow } from './repository';

export function createSiteService(ctx: AppContext) {
  const repo = createSiteRepository(ctx.db);

  function get(id: number): SiteRow {
    const row = repo.find(id);
    if (!row) throw notFound('That site');
    return row;
  }

  function withNext(row: SiteRow) {
    return { ...row, nextNumbers: nextFreeNumbers(row.numberRanges, repo.usedNumbers(row.id)) };
  }

  /** Applies a versioned update or explains why not: 404 for an unknown id, 409 when someone saved first. */
  function versioned(id: number, version: number, values: Parameters<typeof repo.update>[2]): SiteRow {
    const row = repo.update(id, version, values);
    if (row) return row;
    const current = get(id);
    throw conflict(`This site was changed by someone else (now version ${current.version}). Reload it and make your change again.`, 'stale');
  }

  return {
    list: (f: SiteListFilter) => repo.list(f),
    get: (id: number) => withNext(get(id)),
    nextNumbers: (id: number) => nextFreeNumbers(get(id).numberRanges, repo.usedNumbers(id)),
    create(actor: SessionUser, input: SiteCreateInput) {
      const values = siteCreateSchema.parse(input);
      const now = new Date();
      const row = repo.insert({ ...values, createdAt: now, updatedAt: now });
      ctx.audit.record(actor, { action: 'site.create', entity: 'site', entityId: row.id, siteId: row.id, details: { name: row.name } });
      return withNext(row);
    },
    update(actor: SessionUser, id: number, input: SiteUpdateInput) {
      const { version, ...values } = input;
      const row = versioned(id, version, values);
      ctx.audit.record(actor, { action: 'site.update', entity: 'site', entityId: id, siteId: id, details: { fields: Object.keys(values) } });
      return withNext(row);
    },
    setArchived(actor: SessionUser, id: number, version: number, archived: boolean) {
      const row = versioned(id, version, { archivedAt: archived ? new Date() : null });
      ctx.audit.record(actor, { action: archived ? 'site.archive' : 'site.restore', entity: 'site', entityId: id, siteId: id });
      return withNext(row);
    },
  };
}

export type SiteService = ReturnType<typeof createSiteService>;
