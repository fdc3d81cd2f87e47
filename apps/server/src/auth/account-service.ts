import { eq } from 'drizzle-orm';
import { users } from '../../../../db/schema';
import type { Db } from '../database/database';
import { HttpError } from '../http/http-error';
import { alreadyRegisteredMail, passwordResetMail, verificationMail } from '../mail/account-mails';
import type { Mailer } from '../mail/mailer';
import { consumeToken, issueToken } from './account-tokens';
import { hashPassword, passwordWeakness } from './passwords';
import type { DatabaseSessionStore } from './session-store';
import { findUserByEmail, findUserById, insertUser } from './users';

export interface AccountDeps {
  db: Db;
  mailer: Mailer;
  sessionStore: DatabaseSessionStore;
  publicUrl: string;
  log: (error: unknown) => void;
  /** Closes every realtime socket of a user (on a password reset). */
  closeUserSockets?: (userId: string) => void;
}

function refuseWeak(password: string, inputs: string[]): void {
  const weakness = passwordWeakness(password, inputs);
  if (weakness) throw new HttpError(400, 'invalid_input', `password ${weakness}`, { password: weakness });
}

/** Mail failures are logged, never shown: the answer must not depend on whether an address exists. */
async function sendQuietly(deps: AccountDeps, to: string, mail: Parameters<Mailer['send']>[1]) {
  await deps.mailer.send(to, mail).catch(deps.log);
}

export async function signUp(deps: AccountDeps, body: { email: string; password: string; displayName: string }) {
  refuseWeak(body.password, [body.email, body.displayName, 'barwright']);
  const user = await insertUser(deps.db, body);
  if (!user) {
    const existing = await findUserByEmail(deps.db, body.email);
    if (existing) {
      const mail = alreadyRegisteredMail(existing.displayName, `${deps.publicUrl}/account/sign-in`, `${deps.publicUrl}/account/reset`);
      await sendQuietly(deps, existing.email, mail);
    }
    return;
  }
  await sendVerification(deps, user.id);
}

export async function sendVerification(deps: AccountDeps, userId: string) {
  const user = await findUserById(deps.db, userId);
  if (!user || user.emailVerifiedAt) return;
  const token = await issueToken(deps.db, user.id, 'verify');
  await sendQuietly(deps, user.email, verificationMail(user.displayName, `${deps.publicUrl}/account/verify?token=${token}`));
}

export async function verifyEmail(deps: AccountDeps, token: string) {
  const userId = await consumeToken(deps.db, token, 'verify');
  if (!userId) throw new HttpError(400, 'invalid_token', 'This confirmation link is not valid any more. Sign in and ask for a new one.');
  await deps.db.update(users).set({ emailVerifiedAt: new Date() }).where(eq(users.id, userId));
}

export async function requestPasswordReset(deps: AccountDeps, email: string) {
  const user = await findUserByEmail(deps.db, email);
  if (!user || user.suspendedAt) return;
  const token = await issueToken(deps.db, user.id, 'reset');
  await sendQuietly(deps, user.email, passwordResetMail(user.displayName, `${deps.publicUrl}/account/reset?token=${token}`));
}

/** Sets the new password; returns the account's e-mail (its sign-in lock is lifted by the caller). */
export async function confirmPasswordReset(deps: AccountDeps, token: string, password: string): Promise<string | undefined> {
  // Check the password before using up the token, so a weak choice can be corrected with the same link.
  refuseWeak(password, ['barwright']);
  // Uses up this user's other reset links too: an older mail must not set the password again.
  const userId = await consumeToken(deps.db, token, 'reset');
  if (!userId) throw new HttpError(400, 'invalid_token', 'This reset link is used or expired. Ask for a new one.');
  const user = await findUserById(deps.db, userId);
  // A reset also proves the address, and ends every session that might belong to whoever knew the old password.
  await deps.db
    .update(users)
    .set({ passwordHash: await hashPassword(password), emailVerifiedAt: user?.emailVerifiedAt ?? new Date() })
    .where(eq(users.id, userId));
  await deps.sessionStore.destroyUserSessions(userId);
  deps.closeUserSockets?.(userId);
  return user?.email;
}
