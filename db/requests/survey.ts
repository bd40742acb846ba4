// Request schemas for the wiring survey, shared by the server and the app's forms, and the "questions":
// values a schema accepts but that are unlikely enough to be asked about before they are stored.
import { z } from 'zod';
import { BUS_TOTAL_MAX_FT, READING_MAX_ABS_VDC, READING_MAX_VAC, TERMINATOR_OHMS } from '@/generators/survey/rules';
import type { SurveyDrawing } from '@/generators/survey/layout';
import type { SurveyInput, SurveyResult } from '@/generators/survey/types';

export const NODE_KINDS = ['block', 'jack', 'splitter', 'adapter'] as const;
export type NodeKindValue = (typeof NODE_KINDS)[number];
export const NODE_KIND_LABELS: Record<NodeKindValue, string> = {
  block: 'Punch-down block',
  jack: 'Wall jack',
  splitter: 'Splitter',
  adapter: 'Network adapter',
};
export const RUN_KINDS = ['wall', 'cord'] as const;
export const GAUGES = [22, 24, 26] as const;
export const CONTINUITY = ['good', 'open', 'short'] as const;
export type ContinuityValue = (typeof CONTINUITY)[number];

/** Past these a value is not a reading at all but a slip of the keyboard: refused outright.
 * Our own bounds (a common multimeter's top voltage range is 1000 V, from memory). */
export const HARD_MAX_VOLTS = 1000;
export const HARD_MAX_FT = 100_000;
export const HARD_MAX_OHMS = 1_000_000;

/** A decimal number as typed: optional minus, digits, optional fraction. No exponent, no comma. */
export const DECIMAL_TEXT = /^-?(\d+(\.\d*)?|\.\d+)$/;

const idSchema = z.coerce.number({ error: 'Use a number.' }).int('Use a whole number.').positive('Use a positive number.');
const optionalId = z.number().int().positive().nullable().optional();

/** A short name for a jack, node or run, unique in the site ("j-09", "r-09"); printed in the report's 12-wide column. */
export const refSchema = z
  .string()
  .trim()
  .min(1, 'Enter a short name.')
  .max(12, 'At most 12 characters.')
  .regex(/^[A-Za-z0-9][A-Za-z0-9_.-]*$/, 'Letters, digits and - _ . only, starting with a letter or digit.');

const nameText = (what: string, max = 60) => z.string().trim().min(1, `Enter the ${what}.`).max(max, `At most ${max} characters.`);
const optionalText = (max = 60) => z.string().trim().max(max, `At most ${max} characters.`);

function decimalIssue(ctx: z.RefinementCtx, message: string) {
  ctx.addIssue({ code: 'custom', message });
}

/**
 * A voltage as the technician typed it, kept as text so nothing is rounded ("48.30" stays "48.30").
 * Empty means not measured. A number in JSON is accepted and kept in JavaScript's shortest exact form.
 */
function voltsText(unit: 'V DC' | 'V AC') {
  return z
    .union([z.string(), z.number()])
    .nullable()
    .optional()
    .transform((v) => (v === null || v === undefined ? null : typeof v === 'number' ? String(v) : v.trim() === '' ? null : v.trim()))
    .superRefine((v, ctx) => {
      if (v === null) return;
      if (v.length > 16 || !DECIMAL_TEXT.test(v)) return decimalIssue(ctx, `Enter the reading in ${unit} as a number, like 0.02.`);
      const n = Number(v);
      // An AC meter shows an RMS value, which is never negative.
      if (unit === 'V AC' && n < 0) return decimalIssue(ctx, 'An AC reading cannot be negative.');
      if (Math.abs(n) > HARD_MAX_VOLTS) decimalIssue(ctx, `No telephone pair reads over ${HARD_MAX_VOLTS} ${unit}; check the entry.`);
    });
}

/** A measured quantity (feet, ohms): a JSON number or a decimal typed into a form, kept exactly. */
function measure(unit: string, min: number, max: number, minInclusive: boolean) {
  return z
    .union([z.number(), z.string().trim()])
    .refine((v) => typeof v === 'number' || (v.length <= 16 && DECIMAL_TEXT.test(v)), `Enter a number of ${unit}.`)
    .transform((v) => Number(v))
    .refine((n) => Number.isFinite(n), `Enter a number of ${unit}.`)
    .refine((n) => (minInclusive ? n >= min : n > min), minInclusive ? `Use ${min} ${unit} or more.` : `Use more than ${min} ${unit}.`)
    .refine((n) => n <= max, `At most ${max.toLocaleString('en-US')} ${unit}.`);
}

