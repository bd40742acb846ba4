// Request schemas for stations, their profiles and startup files, shared by the server and the wizard.
import { z } from 'zod';
import { describeNameProblem, problemWith83Name } from '@/generators/dos/names';
import { profileSchema } from '@/generators/engine/profile';
import { listQuerySchema, versionSchema } from './common';
import { STATION_KINDS, STATION_NUMBER_MAX, STATION_NUMBER_MIN } from './sites';

/** A station name: a DOS 8.3 base name (it becomes a folder name in the rollout bundle), never a device name. */
export const stationNameSchema = z
  .string()
  .trim()
  .toUpperCase()
  .min(1, 'Enter a station name, like RECEPT.')
  .superRefine((name, ctx) => {
    if (name.includes('.')) {
      ctx.addIssue({ code: 'custom', message: 'A station name has no dot or extension: up to 8 letters and digits.' });
      return;
    }
    const problem = problemWith83Name(name);
    if (problem) ctx.addIssue({ code: 'custom', message: describeNameProblem(problem) });
  });

export const stationNumberSchema = z
  .number({ error: 'Enter the station number.' })
  .int('Use a whole number.')
  .min(STATION_NUMBER_MIN, `Station numbers start at ${STATION_NUMBER_MIN}.`)
  .max(STATION_NUMBER_MAX, `Station numbers end at ${STATION_NUMBER_MAX}.`);

export const stationFieldsSchema = z.object({
  kind: z.enum(STATION_KINDS),
  name: stationNameSchema,
  number: stationNumberSchema,
  location: z.string().trim().max(120, 'At most 120 characters.'),
  notes: z.string().trim().max(2000, 'At most 2000 characters.'),
});
// Defaults only on create, so that an update leaves out what it does not name.
export const stationCreateSchema = stationFieldsSchema.extend({
  location: stationFieldsSchema.shape.location.default(''),
  notes: stationFieldsSchema.shape.notes.default(''),
  siteId: z.number().int().positive(),
  /** The kit a new PC uses (PC stations only). */
  kitId: z.number().int().positive().nullish(),
});
export type StationCreateInput = z.input<typeof stationCreateSchema>;
export const stationUpdateSchema = stationFieldsSchema.partial().extend(versionSchema.shape);
export type StationUpdateInput = z.input<typeof stationUpdateSchema>;

export const STATION_SORTS = ['name', 'number', 'kind', 'dos', 'networkPort', 'status'] as const;
export type StationSort = (typeof STATION_SORTS)[number];
export const stationListQuerySchema = listQuerySchema(STATION_SORTS, 'number').extend({
  kind: z.enum(STATION_KINDS).optional(),
});

export const WIZARD_STEPS = ['identity', 'dos', 'ports', 'network', 'files', 'final', 'preview'] as const;
export type WizardStep = (typeof WIZARD_STEPS)[number];

const shape = profileSchema.shape;
/**
 * A profile as the wizard saves it on every step: each part optional, so a half-filled draft is kept.
 * The kit's facts are not stored here; the server merges them from the profile's kit.
 */
export const profileDraftSchema = z.object({
  dos: shape.dos.optional(),
  bootDrive: shape.bootDrive.optional(),
  dosDir: shape.dosDir.optional(),
  ports: shape.ports.optional(),
  network: shape.network.partial().optional(),
  redirect: shape.redirect.optional(),
  loader: z.object({ path: z.string().trim().max(127).optional(), args: z.string().trim().max(127).optional() }).optional(),
  finalProgram: z.union([z.literal('auto'), z.literal('none'), z.number().int().min(1)]).optional(),
  loadHigh: shape.loadHigh.unwrap().optional(),
  memory: shape.memory,
});
export type ProfileDraft = z.output<typeof profileDraftSchema>;

export const profileWriteSchema = z.object({
  /** The version read; 0 when the station has no profile yet. */
  version: z.number().int().min(0),
  data: profileDraftSchema,
  kitId: z.number().int().positive().nullable(),
  wizardStep: z.enum(WIZARD_STEPS),
});
export type ProfileWriteInput = z.input<typeof profileWriteSchema>;

export const FILE_KINDS = ['AUTOEXEC.BAT', 'CONFIG.SYS'] as const;
export type FileKind = (typeof FILE_KINDS)[number];
/** Uploads and pastes over this size are refused; DOS startup files are a few KB. */
export const MAX_UPLOAD_BYTES = 64 * 1024;

export const fileKindSchema = z.object({ kind: z.enum(FILE_KINDS) });
export const pasteSchema = z.object({
  kind: z.enum(FILE_KINDS),
  text: z.string().min(1, 'Paste the file’s text, or choose “this machine has none”.').max(MAX_UPLOAD_BYTES * 2),
});
export type PasteInput = z.infer<typeof pasteSchema>;

/** Preview with an unsaved profile (the wizard tries a pick before saving it); omit to plan what is stored. */
export const planPreviewSchema = z.object({
  data: profileDraftSchema.optional(),
  kitId: z.number().int().positive().nullable().optional(),
});

/** Links an office user (role `user`, named by e-mail) to their own station, or unlinks with null. */
export const linkUserSchema = z.object({
  version: z.number().int().min(1),
  email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter the office user’s e-mail address.')).nullable(),
});
export type LinkUserInput = z.input<typeof linkUserSchema>;
