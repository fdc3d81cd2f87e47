import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { eq } from 'drizzle-orm';
import { users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { dummyVerify, verifyPassword } from './passwords';
import { findUserByEmail, findUserById } from './users';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User extends UserRow {}
  }
}

type SignInOutcome = { user: UserRow } | { refused: 'invalid_credentials' | 'suspended' };

/** A passport instance of this app's own (no global singleton): local strategy on e-mail + password. */
export type PassportInstance = InstanceType<typeof Passport>;

export function createPassport(db: Db): PassportInstance {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      checkCredentials(db, email, password).then(
        (outcome) => done(null, 'user' in outcome ? outcome.user : false, { message: 'refused' in outcome ? outcome.refused : 'ok' }),
        done,
      );
    }),
  );
  passport.serializeUser<string>((user, done) => done(null, user.id));
  // A suspended or deleted account's session stops working on its next request.
  passport.deserializeUser<string>((id, done) => {
    findUserById(db, id).then((u) => done(null, u && !u.suspendedAt ? u : false), done);
  });
  return passport;
}

async function checkCredentials(db: Db, email: string, password: string): Promise<SignInOutcome> {
  const user = await findUserByEmail(db, email);
  if (!user) {
    await dummyVerify(password);
    return { refused: 'invalid_credentials' };
  }
  if (!(await verifyPassword(user.passwordHash, password))) return { refused: 'invalid_credentials' };
  if (user.suspendedAt) return { refused: 'suspended' };
  await db.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
  return { user };
}
