// Drizzle queries for stations, their profiles, startup-file revisions and the newest plan state.
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { planRevision, profile, startupFile, station } from '@/db/schema';
import type { Db } from '../db';

export type StationRow = typeof station.$inferSelect;
export type ProfileRow = typeof profile.$inferSelect;
export type StartupFileRow = typeof startupFile.$inferSelect;

/** Every column of a file revision but its bytes. */
const fileMeta = {
  id: startupFile.id,
  stationId: startupFile.stationId,
  kind: startupFile.kind,
  absent: startupFile.absent,
  sha256: startupFile.sha256,
  size: startupFile.size,
  source: startupFile.source,
  uploadedBy: startupFile.uploadedBy,
  uploadedAt: startupFile.uploadedAt,
};
export type FileMetaRow = Omit<StartupFileRow, 'content'>;

export function createStationRepository(db: Db) {
  return {
    find: (id: number): StationRow | undefined => db.select().from(station).where(eq(station.id, id)).get(),
    forSite: (siteId: number): StationRow[] => db.select().from(station).where(eq(station.siteId, siteId)).all(),
    byName: (siteId: number, name: string) =>
      db.select().from(station).where(and(eq(station.siteId, siteId), sql`upper(${station.name}) = ${name.toUpperCase()}`)).get(),
    byNumber: (siteId: number, number: number) => db.select().from(station).where(and(eq(station.siteId, siteId), eq(station.number, number))).get(),
    insert: (values: Omit<typeof station.$inferInsert, 'id'>): StationRow => db.insert(station).values(values).returning().get(),
    update: (id: number, version: number, values: Partial<typeof station.$inferInsert>): StationRow | undefined =>
      db
        .update(station)
        .set({ ...values, updatedAt: new Date(), version: version + 1 })
        .where(and(eq(station.id, id), eq(station.version, version)))
        .returning()
        .get(),

    profile: (stationId: number): ProfileRow | undefined => db.select().from(profile).where(eq(profile.stationId, stationId)).get(),
    profilesFor: (ids: number[]): ProfileRow[] => (ids.length ? db.select().from(profile).where(inArray(profile.stationId, ids)).all() : []),
    insertProfile: (values: typeof profile.$inferInsert): ProfileRow => db.insert(profile).values(values).returning().get(),
    updateProfile: (stationId: number, version: number, values: Partial<typeof profile.$inferInsert>): ProfileRow | undefined =>
      db
        .update(profile)
        .set({ ...values, updatedAt: new Date(), version: version + 1 })
        .where(and(eq(profile.stationId, stationId), eq(profile.version, version)))
        .returning()
        .get(),

    /** Every revision of a station's files, newest first. */
    files: (stationId: number): FileMetaRow[] =>
      db.select(fileMeta).from(startupFile).where(eq(startupFile.stationId, stationId)).orderBy(desc(startupFile.id)).all(),
    file: (stationId: number, fileId: number): StartupFileRow | undefined =>
      db.select().from(startupFile).where(and(eq(startupFile.stationId, stationId), eq(startupFile.id, fileId))).get(),
    /** The newest revision of each kind for many stations at once (for the directory). */
    currentFilesFor(ids: number[]): FileMetaRow[] {
      if (ids.length === 0) return [];
      const newest = db
        .select({ id: sql<number>`max(${startupFile.id})` })
        .from(startupFile)
        .where(inArray(startupFile.stationId, ids))
        .groupBy(startupFile.stationId, startupFile.kind)
        .all()
        .map((r) => r.id);
      return newest.length ? db.select(fileMeta).from(startupFile).where(inArray(startupFile.id, newest)).all() : [];
    },
    insertFile: (values: Omit<typeof startupFile.$inferInsert, 'id'>): FileMetaRow => db.insert(startupFile).values(values).returning(fileMeta).get(),

    /** The state of each station's newest plan revision. */
    planStates(ids: number[]): Map<number, string> {
      if (ids.length === 0) return new Map();
      const rows = db
        .select({ stationId: planRevision.stationId, state: planRevision.state, revision: planRevision.revision })
        .from(planRevision)
        .where(inArray(planRevision.stationId, ids))
        .orderBy(planRevision.revision)
        .all();
      return new Map(rows.map((r) => [r.stationId, r.state]));
    },
  };
}

export type StationRepository = ReturnType<typeof createStationRepository>;
