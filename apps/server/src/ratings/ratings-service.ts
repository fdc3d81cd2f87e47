import { and, count, eq, sql, sum } from 'drizzle-orm';
import { POSITIVE_STARS, type RatingAnswer } from '@barwright/contracts';
import { entries, entryRatings } from '../../../../db/schema';
import type { Db } from '../database/database';
import { ratingSummary } from '../publishing/entry-views';
import { wilsonLowerBound } from './wilson-score';

/**
 * Sets (stars) or removes (null) a member's rating and refreshes the entry's summary in the same
 * transaction. The entry row is locked first, so concurrent ratings of one entry take turns and
 * each recount sees the others.
 */
export async function setRating(db: Db, entryId: string, userId: string, stars: number | null): Promise<RatingAnswer & { first: boolean }> {
  return db.transaction(async (tx) => {
    await tx.select({ id: entries.id }).from(entries).where(eq(entries.id, entryId)).for('update');
    const mine = and(eq(entryRatings.entryId, entryId), eq(entryRatings.userId, userId));
    const [before] = await tx.select({ stars: entryRatings.stars }).from(entryRatings).where(mine);
    if (stars === null) await tx.delete(entryRatings).where(mine);
    else
      await tx
        .insert(entryRatings)
        .values({ entryId, userId, stars })
        .onConflictDoUpdate({ target: [entryRatings.entryId, entryRatings.userId], set: { stars, updatedAt: new Date() } });
    const [agg] = await tx
      .select({
        n: count(),
        total: sum(entryRatings.stars).mapWith(Number),
        positive: sql<number>`count(*) filter (where ${entryRatings.stars} >= ${POSITIVE_STARS})`.mapWith(Number),
      })
      .from(entryRatings)
      .where(eq(entryRatings.entryId, entryId));
    const values = { ratingCount: agg.n, ratingSum: agg.total ?? 0, ratingPositive: agg.positive, ratingScore: wilsonLowerBound(agg.positive, agg.n) };
    await tx.update(entries).set(values).where(eq(entries.id, entryId));
    return { rating: ratingSummary(values), myStars: stars, first: stars !== null && !before };
  });
}
