// Invitations: an admin invites a person by e-mail; the link sets their password once, before it expires.
import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';

export const invitation = sqliteTable('invitation', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  email: text('email').notNull(),
  name: text('name').notNull(),
  role: text('role', { enum: ['admin', 'lead', 'technician', 'user'] }).notNull(),
  /** SHA-256 of the token in the link; the token itself is never stored. */
  tokenHash: text('token_hash').notNull().unique(),
  invitedBy: text('invited_by').references(() => user.id),
  stationId: integer('station_id'),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
  usedAt: integer('used_at', { mode: 'timestamp_ms' }),
  userId: text('user_id').references(() => user.id),
});
