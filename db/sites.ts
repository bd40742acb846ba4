// Sites (client offices), kits (the network software), stations (devices on the network),
// PC profiles and startup-file revisions. Every editable row carries `version` for optimistic locking:
// an update names the version it read, and a stale one is refused with 409.
import { blob, integer, sqliteTable, text, uniqueIndex, index } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';

export type NumberRanges = Record<'pc' | 'printer' | 'modem' | 'other', [number, number]>;

export const site = sqliteTable('site', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  name: text('name').notNull(),
  address: text('address').notNull().default(''),
  contact: text('contact').notNull().default(''),
  notes: text('notes').notNull().default(''),
  numberRanges: text('number_ranges', { mode: 'json' }).$type<NumberRanges>().notNull(),
  archivedAt: integer('archived_at', { mode: 'timestamp_ms' }),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  version: integer('version').notNull().default(1),
});

export const kit = sqliteTable('kit', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  name: text('name').notNull().unique(),
  programPath: text('program_path').notNull(),
  programArgs: text('program_args').notNull().default(''),
  baud: integer('baud').notNull(),
  parity: text('parity', { enum: ['N', 'E', 'O', 'M', 'S'] }).notNull(),
  dataBits: integer('data_bits').notNull(),
  stopBits: integer('stop_bits').notNull(),
  minDos: text('min_dos').notNull(),
  residentKB: integer('resident_kb').notNull(),
  /** CONFIG.SYS needs: minimum FILES and BUFFERS, and whole lines (e.g. a DEVICE= line). */
  configFiles: integer('config_files'),
  configBuffers: integer('config_buffers'),
  configLines: text('config_lines', { mode: 'json' }).$type<string[]>().notNull(),
  archivedAt: integer('archived_at', { mode: 'timestamp_ms' }),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  version: integer('version').notNull().default(1),
});

export const station = sqliteTable(
  'station',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id')
      .notNull()
      .references(() => site.id),
    kind: text('kind', { enum: ['pc', 'printer', 'modem', 'other'] }).notNull(),
    name: text('name').notNull(),
    number: integer('number').notNull(),
    location: text('location').notNull().default(''),
    notes: text('notes').notNull().default(''),
    /** The office user (role `user`) whose own station this is. */
    userId: text('user_id').references(() => user.id),
    archivedAt: integer('archived_at', { mode: 'timestamp_ms' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
    version: integer('version').notNull().default(1),
  },
  (t) => [
    uniqueIndex('station_site_name_uq').on(t.siteId, t.name),
    uniqueIndex('station_site_number_uq').on(t.siteId, t.number),
    index('station_user_idx').on(t.userId),
  ],
);

/**
 * A PC station's profile: the engine's profile (see generators/engine/profile.ts) minus the files,
 * kept as JSON, plus the kit it uses and where the wizard left off.
 */
export const profile = sqliteTable('profile', {
  stationId: integer('station_id')
    .primaryKey()
    .references(() => station.id),
  data: text('data', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
  kitId: integer('kit_id').references(() => kit.id),
  wizardStep: text('wizard_step').notNull().default('identity'),
  updatedBy: text('updated_by').references(() => user.id),
  updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  version: integer('version').notNull().default(1),
});

/** Startup files as revisions: a new upload never overwrites an older one. */
export const startupFile = sqliteTable(
  'startup_file',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    stationId: integer('station_id')
      .notNull()
      .references(() => station.id),
    kind: text('kind', { enum: ['AUTOEXEC.BAT', 'CONFIG.SYS'] }).notNull(),
    /** True when the machine has no such file (recorded on purpose, not missing data). */
    absent: integer('absent', { mode: 'boolean' }).notNull().default(false),
    content: blob('content', { mode: 'buffer' }).$type<Buffer>().notNull(),
    sha256: text('sha256').notNull(),
    size: integer('size').notNull(),
    source: text('source', { enum: ['upload', 'paste', 'user', 'seed', 'none'] }).notNull(),
    uploadedBy: text('uploaded_by').references(() => user.id),
    uploadedAt: integer('uploaded_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (t) => [index('startup_file_station_idx').on(t.stationId, t.kind)],
);
