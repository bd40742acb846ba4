// Drizzle queries for rollout bundles: the site's stations with their newest plan, the rows a bundle is
// built from, and the bundle records. A record moves building → done | failed once; every move names the
// state it expects, so two requests cannot both finish the same record.
import { and, desc, eq, getTableColumns, inArray, isNull, lt } from 'drizzle-orm';
import { bundleRecord, type BundleRecordPlan, type BundleSnapshot } from '@/db/bundles';
import { planRevision } from '@/db/plans';
import { site, startupFile, station, user } from '@/db/schema';
import type { Db } from '../db';

export type BundleRecordRow = typeof bundleRecord.$inferSelect;
export type PlanRow = typeof planRevision.$inferSelect;
export type StationRow = typeof station.$inferSelect;
export type SiteRow = typeof site.$inferSelect;

/** A record for lists: everything but the survey bytes. */
const { surveyReport: _s, ...recordColumns } = getTableColumns(bundleRecord);
export type BundleRecordMeta = Omit<BundleRecordRow, 'surveyReport'>;

/** Plan columns without the patched bytes. */
const { autoexecOut: _a, configOut: _c, ...planMetaColumns } = getTableColumns(planRevision);
export type PlanMetaRow = Omit<PlanRow, 'autoexecOut' | 'configOut'>;

export function createBundleRepository(db: Db) {
  return {
    site: (id: number): SiteRow | undefined => db.select().from(site).where(eq(site.id, id)).get(),

    /** Every station of the site, by number. */
    stations: (siteId: number): StationRow[] => db.select().from(station).where(eq(station.siteId, siteId)).orderBy(station.number).all(),

    /** Each station's newest plan revision (without bytes), for the stations given. */
    newestPlans(stationIds: number[]): Map<number, PlanMetaRow> {
      const newest = new Map<number, PlanMetaRow>();
      if (stationIds.length === 0) return newest;
      const rows = db.select(planMetaColumns).from(planRevision).where(inArray(planRevision.stationId, stationIds)).orderBy(desc(planRevision.revision)).all();
      for (const row of rows) if (!newest.has(row.stationId)) newest.set(row.stationId, row);
      return newest;
    },

    /** Plan revisions with their bytes, in the order of `ids`. */
    plans(ids: number[]): PlanRow[] {
      if (ids.length === 0) return [];
      const rows = db.select().from(planRevision).where(inArray(planRevision.id, ids)).all();
      const byId = new Map(rows.map((r) => [r.id, r]));
      return ids.map((id) => byId.get(id)).filter((r): r is PlanRow => !!r);
    },

    /** Startup-file revisions by id: their bytes, or null for "this machine has none". */
    fileBytes(ids: number[]): Map<number, { absent: boolean; content: Buffer; sha256: string }> {
      const out = new Map<number, { absent: boolean; content: Buffer; sha256: string }>();
      if (ids.length === 0) return out;
      const rows = db.select({ id: startupFile.id, absent: startupFile.absent, content: startupFile.content, sha256: startupFile.sha256 }).from(startupFile).where(inArray(startupFile.id, ids)).all();
      for (const r of rows) out.set(r.id, r);
      return out;
    },

    userNames(ids: string[]): Map<string, string> {
      if (ids.length === 0) return new Map();
      const rows = db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, [...new Set(ids)])).all();
      return new Map(rows.map((r) => [r.id, r.name]));
    },

    insert(values: { siteId: number; createdBy: string; generatedAt: string; plans: BundleRecordPlan[]; snapshot: BundleSnapshot; surveyReport: Buffer | null }): BundleRecordMeta {
      return db
        .insert(bundleRecord)
        .values({ ...values, createdAt: new Date(), state: 'building' })
        .returning(recordColumns)
        .get();
    },

    find: (id: number): BundleRecordRow | undefined => db.select().from(bundleRecord).where(eq(bundleRecord.id, id)).get(),

    /** Past records of a site, newest first, with the name of who made each. */
    list(siteId: number) {
      return db
        .select({ record: recordColumns, createdByName: user.name })
        .from(bundleRecord)
        .innerJoin(user, eq(user.id, bundleRecord.createdBy))
        .where(eq(bundleRecord.siteId, siteId))
        .orderBy(desc(bundleRecord.id))
        .all();
    },

    /** The newest done record of the site that released `planId`, if any. */
    releasedIn(siteId: number, planId: number): BundleRecordMeta | undefined {
      const rows = db.select(recordColumns).from(bundleRecord).where(and(eq(bundleRecord.siteId, siteId), eq(bundleRecord.state, 'done'))).orderBy(desc(bundleRecord.id)).all();
      return rows.find((r) => r.plans.some((p) => p.planId === planId));
    },

    /** Claims a building record for its one streaming download; false when it was claimed or finished already. */
    claim(id: number): boolean {
      return db.update(bundleRecord).set({ startedAt: new Date() }).where(and(eq(bundleRecord.id, id), eq(bundleRecord.state, 'building'), isNull(bundleRecord.startedAt))).run().changes === 1;
    },

    markDone(id: number, zipSha256: string, zipSize: number): boolean {
      return db.update(bundleRecord).set({ state: 'done', zipSha256, zipSize, finishedAt: new Date() }).where(and(eq(bundleRecord.id, id), eq(bundleRecord.state, 'building'))).run().changes === 1;
    },

    markFailed(id: number, failure: string): boolean {
      return db.update(bundleRecord).set({ state: 'failed', failure, finishedAt: new Date() }).where(and(eq(bundleRecord.id, id), eq(bundleRecord.state, 'building'))).run().changes === 1;
    },

    /** Building records made before `before` that never finished (the server stopped, the tab closed first). */
    abandoned(before: Date): BundleRecordMeta[] {
      return db.select(recordColumns).from(bundleRecord).where(and(eq(bundleRecord.state, 'building'), lt(bundleRecord.createdAt, before))).all();
    },
  };
}

export type BundleRepository = ReturnType<typeof createBundleRepository>;
