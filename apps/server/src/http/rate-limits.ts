import { rateLimit, type Options } from 'express-rate-limit';
import type { ApiErrorBody } from '@barwright/contracts';

export interface RateLimitSettings {
  /** Sign-in attempts per address per window. */
  signInPerAddress: number;
  /** Failed sign-ins per account (e-mail) per window. */
  signInPerAccount: number;
  /** Sign-ups and reset requests per address per window. */
  mailPerAddress: number;
  windowMs: number;
}

export const DEFAULT_RATE_LIMITS: RateLimitSettings = {
  signInPerAddress: 30,
  signInPerAccount: 8,
  mailPerAddress: 20,
  windowMs: 15 * 60_000,
};

const tooMany: Options['handler'] = (_req, res, _next, options) => {
  const minutes = Math.ceil(options.windowMs / 60_000);
  const body: ApiErrorBody = { error: { code: 'rate_limited', message: `Too many attempts. Wait ${minutes} minutes and try again.` } };
  res.status(429).json(body);
};

export function createRateLimits(s: RateLimitSettings) {
  const base = { windowMs: s.windowMs, standardHeaders: 'draft-8' as const, legacyHeaders: false, handler: tooMany };
  return {
    signInByAddress: rateLimit({ ...base, limit: s.signInPerAddress }),
    signInByAccount: rateLimit({
      ...base,
      limit: s.signInPerAccount,
      skipSuccessfulRequests: true,
      keyGenerator: (req) => `account:${String(req.body?.email ?? '').trim().toLowerCase()}`,
    }),
    mailByAddress: rateLimit({ ...base, limit: s.mailPerAddress }),
  };
}
