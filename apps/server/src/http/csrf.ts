import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { HttpError } from './http-error';

export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    startedAt?: number;
  }
}

function readCookie(req: Request, name: string): string | undefined {
  const match = (req.headers.cookie ?? '').match(new RegExp(`(?:^|;\\s*)${name}=([^;]*)`));
  return match ? decodeURIComponent(match[1]) : undefined;
}

/** Gives the session a token of its own and sends it in the cookie Angular's HttpClient reads. */
export function issueCsrfToken(req: Request, res: Response, secure: boolean): string {
  const token = randomBytes(32).toString('base64url');
  req.session.csrfToken = token;
  res.cookie(CSRF_COOKIE, token, { httpOnly: false, sameSite: 'lax', secure, path: '/' });
  return token;
}

const same = (a: string, b: string) => a.length === b.length && timingSafeEqual(Buffer.from(a), Buffer.from(b));

/**
 * Angular's XSRF convention: the token lives in the session and in a readable `XSRF-TOKEN` cookie;
 * every unsafe request must echo it in `X-XSRF-TOKEN`. A page on another site can neither read the
 * cookie nor set the header, so a forged request fails with 403.
 */
export function csrfProtection(secure: boolean): RequestHandler {
  return (req, res, next) => {
    let token = req.session.csrfToken;
    if (!token) token = issueCsrfToken(req, res, secure);
    else if (readCookie(req, CSRF_COOKIE) !== token) res.cookie(CSRF_COOKIE, token, { httpOnly: false, sameSite: 'lax', secure, path: '/' });
    if (SAFE_METHODS.has(req.method)) return next();
    const sent = req.get(CSRF_HEADER);
    if (!sent || !same(sent, token)) {
      throw new HttpError(403, 'csrf', 'This request lacks its security token. Reload the page and try again.');
    }
    next();
  };
}
