// The wiring survey of a site: jacks and their pair readings, the network's nodes and cable runs,
// terminators, and the survey's settings (chosen centre, network pair). Every editable row carries
// `version` for optimistic locking. `ref` is the short name the technician and the report use for a
// jack, node or run (e.g. "r-09"); it is unique within a site and is what generators/survey sees as an id.
import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { user } from './auth-schema';
import { site } from './sites';

export const SURVEY_NODE_KINDS = ['block', 'jack', 'splitter', 'adapter'] as const;
export const SURVEY_RUN_KINDS = ['wall', 'cord'] as const;
export const SURVEY_GAUGES = [22, 24, 26] as const;
export const CONTINUITY_VALUES = ['good', 'open', 'short'] as const;

const stamps = {
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  version: integer('version').notNull().default(1),
};

export const surveyJack = sqliteTable(
  'survey_jack',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id')
      .notNull()
      .references(() => site.id),
    ref: text('ref').notNull(),
    label: text('label').notNull(),
    room: text('room').notNull().default(''),
    /** Station name(s) of the device(s) at this jack, as written on the sheet: a splitter can serve two,
     * and the survey is often done before the stations are recorded, so this is text, not a key. */
    station: text('station').notNull().default(''),
    ...stamps,
  },
  (t) => [uniqueIndex('survey_jack_site_ref_uq').on(t.siteId, t.ref)],
);

/**
 * One meter reading of one pair at one jack. Voltages are kept as the decimal text the technician
 * typed (volts; "48.30" stays "48.30"), never rounded; null means not measured.
 */
export const surveyPairTest = sqliteTable(
  'survey_pair_test',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id')
      .notNull()
      .references(() => site.id),
    jackId: integer('jack_id')
      .notNull()
      .references(() => surveyJack.id),
    pair: text('pair').notNull(),
    vdcVolts: text('vdc_volts'),
    vacVolts: text('vac_volts'),
    continuity: text('continuity', { enum: CONTINUITY_VALUES }),
    /** Who took the reading: the account that recorded it, and the name at that time. */
    testedBy: text('tested_by').references(() => user.id),
    testedByName: text('tested_by_name').notNull().default(''),
    testedAt: integer('tested_at', { mode: 'timestamp_ms' }).notNull(),
    ...stamps,
  },
  (t) => [index('survey_pair_test_jack_idx').on(t.jackId)],
);

export const surveyNode = sqliteTable(
  'survey_node',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id')
      .notNull()
      .references(() => site.id),
    ref: text('ref').notNull(),
    kind: text('kind', { enum: SURVEY_NODE_KINDS }).notNull(),
    label: text('label').notNull(),
    /** For a jack node: the surveyed jack it stands for. */
    jackId: integer('jack_id').references(() => surveyJack.id),
    ...stamps,
  },
  (t) => [uniqueIndex('survey_node_site_ref_uq').on(t.siteId, t.ref)],
);

/** A length of wire between two nodes. Length in feet as entered (a double keeps every typed digit). */
export const surveyRun = sqliteTable(
  'survey_run',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    siteId: integer('site_id')
      .notNull()
      .references(() => site.id),
    ref: text('ref').notNull(),
    fromNodeId: integer('from_node_id')
      .notNull()
      .references(() => surveyNode.id),
    toNodeId: integer('to_node_id')
      .notNull()
      .references(() => surveyNode.id),
    lengthFt: real('length_ft').notNull(),
    gauge: integer('gauge').notNull(),
    /** An adapter cord reverses the pair; wall wiring must not. */
    reverses: integer('reverses', { mode: 'boolean' }).notNull(),
    /** Null: decided from the ends (a run touching an adapter is a cord). */
    kind: text('kind', { enum: SURVEY_RUN_KINDS }),
    ...stamps,
  },
  (t) => [uniqueIndex('survey_run_site_ref_uq').on(t.siteId, t.ref)],
);

/** A terminating resistor across the network pair at a node, in ohms as entered. */
export const surveyTerminator = sqliteTable('survey_terminator', {
  id: integer('id').primaryKey({ autoIncrement: true }),
  siteId: integer('site_id')
    .notNull()
    .references(() => site.id),
  nodeId: integer('node_id')
    .notNull()
    .references(() => surveyNode.id),
  ohms: real('ohms').notNull(),
  ...stamps,
});

/** One row per surveyed site: the chosen centre of a star and the pair that carries the network. */
export const surveySettings = sqliteTable('survey_settings', {
  siteId: integer('site_id')
    .primaryKey()
    .references(() => site.id),
  centreNodeId: integer('centre_node_id').references(() => surveyNode.id),
  networkPair: text('network_pair').notNull().default(''),
  ...stamps,
});
