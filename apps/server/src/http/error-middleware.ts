import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiErrorBody } from '@barwright/contracts';
import { HttpError } from './http-error';

/** 404 in the API's shape for unknown /api routes. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = { error: { code: 'not_found', message: `No route ${req.method} ${req.originalUrl}` } };
  res.status(404).json(body);
};

/** The one error handler, registered last: known errors keep their status, the rest become 500 without details. */
export function errorMiddleware(log: (error: unknown) => void): ErrorRequestHandler {
  return (error, _req, res, next) => {
    if (res.headersSent) return next(error);
    let body: ApiErrorBody;
    let status: number;
    if (error instanceof HttpError) {
      status = error.status;
      body = { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) } };
    } else if (error?.type === 'entity.parse.failed') {
      status = 400;
      body = { error: { code: 'invalid_json', message: 'The request body is not valid JSON.' } };
    } else if (error?.type === 'entity.too.large') {
      status = 413;
      body = { error: { code: 'too_large', message: `The request body is larger than the limit (${error.limit} bytes).` } };
    } else {
      log(error);
      status = 500;
      body = { error: { code: 'internal', message: 'Something went wrong on our side. Try again in a moment.' } };
    }
    res.status(status).json(body);
  };
}
