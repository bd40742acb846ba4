// Rollout bundle downloads: who, when, which plan revisions and hashes. Fetching a record again rebuilds
// the same zip byte for byte (fixed timestamps from generatedAt): plan revisions and file revisions never
// change, and what can change later (station names, the directory, the survey, an approver's name) is kept
// here as it was when the bundle was made.
import { blob, index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';
import { site } from './sites';

/** One PC's plan in a bundle, with the names the bundle printed. */
export type BundleRecordPlan = {
  planId: number;
  stationId: number;
  planHash: string;
  revision?: number;
  stationName?: string;
  stationNumber?: number;
  approvedBy?: string;
  approvedAt?: string;
};

/** The site as the bundle described it: header and the whole station directory. */
export type BundleSnapshot = {
  site: { name: string; address: string };
  stations: Array<{ name: string; number: number; kind: 'pc' | 'printer' | 'modem' | 'other'; location: string }>;
  /** The station ids the admin ticked, or null for the whole site. */
  selection: number[] | null;
};

export const bundleRecord = sqliteTable(
  'bundle_record',
  {
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
    plans: text('plans', { mode: 'json' }).$type<BundleRecordPlan[]>().notNull(),
    zipSha256: text('zip_sha256'),
    zipSize: integer('zip_size'),
    snapshot: text('snapshot', { mode: 'json' }).$type<BundleSnapshot>(),
    /** SURVEY.TXT as it went into the zip; null when the site had no survey (the zip holds a placeholder). */
    surveyReport: blob('survey_report', { mode: 'buffer' }).$type<Buffer>(),
    /** When the one streaming download claimed the record (a second stream of the same record is refused). */
    startedAt: integer('started_at', { mode: 'timestamp_ms' }),
    finishedAt: integer('finished_at', { mode: 'timestamp_ms' }),
    /** Why a build failed: cancelled, a plan changed meanwhile, an error while zipping. */
    failure: text('failure'),
  },
  (t) => [index('bundle_record_site_idx').on(t.siteId)],
);
