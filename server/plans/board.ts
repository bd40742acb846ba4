// The plans board: every PC of a site (or of all sites) with its newest plan revision and whether that still
// matches the station, so a technician sees what to plan next and a lead what is approved.
import { and, eq, isNull } from 'drizzle-orm';
import { site, station } from '@/db/schema';
import type { AppContext } from '../context';
import { freshnessOf } from './current';
import { createPlanRepository } from './repository';

export function planBoard(ctx: AppContext, siteId?: number) {
  const repo = createPlanRepository(ctx.db);
  const latest = new Map(repo.latestPerStation(siteId).map((p) => [p.stationId, p]));
  const pcs = ctx.db
    .select({ id: station.id, name: station.name, number: station.number, location: station.location, siteId: station.siteId, siteName: site.name })
    .from(station)
    .innerJoin(site, eq(site.id, station.siteId))
    .where(and(eq(station.kind, 'pc'), isNull(station.archivedAt), isNull(site.archivedAt), siteId ? eq(station.siteId, siteId) : undefined))
    .orderBy(site.name, station.number)
    .all();
  const sites = ctx.db.select({ id: site.id, name: site.name }).from(site).where(isNull(site.archivedAt)).orderBy(site.name).all();
  const items = pcs.map((pc) => {
    const p = latest.get(pc.id);
    if (!p) return { station: pc, plan: null };
    const meta = repo.findMeta(p.id)!;
    const live = ['draft', 'in_review', 'approved', 'returned'].includes(p.state);
    return { station: pc, plan: { id: p.id, revision: p.revision, state: p.state, stale: live && !freshnessOf(ctx, meta).current } };
  });
  return { sites, items };
}
