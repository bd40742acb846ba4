// Numeric ids in paths. Anything that is not a positive whole number cannot name a row, so it is a 404 like
// any unknown id, never a 500.
import type { Request } from 'express';
import { notFound } from '../http/errors';

export function idParam(req: Request, name: string, what: string): number {
  const raw = req.params[name];
  const value = typeof raw === 'string' && /^[1-9]\d{0,12}$/.test(raw) ? Number(raw) : NaN;
  if (!Number.isSafeInteger(value)) throw notFound(what);
  return value;
}
