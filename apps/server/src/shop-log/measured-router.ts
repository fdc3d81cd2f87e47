import express, { Router, type RequestHandler } from 'express';
import { MEASURED_TABLE_FIELD, MEASURED_TABLE_MAX_BYTES, parseMeasuredTable, type MeasuredPreview } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import { HttpError } from '../http/http-error';
import { receiveFile } from './photo-upload';

/** `POST /api/rosettes/measured/preview`: a CSV table as the body (text/csv, text/plain) or as a multipart file. */
export function measuredRouter(): Router {
  const router = Router();
  const signedIn: RequestHandler = (req, _res, next) => {
    requireUser(req);
    next();
  };
  const text = express.text({ type: ['text/csv', 'text/plain'], limit: MEASURED_TABLE_MAX_BYTES });
  router.post('/rosettes/measured/preview', signedIn, text, receiveFile(MEASURED_TABLE_FIELD, MEASURED_TABLE_MAX_BYTES), (req, res) => {
    const table = typeof req.body === 'string' ? req.body : req.file?.buffer.toString('utf8');
    if (table === undefined) {
      throw new HttpError(400, 'invalid_input', `Send the table as a text/csv body, or as a file in the form field "${MEASURED_TABLE_FIELD}".`, { [MEASURED_TABLE_FIELD]: 'is required' });
    }
    res.json(parseMeasuredTable(table) satisfies MeasuredPreview);
  });
  return router;
}
