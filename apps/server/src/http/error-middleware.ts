import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { ApiErrorBody } from '@barwright/contracts';
import { HttpError } from './http-error';

/** 404 in the API's shape for unknown /api routes. */
export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = { error: { code: 'not_found', message: `No route ${req.method} ${req.originalUrl}` } };
  res.status(404).json(body);
};

type ApiError = ApiErrorBody['error'];

/** What body-parser's refusals (its `type`, from the http-errors it throws) mean to a client. */
const BODY_PARSER_ERRORS: Record<string, (error: { limit?: number }) => ApiError> = {
  'entity.parse.failed': () => ({ code: 'invalid_json', message: 'The request body is not valid JSON.' }),
  'entity.too.large': (e) => ({ code: 'too_large', message: `The request body is larger than the limit (${e.limit} bytes).` }),
  'encoding.unsupported': () => ({ code: 'unsupported_encoding', message: 'The Content-Encoding of the request body is not supported.' }),
  'charset.unsupported': () => ({ code: 'unsupported_charset', message: 'The charset of the request body is not supported; send UTF-8.' }),
  'request.aborted': () => ({ code: 'aborted', message: 'The request body ended early.' }),
  'request.size.invalid': () => ({ code: 'invalid_body', message: 'The request body does not match its Content-Length.' }),
  'parameters.too.many': () => ({ code: 'invalid_body', message: 'The request has too many parameters.' }),
};

/**
 * A client's mistake reported by a library (body-parser, the router's path decoding, multer…):
 * an error carrying a 4xx `status` or `statusCode`. Its message is shown only when the library
 * marks it `expose` and it is not one we phrase ourselves; a stack is never shown.
 */
function clientError(error: unknown): { status: number; body: ApiError } | undefined {
  if (!error || typeof error !== 'object') return undefined;
  const e = error as { status?: unknown; statusCode?: unknown; type?: unknown; expose?: unknown; message?: unknown; limit?: number };
  const status = Number(e.status ?? e.statusCode);
  if (!Number.isInteger(status) || status < 400 || status > 499) return undefined;
  const known = typeof e.type === 'string' ? BODY_PARSER_ERRORS[e.type] : undefined;
  if (known) return { status, body: known(e) };
  if (error instanceof URIError) return { status, body: { code: 'invalid_path', message: 'The path holds a malformed percent-escape (%).' } };
  if (status === 400 && e.type === undefined && 'errno' in e) {
    return { status, body: { code: 'invalid_body', message: 'The request body could not be read; does it match its Content-Encoding?' } };
  }
  const message = e.expose === true && typeof e.message === 'string' && e.message ? e.message : 'The request was refused.';
  return { status, body: { code: status === 404 ? 'not_found' : 'bad_request', message } };
}

/**
 * PostgreSQL's refusals that mean another request changed the data between this one's checks and its
 * write (a board or a rack rosette removed meanwhile, the same name saved twice at once): the client's
 * answer is to reload and try again, not a server error. By SQLSTATE (the same on PGlite and a server).
 */
const DATABASE_CONFLICTS: Record<string, string> = {
  '23503': 'Something this refers to was removed meanwhile. Reload the page and try again.',
  '23505': 'This clashes with something saved meanwhile. Reload the page and try again.',
  '40001': 'Another change to the same data came at the same moment. Try again.',
  '40P01': 'Another change to the same data came at the same moment. Try again.',
};

/** A database conflict: what the client is told, and what the server's warning names (never the values). */
interface DatabaseConflict {
  body: ApiError;
  /** SQLSTATE, constraint and table, e.g. "23503 boards_owner_id_users_id_fk on boards". */
  summary: string;
}

/** The conflict a database error (or the driver's or Drizzle's wrapping of one, its `cause`) reports, if any. */
function databaseConflict(error: unknown): DatabaseConflict | undefined {
  for (let e = error, depth = 0; e && typeof e === 'object' && depth < 4; e = (e as { cause?: unknown }).cause, depth++) {
    const { code, constraint, table } = e as { code?: unknown; constraint?: unknown; table?: unknown };
    if (typeof code === 'string' && Object.hasOwn(DATABASE_CONFLICTS, code)) {
      const named = [typeof constraint === 'string' ? constraint : '', typeof table === 'string' ? `on ${table}` : ''].filter(Boolean);
      return { body: { code: 'conflict', message: DATABASE_CONFLICTS[code] }, summary: [code, ...named].join(' ') };
    }
  }
  return undefined;
}

/** Where a conflict is noted: a warning, since a client caused it and was told, yet many of them say a route races. */
const warnConflict = (summary: string) => console.warn(`[barwright] database conflict answered 409: ${summary}`);

/** The one error handler, registered last: known errors keep their status, the rest become 500 without details. */
export function errorMiddleware(log: (error: unknown) => void, warn: (message: string) => void = warnConflict): ErrorRequestHandler {
  const internal: ApiErrorBody = { error: { code: 'internal', message: 'Something went wrong on our side. Try again in a moment.' } };
  return (error, _req, res, next) => {
    if (res.headersSent) return next(error);
    let answer: { status: number; body: ApiErrorBody } | undefined;
    try {
      answer = classify(error, warn);
    } catch {
      // An error object that cannot be read (a throwing getter, a Proxy) is the server's own.
    }
    if (!answer) {
      log(error);
      answer = { status: 500, body: internal };
    }
    res.status(answer.status).json(answer.body);
  };
}

/** The answer a known error gets (undefined: the server's own, a 500). */
function classify(error: unknown, warn: (message: string) => void): { status: number; body: ApiErrorBody } | undefined {
  if (error instanceof HttpError) {
    return { status: error.status, body: { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) } } };
  }
  const refused = clientError(error);
  if (refused) return { status: refused.status, body: { error: refused.body } };
  const conflict = databaseConflict(error);
  if (!conflict) return undefined;
  try {
    warn(conflict.summary);
  } catch {
    // The warning is for the keeper; the client's answer does not depend on it.
  }
  return { status: 409, body: { error: conflict.body } };
}
