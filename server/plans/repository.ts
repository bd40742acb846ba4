// Drizzle queries for plan revisions and their comments. Updates name the version they read: 0 rows changed
// means someone else got there first.
import { and, desc, eq, getTableColumns, inArray, max, sql } from 'drizzle-orm';
import { planComment, planRevision, type PlanState } from '@/db/plans';
import { site, station, user } from '@/db/schema';
import type { Db } from '../db';

export type PlanRow = typeof planRevision.$inferSelect;
export type NewPlanRow = typeof planRevision.$inferInsert;
export type CommentRow = typeof planComment.$inferSelect;

/** States a newer revision retires; a released plan already went out and stays as it was. */
const LIVE: PlanState[] = ['draft', 'in_review', 'approved', 'returned'];

/** Columns for lists and views: everything but the patched bytes. */
const { autoexecOut: _a, configOut: _c, ...planColumns } = getTableColumns(planRevision);
export type PlanMeta = Omit<PlanRow, 'autoexecOut' | 'configOut'>;

export function createPlanRepository(db: Db) {
  return {
    find(id: number): PlanRow | undefined {
      return db.select().from(planRevision).where(eq(planRevision.id, id)).get();
    },

    findMeta(id: number): PlanMeta | undefined {
      return db.select(planColumns).from(planRevision).where(eq(planRevision.id, id)).get();
    },

    /**
     * Inserts the next revision of a station and supersedes its older live ones, in one transaction, so two
     * technicians at once cannot both make "revision 3" (the unique index refuses the second).
     */
    insertRevision(values: Omit<NewPlanRow, 'revision'>): { plan: PlanMeta; superseded: number[] } {
      return db.transaction((tx) => {
        const last = tx.select({ n: max(planRevision.revision) }).from(planRevision).where(eq(planRevision.stationId, values.stationId)).get();
        const older = tx
          .select({ id: planRevision.id })
          .from(planRevision)
          .where(and(eq(planRevision.stationId, values.stationId), inArray(planRevision.state, LIVE)))
          .all()
          .map((r) => r.id);
        if (older.length > 0) {
          tx.update(planRevision)
            .set({ state: 'superseded', version: sql`${planRevision.version} + 1` })
            .where(inArray(planRevision.id, older))
            .run();
        }
        const [row] = tx
          .insert(planRevision)
          .values({ ...values, revision: (last?.n ?? 0) + 1 })
          .returning(planColumns)
          .all();
        return { plan: row!, superseded: older };
      });
    },

    /** Moves a plan from one of `from` at `version`; false when the state or version no longer match. */
    update(id: number, version: number, from: PlanState[], set: Partial<NewPlanRow>): boolean {
      const res = db
        .update(planRevision)
        .set({ ...set, version: version + 1 })
        .where(and(eq(planRevision.id, id), eq(planRevision.version, version), inArray(planRevision.state, from)))
        .run();
      return res.changes === 1;
    },

    list(filter: { stationId?: number; siteId?: number; state?: PlanState; states?: PlanState[] }) {
      const where = [
        filter.stationId ? eq(planRevision.stationId, filter.stationId) : undefined,
        filter.siteId ? eq(station.siteId, filter.siteId) : undefined,
        filter.state ? eq(planRevision.state, filter.state) : undefined,
        filter.states ? inArray(planRevision.state, filter.states) : undefined,
      ].filter((w) => w !== undefined);
      return db
        .select({
          id: planRevision.id,
          stationId: planRevision.stationId,
          revision: planRevision.revision,
          state: planRevision.state,
          planHash: planRevision.planHash,
          approvedHash: planRevision.approvedHash,
          createdAt: planRevision.createdAt,
          submittedAt: planRevision.submittedAt,
          decidedAt: planRevision.decidedAt,
          createdBy: planRevision.createdBy,
          createdByName: user.name,
          stationName: station.name,
          stationNumber: station.number,
          siteId: station.siteId,
          siteName: site.name,
          version: planRevision.version,
        })
        .from(planRevision)
        .innerJoin(station, eq(station.id, planRevision.stationId))
        .innerJoin(site, eq(site.id, station.siteId))
        .innerJoin(user, eq(user.id, planRevision.createdBy))
        .where(where.length ? and(...where) : undefined)
        .orderBy(desc(planRevision.id))
        .all();
    },

    /** Each station's newest revision (for the plans board), optionally for one site. */
    latestPerStation(siteId?: number) {
      const rows = db
        .select({ stationId: planRevision.stationId, id: planRevision.id, revision: planRevision.revision, state: planRevision.state })
        .from(planRevision)
        .innerJoin(station, eq(station.id, planRevision.stationId))
        .where(siteId ? eq(station.siteId, siteId) : undefined)
        .orderBy(desc(planRevision.id))
        .all();
      const newest = new Map<number, (typeof rows)[number]>();
      for (const r of rows) if (!newest.has(r.stationId)) newest.set(r.stationId, r);
      return [...newest.values()];
    },

    revisionsOf(stationId: number) {
      return db
        .select({ id: planRevision.id, revision: planRevision.revision, state: planRevision.state, createdAt: planRevision.createdAt })
        .from(planRevision)
        .where(eq(planRevision.stationId, stationId))
        .orderBy(desc(planRevision.revision))
        .all();
    },

    addComment(values: typeof planComment.$inferInsert): CommentRow {
      return db.insert(planComment).values(values).returning().get();
    },

    comments(planId: number) {
      return db
        .select({ id: planComment.id, file: planComment.file, line: planComment.line, body: planComment.body, createdAt: planComment.createdAt, authorId: planComment.authorId, authorName: user.name, authorRole: user.role })
        .from(planComment)
        .innerJoin(user, eq(user.id, planComment.authorId))
        .where(eq(planComment.planId, planId))
        .orderBy(planComment.id)
        .all();
    },

    userName(id: string | null): { id: string; name: string } | null {
      if (!id) return null;
      const row = db.select({ id: user.id, name: user.name }).from(user).where(eq(user.id, id)).get();
      return row ?? null;
    },

    userContact(id: string) {
      return db.select({ id: user.id, name: user.name, email: user.email, role: user.role }).from(user).where(eq(user.id, id)).get();
    },
  };
}

export type PlanRepository = ReturnType<typeof createPlanRepository>;
