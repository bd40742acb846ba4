// Append-only audit trail. Nothing in the API updates or deletes it; SQLite triggers in the migration
// refuse UPDATE and DELETE as well.
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

export const auditEvent = sqliteTable(
  'audit_event',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    at: integer('at', { mode: 'timestamp_ms' }).notNull(),
    actorId: text('actor_id'),
    actorEmail: text('actor_email'),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    siteId: integer('site_id'),
    details: text('details', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
  },
  (t) => [index('audit_at_idx').on(t.at), index('audit_entity_idx').on(t.entity, t.entityId)],
);
