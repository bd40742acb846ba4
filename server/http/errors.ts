// One error path for the whole API: every failure is JSON { error: { code, message, fields? } }.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'bad_request', message, fields);
export const notFound = (what = 'That') => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'Your role may not do this.') => new HttpError(403, 'forbidden', message);
export const conflict = (message: string, code = 'conflict') => new HttpError(409, code, message);

/** Turns a zod error into field paths and messages, e.g. { "ports.0.name": "Required" }. */
export function zodFields(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.path}.` } });
};

export function errorHandler(log: (msg: string, err?: unknown) => void): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return;
    if (err instanceof HttpError) {
      res.status(err.status).json({ error: { code: err.code, message: err.message, fields: err.fields } });
      return;
    }
    if (err instanceof z.ZodError) {
      res.status(400).json({ error: { code: 'invalid', message: 'Some fields are not valid.', fields: zodFields(err) } });
      return;
    }
    // body-parser's errors carry a status and a type (malformed JSON, body too large, ...).
    const status = typeof err?.status === 'number' ? err.status : 500;
    if (err?.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } });
      return;
    }
    if (status >= 400 && status < 500) {
      res.status(status).json({ error: { code: String(err.type ?? 'bad_request'), message: String(err.message) } });
      return;
    }
    log(`error on ${req.method} ${req.originalUrl}`, err);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server. It was logged.' } });
  };
}
