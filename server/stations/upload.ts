// Multipart upload of one startup file: multer keeps it in memory (bytes exactly as sent), 64 KB at most.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { MAX_UPLOAD_BYTES } from '@/db/requests/stations';
import { HttpError } from '../http/errors';

const parser = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 5, fieldSize: 1024 } }).single('file');

/** Runs multer and turns its errors into the API's own: over the limit is 413, anything else 400. */
export const uploadOne: RequestHandler = (req: Request, res: Response, next: NextFunction) => {
  parser(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') {
        return next(new HttpError(413, 'too_large', `The file is larger than ${MAX_UPLOAD_BYTES / 1024} KB. A DOS startup file is a few KB; check that you picked AUTOEXEC.BAT or CONFIG.SYS.`));
      }
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
        return next(new HttpError(400, 'bad_upload', 'Send one file in the field named “file”.'));
      }
      return next(new HttpError(400, 'bad_upload', `The upload could not be read: ${err.message}.`));
    }
    next(new HttpError(400, 'bad_upload', 'The upload could not be read. Send it as multipart/form-data with one file.'));
  });
};
