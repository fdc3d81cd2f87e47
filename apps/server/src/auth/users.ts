import { eq } from 'drizzle-orm';
import type { AdminUser, Me } from '@barwright/contracts';
import { users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { hashPassword } from './passwords';
import { isUuid } from '../http/uuid';

/** An e-mail address as accounts are stored and looked up: trimmed, lower-cased. */
export const normalEmail = (email: string) => email.trim().toLowerCase();

export const toMe = (u: UserRow): Me => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  emailVerified: u.emailVerifiedAt !== null,
  units: u.units,
});

export const toAdminUser = (u: UserRow): AdminUser => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  emailVerified: u.emailVerifiedAt !== null,
  suspended: u.suspendedAt !== null,
  createdAt: u.createdAt.toISOString(),
  lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
});

export async function findUserByEmail(db: Db, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, normalEmail(email)));
  return row;
}

export async function findUserById(db: Db, id: string): Promise<UserRow | undefined> {
  if (!isUuid(id)) return undefined;
  const [row] = await db.select().from(users).where(eq(users.id, id));
  return row;
}

export interface NewUser {
  email: string;
  displayName: string;
  password: string;
  role?: UserRow['role'];
  verified?: boolean;
  units?: UserRow['units'];
}

/** Inserts a user; returns undefined when the e-mail is taken (the unique index decides, not a prior read). */
export async function insertUser(db: Db, u: NewUser): Promise<UserRow | undefined> {
  const [row] = await db
    .insert(users)
    .values({
      email: normalEmail(u.email),
      displayName: u.displayName,
      passwordHash: await hashPassword(u.password),
      role: u.role ?? 'member',
      units: u.units ?? 'mm',
      emailVerifiedAt: u.verified ? new Date() : null,
    })
    .onConflictDoNothing({ target: users.email })
    .returning();
  return row;
}
