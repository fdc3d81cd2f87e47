import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, inArray, isNull } from 'drizzle-orm';
import { accountTokens } from '../../../../db/schema';
import type { Db } from '../database/database';

export const TOKEN_LIFETIME_MS = { verify: 48 * 3600_000, reset: 3600_000 } as const;
type Purpose = keyof typeof TOKEN_LIFETIME_MS;

const sha256 = (token: string) => createHash('sha256').update(token).digest('hex');

/** Creates a single-use token; only its hash is stored, the token itself goes into the e-mail. */
export async function issueToken(db: Db, userId: string, purpose: Purpose, now = new Date()): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await db.insert(accountTokens).values({
    userId,
    purpose,
    tokenHash: sha256(token),
    expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]),
  });
  return token;
}

/**
 * Uses up a token and, in the same statement, every other outstanding token of its user for the same
 * purpose: once a reset link has set the password, an older link from the same inbox must not set it
 * again. Returns the user, or undefined when the token is unknown, used or expired. Two links of one
 * user used at once: the second waits on the first's row locks, then finds its token used.
 */
export async function consumeToken(db: Db, token: string, purpose: Purpose, now = new Date()): Promise<string | undefined> {
  const hash = sha256(token);
  const owner = db
    .select({ userId: accountTokens.userId })
    .from(accountTokens)
    .where(and(eq(accountTokens.tokenHash, hash), eq(accountTokens.purpose, purpose), isNull(accountTokens.usedAt), gt(accountTokens.expiresAt, now)));
  const used = await db
    .update(accountTokens)
    .set({ usedAt: now })
    .where(and(inArray(accountTokens.userId, owner), eq(accountTokens.purpose, purpose), isNull(accountTokens.usedAt)))
    .returning({ userId: accountTokens.userId, tokenHash: accountTokens.tokenHash });
  return used.find((row) => row.tokenHash === hash)?.userId;
}

/** Uses up every outstanding token of a user for a purpose (the password changed by other means). */
export async function revokeTokens(db: Db, userId: string, purpose: Purpose, now = new Date()): Promise<void> {
  await db
    .update(accountTokens)
    .set({ usedAt: now })
    .where(and(eq(accountTokens.userId, userId), eq(accountTokens.purpose, purpose), isNull(accountTokens.usedAt)));
}
