import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { HttpError } from './http-error';

export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
/** Where the middleware leaves its token maker for `issueCsrfToken` (sign-in and sign-out). */
const TOKENS_LOCAL = 'csrfTokens';

declare module 'express-session' {
  interface SessionData {
    /** A random token kept in the session by earlier versions; still honoured for the sessions that hold one. */
    csrfToken?: string;
    startedAt?: number;
  }
}

/**
 * Signed double-submit tokens (OWASP's "signed double-submit cookie"). A signed-in session's token is
 * an HMAC of its session id, so it needs no storage and a visitor needs no session: a visitor's token
 * is a random nonce with its HMAC. The HMAC key is the session secret; the messages are prefixed so a
 * token never equals the session cookie's own signature (also an HMAC of the id under that secret).
 */
export class CsrfTokens {
  constructor(private readonly secret: string) {}

  private mac(message: string): string {
    return createHmac('sha256', this.secret).update(message).digest('base64url');
  }

  forSession(sessionId: string): string {
    return `s.${this.mac(`xsrf-session:${sessionId}`)}`;
  }

  forVisitor(): string {
    const nonce = randomBytes(18).toString('base64url');
    return `v.${nonce}.${this.mac(`xsrf-visitor:${nonce}`)}`;
  }

  /** True when `token` was made by this server for this binding (the session id, or none for a visitor). */
  valid(token: string | undefined, sessionId: string | undefined): boolean {
    if (!token) return false;
    if (sessionId) return same(token, this.forSession(sessionId));
    const [kind, nonce, mac] = token.split('.');
    return kind === 'v' && Boolean(nonce) && Boolean(mac) && same(mac, this.mac(`xsrf-visitor:${nonce}`));
  }
}

function same(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  const match = header.match(new RegExp(`(?:^|;\\s*)${name}=([^;]*)`));
  if (!match) return undefined;
  try {
    return decodeURIComponent(match[1]);
  } catch {
    return undefined; // a malformed %-sequence is no token
  }
}

/** The session a token is bound to: a signed-in one's id; a visitor has none (and gets no session row). */
function boundSessionId(req: Request): string | undefined {
  const session = req.session as (typeof req.session & { passport?: { user?: string } }) | undefined;
  return session?.passport?.user ? req.sessionID : undefined;
}

function setCookie(res: Response, token: string, secure: boolean) {
  res.cookie(CSRF_COOKIE, token, { httpOnly: false, sameSite: 'lax', secure, path: '/' });
}

/** Sends the token of the request's present binding (call after sign-in and sign-out, once the session changed). */
export function issueCsrfToken(req: Request, res: Response, secure: boolean): string {
  const tokens = res.locals[TOKENS_LOCAL] as CsrfTokens | undefined;
  if (!tokens) throw new Error('issueCsrfToken needs csrfProtection earlier in the chain');
  const sessionId = boundSessionId(req);
  const token = sessionId ? tokens.forSession(sessionId) : tokens.forVisitor();
  setCookie(res, token, secure);
  return token;
}

/**
 * Angular's XSRF convention: the server sends a readable `XSRF-TOKEN` cookie and every unsafe
 * request must echo it in `X-XSRF-TOKEN`. A page on another site can neither read the cookie nor
 * set the header, so a forged request fails with 403. The cookie must also be one this server made
 * for the request's binding (the signed-in session, or a visitor's signed nonce), so a cookie planted
 * by a neighbouring host, or one from another session, is refused too. Nothing is written to the session.
 */
export function csrfProtection(secret: string, secure: boolean): RequestHandler {
  const tokens = new CsrfTokens(secret);
  return (req, res, next) => {
    res.locals[TOKENS_LOCAL] = tokens;
    const sessionId = boundSessionId(req);
    const cookie = readCookie(req, CSRF_COOKIE);
    const legacy = req.session?.csrfToken;
    let token = cookie;
    if (!(tokens.valid(cookie, sessionId) || (legacy && cookie === legacy))) {
      token = sessionId ? tokens.forSession(sessionId) : tokens.forVisitor();
      setCookie(res, token, secure);
    }
    if (SAFE_METHODS.has(req.method)) return next();
    const sent = req.get(CSRF_HEADER);
    if (!sent || !token || !same(sent, token)) {
      throw new HttpError(403, 'csrf', 'This request lacks its security token. Reload the page and try again.');
    }
    next();
  };
}
