// Drizzle queries for sites.
import { and, asc, count, desc, eq, isNotNull, isNull, like, or, sql, type SQL } from 'drizzle-orm';
import { site, station } from '@/db/schema';
import type { Db } from '../db';

export type SiteRow = typeof site.$inferSelect;
export type SiteListFilter = { sort: 'name' | 'createdAt' | 'updatedAt' | 'stations'; dir: 'asc' | 'desc'; q?: string; archived: boolean; limit: number; offset: number };

// Written out with table names: inside a subquery Drizzle prints bare column names, and a bare "id" would
// mean the station's id.
const stationCount = sql<number>`(select count(*) from "station" where "station"."site_id" = "site"."id" and "station"."archived_at" is null)`;

export function createSiteRepository(db: Db) {
  function where(f: Pick<SiteListFilter, 'q' | 'archived'>): SQL | undefined {
    const parts: SQL[] = [f.archived ? isNotNull(site.archivedAt) : isNull(site.archivedAt)];
    if (f.q) {
      const pattern = `%${f.q.replace(/[%_]/g, '')}%`;
      parts.push(or(like(site.name, pattern), like(site.address, pattern), like(site.contact, pattern))!);
    }
    return and(...parts);
  }

  return {
    list(f: SiteListFilter) {
      const column = f.sort === 'stations' ? stationCount : site[f.sort];
      const order = f.dir === 'desc' ? desc(column) : asc(column);
      const items = db
        .select({ site, stations: stationCount })
        .from(site)
        .where(where(f))
        .orderBy(order, asc(site.id))
        .limit(f.limit)
        .offset(f.offset)
        .all()
        .map((r) => ({ ...r.site, stations: Number(r.stations) }));
      const total = db.select({ n: count() }).from(site).where(where(f)).get()!.n;
      return { items, total };
    },
    find(id: number): SiteRow | undefined {
      return db.select().from(site).where(eq(site.id, id)).get();
    },
    insert(values: Omit<typeof site.$inferInsert, 'id'>): SiteRow {
      return db.insert(site).values(values).returning().get();
    },
    /** Updates only when the row still has `version`; undefined when it did not (stale or missing). */
    update(id: number, version: number, values: Partial<typeof site.$inferInsert>): SiteRow | undefined {
      return db
        .update(site)
        .set({ ...values, updatedAt: new Date(), version: version + 1 })
        .where(and(eq(site.id, id), eq(site.version, version)))
        .returning()
        .get();
    },
    usedNumbers(siteId: number): number[] {
      return db.select({ n: station.number }).from(station).where(eq(station.siteId, siteId)).all().map((r) => r.n);
    },
  };
}
