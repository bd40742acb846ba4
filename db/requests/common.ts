// Pieces every list and update request shares: paging, sort direction, the version an update read.
import { z } from 'zod';

export const sortDirSchema = z.enum(['asc', 'desc']).default('asc');

/** A paginated, sortable list query: `sort` names one of `keys`. */
export function listQuerySchema<K extends readonly [string, ...string[]]>(keys: K, defaultSort: K[number]) {
  return z.object({
    limit: z.coerce.number().int().min(1).max(500).default(100),
    offset: z.coerce.number().int().min(0).default(0),
    sort: z.enum(keys).default(defaultSort as never),
    dir: sortDirSchema,
    q: z.string().trim().max(100).optional(),
    archived: z
      .enum(['true', 'false'])
      .optional()
      .transform((v) => v === 'true'),
  });
}

/** The `version` an edit read; a changed row makes the server answer 409. */
export const versionSchema = z.object({ version: z.number().int().min(1) });

export type Page<T> = { items: T[]; total: number; limit: number; offset: number };
