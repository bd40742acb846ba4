// zod validation for bodies, queries and params; failures become 400 with field paths.
import type { Request } from 'express';
import type { z } from 'zod';
import { HttpError, zodFields } from './errors';

function parse<T extends z.ZodType>(schema: T, value: unknown, where: string): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) {
    throw new HttpError(400, 'invalid', `Some ${where} fields are not valid.`, zodFields(result.error));
  }
  return result.data;
}

export const body = <T extends z.ZodType>(req: Request, schema: T) => parse(schema, req.body ?? {}, 'body');
export const query = <T extends z.ZodType>(req: Request, schema: T) => parse(schema, req.query, 'query');
export const params = <T extends z.ZodType>(req: Request, schema: T) => parse(schema, req.params, 'path');