export const lengthFtSchema = measure('ft', 0, HARD_MAX_FT, true);
export const ohmsSchema = measure('Ω', 0, HARD_MAX_OHMS, false);

export const gaugeSchema = z
  .union([z.number(), z.string()])
  .transform((v) => Number(v))
  .pipe(z.union([z.literal(22), z.literal(24), z.literal(26)], { error: 'Choose 22, 24 or 26 AWG.' }));

/** The technician has seen the questions about these values and keeps them. */
const confirmed = z.boolean().optional().default(false);
const version = z.number({ error: 'Send the version you read.' }).int().min(1);

// ---------------------------------------------------------------------------------------------------
// Jacks and readings

export const jackCreateSchema = z.object({
  ref: refSchema.optional(),
  label: nameText('jack’s label'),
  room: optionalText().default(''),
  station: optionalText().default(''),
});
export type JackCreateInput = z.input<typeof jackCreateSchema>;
export const jackUpdateSchema = jackCreateSchema.partial().extend({ version });

const readingFields = {
  pair: nameText('pair, like 2 (black/yellow)', 40),
  vdc: voltsText('V DC'),
  vac: voltsText('V AC'),
  continuity: z.enum(CONTINUITY, { error: 'Choose good, open or short.' }).nullable().optional().default(null),
};

export const readingCreateSchema = z
  .object({ ...readingFields, confirmed })
  .refine((r) => r.vdc !== null || r.vac !== null || r.continuity !== null, { path: ['vdc'], message: 'Enter at least one reading.' });
export type ReadingCreateInput = z.input<typeof readingCreateSchema>;
export type ReadingCreateValues = z.output<typeof readingCreateSchema>;

/** A corrected reading replaces all its fields (an absent voltage means "not measured"). */
export const readingUpdateSchema = z
  .object({ ...readingFields, confirmed, version })
  .refine((r) => r.vdc !== null || r.vac !== null || r.continuity !== null, { path: ['vdc'], message: 'Enter at least one reading.' });

// ---------------------------------------------------------------------------------------------------
// Nodes, runs, terminators, settings

export const nodeCreateSchema = z.object({
  ref: refSchema.optional(),
  kind: z.enum(NODE_KINDS, { error: 'Choose block, jack, splitter or adapter.' }),
  label: nameText('label'),
  jackId: optionalId,
});
export type NodeCreateInput = z.input<typeof nodeCreateSchema>;
export const nodeUpdateSchema = nodeCreateSchema.partial().extend({ version });

const runFields = {
  ref: refSchema.optional(),
  fromNodeId: z.number({ error: 'Choose where the run starts.' }).int().positive(),
  toNodeId: z.number({ error: 'Choose where the run ends.' }).int().positive(),
  lengthFt: lengthFtSchema,
  gauge: gaugeSchema,
  reverses: z.boolean({ error: 'Say whether the run reverses the pair.' }),
  kind: z.enum(RUN_KINDS).nullable().optional(),
};
export const runCreateSchema = z
  .object({ ...runFields, confirmed })
  .refine((r) => r.fromNodeId !== r.toNodeId, { path: ['toNodeId'], message: 'A run joins two different points.' });
export type RunCreateInput = z.input<typeof runCreateSchema>;
export const runUpdateSchema = z.object(runFields).partial().extend({ confirmed, version });

export const terminatorCreateSchema = z.object({
  nodeId: z.number({ error: 'Choose where the terminator is fitted.' }).int().positive(),
  ohms: ohmsSchema,
  confirmed,
});
export type TerminatorCreateInput = z.input<typeof terminatorCreateSchema>;
export const terminatorUpdateSchema = z
  .object({ nodeId: terminatorCreateSchema.shape.nodeId.optional(), ohms: ohmsSchema.optional(), confirmed, version });

/** Version 0 means "no settings saved yet" (the first save creates them). */
export const settingsUpdateSchema = z.object({
  centreNodeId: optionalId,
  networkPair: optionalText(40).optional(),
  version: z.number().int().min(0),
});
export type SettingsUpdateInput = z.input<typeof settingsUpdateSchema>;

