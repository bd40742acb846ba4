// Rollout bundle downloads: who, when, which plan revisions and hashes. Fetching a record again rebuilds
// the same zip byte for byte (fixed timestamps from generatedAt).
import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';
import { site } from './sites';

export const bundleRecord = sqliteTable('bundle_record', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  siteId: integer('site_id')
    .notNull()
    .references(() => site.id),
  createdBy: text('created_by')
    .notNull()
    .references(() => user.id),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  generatedAt: text('generated_at').notNull(),
  state: text('state', { enum: ['building', 'done', 'failed'] }).notNull(),
  plans: text('plans', { mode: 'json' }).$type<Array<{ planId: number; stationId: number; planHash: string }>>().notNull(),
  zipSha256: text('zip_sha256'),
  zipSize: integer('zip_size'),
});
