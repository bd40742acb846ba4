// Request schemas for sites (client offices), shared by the server and the app's forms.
import { z } from 'zod';
import { listQuerySchema, versionSchema } from './common';

export const STATION_KINDS = ['pc', 'printer', 'modem', 'other'] as const;
export type StationKind = (typeof STATION_KINDS)[number];
export const KIND_LABELS: Record<StationKind, string> = { pc: 'PC', printer: 'Printer', modem: 'Modem', other: 'Other' };

/** Station numbers are one byte on the wire in our own network scheme, with 0 and 255 kept back. */
export const STATION_NUMBER_MIN = 1;
export const STATION_NUMBER_MAX = 254;

const numberSchema = z
  .number({ error: 'Enter a number.' })
  .int('Use a whole number.')
  .min(STATION_NUMBER_MIN, `Station numbers start at ${STATION_NUMBER_MIN}.`)
  .max(STATION_NUMBER_MAX, `Station numbers end at ${STATION_NUMBER_MAX}.`);

const rangeSchema = z
  .tuple([numberSchema, numberSchema])
  .refine(([a, b]) => a <= b, 'The first number must not be above the last.');

export const numberRangesSchema = z
  .object({ pc: rangeSchema, printer: rangeSchema, modem: rangeSchema, other: rangeSchema })
  .superRefine((r, ctx) => {
    const kinds = STATION_KINDS;
    for (let i = 0; i < kinds.length; i++) {
      for (let j = i + 1; j < kinds.length; j++) {
        const [a, b] = [r[kinds[i]], r[kinds[j]]];
        if (a[0] <= b[1] && b[0] <= a[1]) {
          ctx.addIssue({ code: 'custom', path: [kinds[j]], message: `Overlaps the ${KIND_LABELS[kinds[i]]} range.` });
        }
      }
    }
  });
export type NumberRangesInput = z.infer<typeof numberRangesSchema>;

export const DEFAULT_RANGES: NumberRangesInput = { pc: [1, 99], printer: [100, 149], modem: [150, 199], other: [200, 254] };

// Without defaults, so that an update leaves out what it does not name; the create schema adds them.
export const siteFieldsSchema = z.object({
  name: z.string().trim().min(1, 'Enter the office’s name.').max(120, 'At most 120 characters.'),
  address: z.string().trim().max(300, 'At most 300 characters.'),
  contact: z.string().trim().max(200, 'At most 200 characters.'),
  notes: z.string().trim().max(4000, 'At most 4000 characters.'),
  numberRanges: numberRangesSchema,
});
export const siteCreateSchema = siteFieldsSchema.extend({
  address: siteFieldsSchema.shape.address.default(''),
  contact: siteFieldsSchema.shape.contact.default(''),
  notes: siteFieldsSchema.shape.notes.default(''),
  numberRanges: numberRangesSchema.default(DEFAULT_RANGES),
});
export type SiteCreateInput = z.input<typeof siteCreateSchema>;

export const siteUpdateSchema = siteFieldsSchema.partial().extend(versionSchema.shape);
export type SiteUpdateInput = z.input<typeof siteUpdateSchema>;

export const SITE_SORTS = ['name', 'createdAt', 'updatedAt', 'stations'] as const;
export const siteListQuerySchema = listQuerySchema(SITE_SORTS, 'name');

export type SiteSummary = {
  id: number;
  name: string;
  address: string;
  contact: string;
  notes: string;
  numberRanges: NumberRangesInput;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
  version: number;
  stations: number;
};

/** An office inventory pasted or read from a .csv file; the preview writes nothing. */
export const csvImportSchema = z.object({
  csv: z.string().min(1, 'Choose or paste a CSV file.').max(200_000, 'The CSV file is larger than 200 KB.'),
  /** The kit the imported PCs use. */
  kitId: z.number().int().positive().nullish(),
});
export type CsvImportInput = z.input<typeof csvImportSchema>;

export type ImportRowPreview = {
  line: number;
  values: { name: string; number: number | null; kind: StationKind; location: string; notes: string; dos: string; networkPort: string };
  errors: Record<string, string>;
};
export type ImportPreviewResult = { rows: ImportRowPreview[]; fileErrors: string[]; valid: number; invalid: number };