export const siteParamsSchema = z.object({ siteId: idSchema });
export const itemParamsSchema = z.object({ siteId: idSchema, itemId: idSchema });
export const deleteQuerySchema = z.object({ version: z.coerce.number().int().min(1) }).strict();
export const emptyQuerySchema = z.object({}).strict();
export const reportQuerySchema = z.object({ download: z.enum(['0', '1']).optional() }).strict();
export const sitesQuerySchema = z.object({ q: z.string().trim().max(100).optional() }).strict();

// ---------------------------------------------------------------------------------------------------
// Questions: accepted by the schema, but asked about before they are stored (unless `confirmed`).

export type Questions = Record<string, string>;

export function readingQuestions(r: { vdc: string | null; vac: string | null }): Questions {
  const q: Questions = {};
  // REFERENCES 6.5 [MACASSEY] [TIPRING]: about 48 V DC on an idle line; 6.7 [TIPRING]: ringing near 90 V AC.
  if (r.vdc !== null && Math.abs(Number(r.vdc)) > READING_MAX_ABS_VDC) {
    q.vdc = `${r.vdc} V DC is more than a telephone pair carries (about 48 V DC idle). Check the meter range and the decimal point.`;
  }
  if (r.vac !== null && Number(r.vac) > READING_MAX_VAC) {
    q.vac = `${r.vac} V AC is more than ringing (near 90 V AC). Check the meter range and the decimal point.`;
  }
  return q;
}

export function runQuestions(r: { lengthFt: number }): Questions {
  if (r.lengthFt === 0) return { lengthFt: 'A run of 0 ft: is the length missing?' };
  if (r.lengthFt > BUS_TOTAL_MAX_FT) {
    return { lengthFt: `${r.lengthFt} ft is longer than a whole bus may be (${BUS_TOTAL_MAX_FT.toLocaleString('en-US')} ft, trade practice). Check the entry.` };
  }
  return {};
}

export function terminatorQuestions(t: { ohms: number }): Questions {
  return t.ohms === TERMINATOR_OHMS ? {} : { ohms: `The network takes one ${TERMINATOR_OHMS} Ω terminator (trade practice); ${t.ohms} Ω will be flagged.` };
}

// ---------------------------------------------------------------------------------------------------
// Answers

export type SurveyJackRow = { id: number; ref: string; label: string; room: string; station: string; version: number };
export type SurveyReadingRow = {
  id: number;
  jackId: number;
  pair: string;
  /** Volts, as typed. */
  vdc: string | null;
  vac: string | null;
  continuity: ContinuityValue | null;
  testedByName: string;
  testedAt: string;
  version: number;
};
export type SurveyNodeRow = { id: number; ref: string; kind: NodeKindValue; label: string; jackId: number | null; version: number };
export type SurveyRunRow = {
  id: number;
  ref: string;
  fromNodeId: number;
  toNodeId: number;
  lengthFt: number;
  gauge: number;
  reverses: boolean;
  kind: 'wall' | 'cord' | null;
  version: number;
};
export type SurveyTerminatorRow = { id: number; ref: string; nodeId: number; ohms: number; version: number };
export type SurveySettingsRow = { centreNodeId: number | null; networkPair: string; version: number };

export type SurveyView = {
  site: { id: number; name: string };
  settings: SurveySettingsRow;
  jacks: SurveyJackRow[];
  readings: SurveyReadingRow[];
  nodes: SurveyNodeRow[];
  runs: SurveyRunRow[];
  terminators: SurveyTerminatorRow[];
  /** What the computation saw (ids are the refs) and what it found. */
  input: SurveyInput;
  result: SurveyResult;
  drawing: SurveyDrawing;
};

export type SurveySiteSummary = {
  id: number;
  name: string;
  jacks: number;
  runs: number;
  errors: number;
  warnings: number;
};

// ---------------------------------------------------------------------------------------------------
// Ids the computation sees for rows without a short name of their own (readings, terminators).

export const readingRef = (id: number) => `pt-${id}`;
export const readingIdOf = (ref: string) => Number(ref.replace(/^pt-/, ''));
export const terminatorRef = (id: number) => `T-${id}`;
