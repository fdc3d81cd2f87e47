import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, isNull } from 'drizzle-orm';
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

/** Marks a token used and returns its user, or undefined when it is unknown, used or expired. */
export async function consumeToken(db: Db, token: string, purpose: Purpose, now = new Date()): Promise<string | undefined> {
  const [row] = await db
    .update(accountTokens)
    .set({ usedAt: now })
    .where(
      and(
        eq(accountTokens.tokenHash, sha256(token)),
        eq(accountTokens.purpose, purpose),
        isNull(accountTokens.usedAt),
        gt(accountTokens.expiresAt, now),
      ),
    )
    .returning({ userId: accountTokens.userId });
  return row?.userId;
}
