// Request schemas for kits (the network software a PC gets), shared by the server and the kits screen.
import { z } from 'zod';
import { BAUD_RATES } from '@/generators/engine/profile';
import { parseDosVersion } from '@/generators/engine/dos-version';
import { pathProblems } from '@/generators/engine/dos-path';
import { listQuerySchema, versionSchema } from './common';

export const PARITIES = ['N', 'E', 'O', 'M', 'S'] as const;
export const PARITY_LABELS: Record<(typeof PARITIES)[number], string> = { N: 'None', E: 'Even', O: 'Odd', M: 'Mark', S: 'Space' };

/** A full DOS path to a program, every part a valid 8.3 name. */
export const programPathSchema = z
  .string()
  .trim()
  .toUpperCase()
  .min(1, 'Enter the resident program’s full path, like C:\\THREAD\\TLRES.COM.')
  .max(80, 'At most 80 characters.')
  .regex(/^[A-Z]:\\/, 'Start with the drive and a backslash, like C:\\.')
  .regex(/\.(COM|EXE)$/, 'A resident program ends in .COM or .EXE.')
  .superRefine((p, ctx) => {
    const bad = pathProblems(p)[0];
    if (bad) ctx.addIssue({ code: 'custom', message: `${bad.part}: ${bad.reason}` });
  });

export const dosVersionSchema = z
  .string()
  .trim()
  .min(1, 'Enter a DOS version as VER prints it, like 3.30.')
  .max(10)
  .refine((v) => parseDosVersion(v) !== null, 'Not a DOS version we know (2.0 to 7.10), like 3.30 or 6.22.');

export const kitFieldsSchema = z.object({
  name: z.string().trim().min(1, 'Enter the kit’s name.').max(60, 'At most 60 characters.'),
  programPath: programPathSchema,
  programArgs: z.string().trim().max(60, 'At most 60 characters.'),
  baud: z.number().int().refine((b) => (BAUD_RATES as readonly number[]).includes(b), 'Pick a rate MODE accepts (110 to 19200).'),
  parity: z.enum(PARITIES),
  dataBits: z.union([z.literal(5), z.literal(6), z.literal(7), z.literal(8)]),
  stopBits: z.union([z.literal(1), z.literal(2)]),
  minDos: dosVersionSchema,
  residentKB: z.number({ error: 'Enter the size in KB.' }).int('Whole KB.').min(0).max(640, 'Conventional memory is at most 640 KB.'),
  configFiles: z.number().int().min(8, 'FILES= is at least 8.').max(255, 'FILES= is at most 255.').nullable(),
  configBuffers: z.number().int().min(1, 'BUFFERS= is at least 1.').max(99, 'BUFFERS= is at most 99.').nullable(),
  configLines: z.array(z.string().trim().min(1).max(127, 'A CONFIG.SYS line has at most 127 characters.')).max(20),
});
// Defaults only on create, so that an update leaves out what it does not name.
export const kitCreateSchema = kitFieldsSchema.extend({
  programArgs: kitFieldsSchema.shape.programArgs.default(''),
  configFiles: kitFieldsSchema.shape.configFiles.default(null),
  configBuffers: kitFieldsSchema.shape.configBuffers.default(null),
  configLines: kitFieldsSchema.shape.configLines.default([]),
});
export type KitCreateInput = z.input<typeof kitCreateSchema>;
export const kitUpdateSchema = kitFieldsSchema.partial().extend(versionSchema.shape);
export type KitUpdateInput = z.input<typeof kitUpdateSchema>;

export const KIT_SORTS = ['name', 'minDos', 'residentKB', 'updatedAt'] as const;
export const kitListQuerySchema = listQuerySchema(KIT_SORTS, 'name');

export type KitRecord = z.output<typeof kitFieldsSchema> & {
  id: number;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
  version: number;
};
