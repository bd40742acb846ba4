// Plan revisions and the review on them. An approval is pinned to the hashes it saw.
import { blob, index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';
import { station } from './sites';

export const PLAN_STATES = ['draft', 'in_review', 'approved', 'returned', 'released', 'superseded'] as const;
export type PlanState = (typeof PLAN_STATES)[number];

export const planRevision = sqliteTable(
  'plan_revision',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    stationId: integer('station_id')
      .notNull()
      .references(() => station.id),
    revision: integer('revision').notNull(),
    state: text('state', { enum: PLAN_STATES }).notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => user.id),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    /** Hashes of every input and output (SHA-256 hex). */
    profileHash: text('profile_hash').notNull(),
    kitHash: text('kit_hash').notNull(),
    autoexecInHash: text('autoexec_in_hash'),
    configInHash: text('config_in_hash'),
    autoexecOutHash: text('autoexec_out_hash').notNull(),
    configOutHash: text('config_out_hash'),
    /** Hash over all the hashes above: what an approval pins. */
    planHash: text('plan_hash').notNull(),
    autoexecFileId: integer('autoexec_file_id'),
    configFileId: integer('config_file_id'),
    autoexecOut: blob('autoexec_out', { mode: 'buffer' }).$type<Buffer>().notNull(),
    configOut: blob('config_out', { mode: 'buffer' }).$type<Buffer>(),
    /** The engine's result without the bytes: diff, checks, changes, boot preview, insertion point. */
    result: text('result', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
    /** Technician's written reason per warning slug+line key. */
    warningReasons: text('warning_reasons', { mode: 'json' }).$type<Record<string, string>>().notNull(),
    submittedAt: integer('submitted_at', { mode: 'timestamp_ms' }),
    /** Who sent it for review: the plan's technician, told of the decision (a user's draft is made by the user). */
    submittedBy: text('submitted_by').references(() => user.id),
    decidedBy: text('decided_by').references(() => user.id),
    decidedAt: integer('decided_at', { mode: 'timestamp_ms' }),
    decisionComment: text('decision_comment'),
    /** The planHash the lead saw when approving. */
    approvedHash: text('approved_hash'),
    releasedAt: integer('released_at', { mode: 'timestamp_ms' }),
    version: integer('version').notNull().default(1),
  },
  (t) => [
    index('plan_station_idx').on(t.stationId),
    index('plan_state_idx').on(t.state),
    uniqueIndex('plan_station_revision_uq').on(t.stationId, t.revision),
  ],
);

export const planComment = sqliteTable('plan_comment', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  planId: integer('plan_id')
    .notNull()
    .references(() => planRevision.id),
  authorId: text('author_id')
    .notNull()
    .references(() => user.id),
  file: text('file', { enum: ['AUTOEXEC.BAT', 'CONFIG.SYS'] }),
  line: integer('line'),
  body: text('body').notNull(),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
});
