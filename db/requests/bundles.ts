// Request schemas for rollout bundles, shared by the server and the admin's bundle screen (zod only: the
// browser imports this file), and the plain words for why a station stays out of a bundle.
import { z } from 'zod';

/** More than any office we expect; keeps a selection's query string and the preview bounded. */
export const MAX_SELECTION = 2000;

const id = z.number().int().positive();

const selection = z
  .array(id)
  .min(1, 'Tick at least one station, or leave the selection out for the whole site.')
  .max(MAX_SELECTION, `At most ${MAX_SELECTION} stations at once.`)
  .refine((ids) => new Set(ids).size === ids.length, 'A station is ticked twice.');

/** Start a build: the whole site, or only the ticked stations. */
export const createBundleSchema = z.object({ siteId: id, stationIds: selection.optional() }).strict();
export type CreateBundleInput = z.infer<typeof createBundleSchema>;

/** `stations=4,7,9` in a query string. */
const stationList = z
  .string()
  .max(MAX_SELECTION * 8)
  .regex(/^\d+(,\d+)*$/, 'Station ids separated by commas, such as 4,7,9.')
  .transform((s) => s.split(',').map(Number))
  .pipe(selection);

export const bundlePreviewQuery = z.object({ siteId: z.coerce.number().int().positive(), stations: stationList.optional() }).strict();
export type BundlePreviewQuery = z.infer<typeof bundlePreviewQuery>;

export const bundleListQuery = z.object({ siteId: z.coerce.number().int().positive() }).strict();

export const bundleIdParams = z.object({ id: z.coerce.number().int().positive() });

/** Why a station is left out of a bundle. */
export const LEFT_OUT_CODES = ['not_pc', 'archived', 'no_plan', 'draft', 'in_review', 'returned', 'stale', 'not_approved', 'released'] as const;
export type LeftOutCode = (typeof LEFT_OUT_CODES)[number];

/** A symbol and a word for each reason, so the list never rests on colour alone. */
export const LEFT_OUT_LABELS: Record<LeftOutCode, { mark: string; word: string }> = {
  not_pc: { mark: '–', word: 'Not a PC' },
  archived: { mark: '⊘', word: 'Archived' },
  no_plan: { mark: '○', word: 'No plan' },
  draft: { mark: '✎', word: 'Draft' },
  in_review: { mark: '…', word: 'In review' },
  returned: { mark: '↩', word: 'Returned' },
  stale: { mark: '⚠', word: 'Stale' },
  not_approved: { mark: '✕', word: 'Not approved' },
  released: { mark: '⇪', word: 'Already released' },
};

export const BUNDLE_STATES = ['building', 'done', 'failed'] as const;
export type BundleStateValue = (typeof BUNDLE_STATES)[number];

export const BUNDLE_STATE_LABELS: Record<BundleStateValue, { mark: string; word: string }> = {
  building: { mark: '…', word: 'Building' },
  done: { mark: '✓', word: 'Downloaded' },
  failed: { mark: '✕', word: 'Failed' },
};
