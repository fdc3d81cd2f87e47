import { rateLimit, type AugmentedRequest, type Options, type Store } from 'express-rate-limit';
import { RedisStore, type RedisReply } from 'rate-limit-redis';
import { normalEmail } from '../auth/users';
import type { ApiErrorBody } from '@barwright/contracts';

export interface RateLimitSettings {
  /**
   * Failed sign-ins per address per window. Successful ones are not counted: a club signing in together from
   * one workshop's address (one router) is not an attack, guessing passwords is.
   */
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

/** The per-account counter's key: the e-mail as typed at sign-in, trimmed and lower-cased. */
export const signInAccountKey = (email: unknown) => `account:${normalEmail(String(email ?? ''))}`;

/** Where a locked-out member chooses a new password (the web app's page). */
export const FORGOT_PASSWORD_PATH = '/account/forgot-password';

/**
 * The per-account lock refuses the right password too until its window ends (so a guesser learns
 * nothing from a late hit); the answer says so, for how long, and where to choose a new password.
 */
const accountLocked: Options['handler'] = (req, res, _next, options) => {
  const resetTime = (req as AugmentedRequest)[options.requestPropertyName]?.resetTime;
  const minutes = Math.max(1, Math.ceil(((resetTime?.getTime() ?? Date.now() + options.windowMs) - Date.now()) / 60_000));
  const wait = minutes === 1 ? '1 minute' : `${minutes} minutes`;
  const message = `After ${options.limit} failed sign-ins this account is locked for ${wait}, even with the right password. Wait, or choose a new password at ${FORGOT_PASSWORD_PATH}.`;
  const body: ApiErrorBody = { error: { code: 'locked', message } };
  res.status(429).json(body);
};

/** Makes the counter store of one limit (named by `prefix`); omitted: in memory, one process's own. */
export type RateLimitStoreFactory = (prefix: string) => Store;

/** Counters in Redis, shared by every instance (rate-limit-redis over the instance's command connection). */
export function redisRateLimitStores(keyPrefix: string, sendCommand: (args: string[]) => Promise<unknown>): RateLimitStoreFactory {
  return (prefix) => new RedisStore({ prefix: `${keyPrefix}:rate:${prefix}:`, sendCommand: (...args: string[]) => sendCommand(args) as Promise<RedisReply> });
}

export function createRateLimits(s: RateLimitSettings, storeFor?: RateLimitStoreFactory) {
  const base = { windowMs: s.windowMs, standardHeaders: 'draft-8' as const, legacyHeaders: false, handler: tooMany };
  const store = (prefix: string) => (storeFor ? { store: storeFor(prefix) } : {});
  return {
    signInByAddress: rateLimit({ ...base, limit: s.signInPerAddress, skipSuccessfulRequests: true, ...store('sign-in-address') }),
    signInByAccount: rateLimit({
      ...base,
      ...store('sign-in-account'),
      limit: s.signInPerAccount,
      skipSuccessfulRequests: true,
      keyGenerator: (req) => signInAccountKey(req.body?.email),
      handler: accountLocked,
    }),
    mailByAddress: rateLimit({ ...base, limit: s.mailPerAddress, ...store('mail-address') }),
  };
}
