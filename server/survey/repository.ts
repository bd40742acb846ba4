// Drizzle queries for the survey tables. No rules here: the service decides what may be written.
import { and, asc, eq, sql } from 'drizzle-orm';
import {
  site, surveyJack, surveyNode, surveyPairTest, surveyRun, surveySettings, surveyTerminator,
} from '@/db/schema';
import type { Db } from '../db';

/** The survey tables whose rows are edited one by one (each has id, siteId, version, updatedAt). */
export const SURVEY_TABLES = {
  jack: surveyJack,
  reading: surveyPairTest,
  node: surveyNode,
  run: surveyRun,
  terminator: surveyTerminator,
} as const;
export type SurveyEntity = keyof typeof SURVEY_TABLES;
export type Row<E extends SurveyEntity> = (typeof SURVEY_TABLES)[E]['$inferSelect'];
export type NewRow<E extends SurveyEntity> = (typeof SURVEY_TABLES)[E]['$inferInsert'];

export type SurveyRows = {
  jacks: Row<'jack'>[];
  readings: Row<'reading'>[];
  nodes: Row<'node'>[];
  runs: Row<'run'>[];
  terminators: Row<'terminator'>[];
  settings: typeof surveySettings.$inferSelect | null;
};

// Drizzle's builders do not accept a union of tables; the entity map keeps the casts in one place.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnyTable = any;

export function createSurveyRepository(db: Db) {
  function site_(id: number) {
    return db.select({ id: site.id, name: site.name }).from(site).where(eq(site.id, id)).get() ?? null;
  }

  function allRows(siteId: number): SurveyRows {
    return {
      jacks: db.select().from(surveyJack).where(eq(surveyJack.siteId, siteId)).orderBy(asc(surveyJack.ref)).all(),
      // Oldest first: a later reading of the same pair replaces an earlier one in the computation.
      readings: db.select().from(surveyPairTest).where(eq(surveyPairTest.siteId, siteId))
        .orderBy(asc(surveyPairTest.testedAt), asc(surveyPairTest.id)).all(),
      nodes: db.select().from(surveyNode).where(eq(surveyNode.siteId, siteId)).orderBy(asc(surveyNode.id)).all(),
      runs: db.select().from(surveyRun).where(eq(surveyRun.siteId, siteId)).orderBy(asc(surveyRun.id)).all(),
      terminators: db.select().from(surveyTerminator).where(eq(surveyTerminator.siteId, siteId)).orderBy(asc(surveyTerminator.id)).all(),
      settings: db.select().from(surveySettings).where(eq(surveySettings.siteId, siteId)).get() ?? null,
    };
  }

  function get<E extends SurveyEntity>(entity: E, id: number): Row<E> | null {
    const t: AnyTable = SURVEY_TABLES[entity];
    return (db.select().from(t).where(eq(t.id, id)).get() as Row<E> | undefined) ?? null;
  }

  function insert<E extends SurveyEntity>(entity: E, values: NewRow<E>): Row<E> {
    const t: AnyTable = SURVEY_TABLES[entity];
    return db.insert(t).values(values).returning().get() as Row<E>;
  }

  /** Updates the row only if it still has `version`; returns the new row, or null when it changed meanwhile. */
  function update<E extends SurveyEntity>(entity: E, id: number, version: number, values: Partial<NewRow<E>>): Row<E> | null {
    const t: AnyTable = SURVEY_TABLES[entity];
    const row = db.update(t)
      .set({ ...values, updatedAt: new Date(), version: sql`${t.version} + 1` })
      .where(and(eq(t.id, id), eq(t.version, version)))
      .returning()
      .get() as Row<E> | undefined;
    return row ?? null;
  }

  /** Deletes the row only if it still has `version`; false when it changed meanwhile. */
  function remove(entity: SurveyEntity, id: number, version: number): boolean {
    const t: AnyTable = SURVEY_TABLES[entity];
    return db.delete(t).where(and(eq(t.id, id), eq(t.version, version))).run().changes === 1;
  }

  function refsIn(entity: 'jack' | 'node' | 'run', siteId: number): string[] {
    const t: AnyTable = SURVEY_TABLES[entity];
    return (db.select({ ref: t.ref }).from(t).where(eq(t.siteId, siteId)).all() as Array<{ ref: string }>).map((r) => r.ref);
  }

  function readingsOfJack(jackId: number) {
    return db.select({ id: surveyPairTest.id }).from(surveyPairTest).where(eq(surveyPairTest.jackId, jackId)).all();
  }

  function deleteReadingsOfJack(jackId: number): number {
    return db.delete(surveyPairTest).where(eq(surveyPairTest.jackId, jackId)).run().changes;
  }

  function unlinkJackNodes(jackId: number): number {
    return db.update(surveyNode).set({ jackId: null, updatedAt: new Date(), version: sql`${surveyNode.version} + 1` })
      .where(eq(surveyNode.jackId, jackId)).run().changes;
  }

  function runsAtNode(nodeId: number) {
    return db.select({ ref: surveyRun.ref }).from(surveyRun)
      .where(sql`${surveyRun.fromNodeId} = ${nodeId} or ${surveyRun.toNodeId} = ${nodeId}`).all().map((r) => r.ref);
  }

  function terminatorsAtNode(nodeId: number) {
    return db.select({ id: surveyTerminator.id }).from(surveyTerminator).where(eq(surveyTerminator.nodeId, nodeId)).all();
  }

  function settings(siteId: number) {
    return db.select().from(surveySettings).where(eq(surveySettings.siteId, siteId)).get() ?? null;
  }

  function insertSettings(values: typeof surveySettings.$inferInsert) {
    return db.insert(surveySettings).values(values).returning().get();
  }

  function updateSettings(siteId: number, version: number, values: Partial<typeof surveySettings.$inferInsert>) {
    return db.update(surveySettings)
      .set({ ...values, updatedAt: new Date(), version: sql`${surveySettings.version} + 1` })
      .where(and(eq(surveySettings.siteId, siteId), eq(surveySettings.version, version)))
      .returning().get() ?? null;
  }

  function clearCentre(siteId: number, nodeId: number) {
    return db.update(surveySettings)
      .set({ centreNodeId: null, updatedAt: new Date(), version: sql`${surveySettings.version} + 1` })
      .where(and(eq(surveySettings.siteId, siteId), eq(surveySettings.centreNodeId, nodeId))).run().changes;
  }

  function sites() {
    return db.select({ id: site.id, name: site.name, archivedAt: site.archivedAt }).from(site).orderBy(asc(site.name)).all();
  }

  return {
    site: site_, sites, allRows, get, insert, update, remove, refsIn, readingsOfJack, deleteReadingsOfJack, unlinkJackNodes,
    runsAtNode, terminatorsAtNode, settings, insertSettings, updateSettings, clearCentre,
    transaction: <T>(fn: () => T): T => db.transaction(() => fn()),
  };
}

export type SurveyRepository = ReturnType<typeof createSurveyRepository>;
