import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../http/http-error';

/**
 * Reads one multipart file into memory (at most `maxBytes`) with its text fields; multer's
 * refusals become the API's error shape. Nothing is written to disk before the content is checked.
 */
export function receiveFile(field: string, maxBytes: number): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 4096, parts: 12 },
  }).single(field);
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (!error) return next();
      // Anything else comes from reading the form (busboy: a malformed part header, a form cut short).
      if (!(error instanceof multer.MulterError)) return next(new HttpError(400, 'invalid_upload', 'The upload could not be read as a multipart form.'));
      if (error.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'too_large', `The file is larger than the limit of ${Math.round(maxBytes / 1024 / 1024)} MB.`));
      if (error.code === 'LIMIT_UNEXPECTED_FILE') return next(new HttpError(400, 'invalid_input', `Send one file, in the form field "${field}".`, { [field]: 'send one file in this field' }));
      next(new HttpError(400, 'invalid_input', `The upload was refused: ${error.message}.`));
    });
  };
}
