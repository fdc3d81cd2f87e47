import { Router, type Request, type RequestHandler, type Response } from 'express';
import { eq } from 'drizzle-orm';
import { resetConfirmBody, resetRequestBody, signInBody, signUpBody, updateProfileBody, verifyBody, type MeAnswer } from '@barwright/contracts';
import { users, type UserRow } from '../../../../db/schema';
import { HttpError, unauthenticated } from '../http/http-error';
import { issueCsrfToken } from '../http/csrf';
import { parseBody } from '../http/validate';
import { signInAccountKey, type createRateLimits } from '../http/rate-limits';
import * as accounts from './account-service';
import type { PassportInstance } from './passport-setup';
import { toMe } from './users';

export interface AuthRouterDeps extends accounts.AccountDeps {
  passport: PassportInstance;
  limits: ReturnType<typeof createRateLimits>;
  secureCookies: boolean;
  /** Closes the realtime sockets opened with a session (on sign-out). */
  closeSessionSockets?: (sessionId: string) => void;
}

/** The signed-in user, or 401. */
export function requireUser(req: Request): UserRow {
  if (!req.user) throw unauthenticated();
  return req.user;
}

function signIn(deps: AuthRouterDeps): RequestHandler {
  return (req, res, next) => {
    parseBody(signInBody, req.body);
    deps.passport.authenticate('local', (error: unknown, user: UserRow | false, info?: { message?: string }) => {
      if (error) return next(error);
      if (!user) {
        const suspended = info?.message === 'suspended';
        return next(
          suspended
            ? new HttpError(403, 'suspended', 'This account is suspended. Contact your club administrator.')
            : new HttpError(401, 'invalid_credentials', 'The e-mail or password is not right.'),
        );
      }
      // passport 0.7 regenerates the session id here, so a session fixed before sign-in is worthless.
      req.logIn(user, (loginError) => {
        if (loginError) return next(loginError);
        req.session.startedAt = Date.now();
        issueCsrfToken(req, res, deps.secureCookies);
        res.json(toMe(user));
      });
    })(req, res, next);
  };
}

const signOut = (deps: AuthRouterDeps) => (req: Request, res: Response, next: (e?: unknown) => void) => {
  deps.closeSessionSockets?.(req.sessionID); // the sockets opened with this session end with it
  req.logOut((error) => {
    if (error) return next(error);
    req.session.destroy((destroyError) => {
      if (destroyError) return next(destroyError);
      res.clearCookie('barwright.sid', { path: '/' });
      issueCsrfToken(req, res, deps.secureCookies); // a visitor's token, so the next sign-in needs no reload
      res.status(204).end();
    });
  });
};

export function authRouter(deps: AuthRouterDeps): Router {
  const router = Router();
  router.post('/sign-up', deps.limits.mailByAddress, async (req, res) => {
    await accounts.signUp(deps, parseBody(signUpBody, req.body));
    res.status(201).json({ ok: true });
  });
  router.post('/verify', async (req, res) => {
    await accounts.verifyEmail(deps, parseBody(verifyBody, req.body).token);
    res.json({ ok: true });
  });
  router.post('/resend-verification', deps.limits.mailByAddress, async (req, res) => {
    await accounts.sendVerification(deps, requireUser(req).id);
    res.status(202).json({ ok: true });
  });
  router.post('/sign-in', deps.limits.signInByAddress, deps.limits.signInByAccount, signIn(deps));
  router.post('/sign-out', signOut(deps));
  // A visitor is not an error: the answer is null, not a 401 in every signed-out browser's console.
  router.get('/me', (req, res) => {
    res.json((req.user ? toMe(req.user) : null) satisfies MeAnswer);
  });
  router.patch('/me', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(updateProfileBody, req.body);
    const [row] = await deps.db.update(users).set(body).where(eq(users.id, user.id)).returning();
    res.json(toMe(row));
  });
  router.post('/password-reset/request', deps.limits.mailByAddress, (req, res) => {
    const { email } = parseBody(resetRequestBody, req.body);
    // Answered before the look-up, the token and the mail, so a known address takes no longer than an
    // unknown one; what fails afterwards goes to the log.
    res.status(202).json({ ok: true });
    accounts.requestPasswordReset(deps, email).catch(deps.log);
  });
  router.post('/password-reset/confirm', async (req, res) => {
    const body = parseBody(resetConfirmBody, req.body);
    const email = await accounts.confirmPasswordReset(deps, body.token, body.password);
    // Whoever chose the new password from the mailbox ends the lock that failed guesses put on the account.
    if (email) await deps.limits.signInByAccount.resetKey(signInAccountKey(email));
    res.json({ ok: true });
  });
  return router;
}
