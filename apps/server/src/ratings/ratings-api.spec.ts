import { beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { entries, users } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { useTestServer, type TestServer } from '../testing/test-app';
import { member, publishedBar, type Member } from '../community/community-testing';
import { setRating } from './ratings-service';
import { wilsonLowerBound } from './wilson-score';

const drivers = await availableDrivers();

describe.each(drivers)('ratings API on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let author: Member;
  let rater: Member;
  let entryId: string;

  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    author = await member(database, server, 'maren');
    rater = await member(database, server, 'tobias');
    entryId = (await publishedBar(author, 'Sine 24')).entryId;
  });

  it('keeps one rating per member, changeable and removable, with count and mean', async () => {
    const first = await rater.client.send('put', `/api/entries/${entryId}/rating`, { stars: 4 });
    expect(first.body).toEqual({ rating: { count: 1, mean: 4, score: wilsonLowerBound(1, 1) }, myStars: 4 });
    const changed = await rater.client.send('put', `/api/entries/${entryId}/rating`, { stars: 2 });
    expect(changed.body.rating).toMatchObject({ count: 1, mean: 2 });
    expect(changed.body.rating.score).toBeCloseTo(0, 12);
    expect((await rater.client.get(`/api/entries/${entryId}`)).body.viewer).toMatchObject({ myStars: 2, canRate: true });
    const removed = await rater.client.send('delete', `/api/entries/${entryId}/rating`);
    expect(removed.body).toEqual({ rating: { count: 0, mean: null, score: 0 }, myStars: null });
  });

  it('refuses the author, bad stars, and hidden entries', async () => {
    const own = await author.client.send('put', `/api/entries/${entryId}/rating`, { stars: 5 });
    expect(own.status).toBe(403);
    expect((await author.client.get(`/api/entries/${entryId}`)).body.viewer).toMatchObject({ isAuthor: true, canRate: false });
    for (const stars of [0, 6, 3.5, '5', null]) {
      const res = await rater.client.send('put', `/api/entries/${entryId}/rating`, { stars });
      expect(res.status, String(stars)).toBe(400);
      expect(res.body.error.fields.stars).toBeTruthy();
    }
    await database.db.update(entries).set({ hiddenAt: new Date() }).where(eq(entries.id, entryId));
    expect((await rater.client.send('put', `/api/entries/${entryId}/rating`, { stars: 5 })).status).toBe(404);
  });

  it('ranks "top" by the Wilson lower bound, not by the mean', async () => {
    const raters = await database.db
      .insert(users)
      .values(Array.from({ length: 10 }, (_, i) => ({ email: `r${i}@example.test`, displayName: `r${i}`, passwordHash: 'x' })))
      .returning();
    const bars = {
      oneFive: entryId, // one 5-star rating: mean 5, bound 0.21
      nineOfTen: (await publishedBar(author, 'Nine of ten')).entryId, // 9 × 5, 1 × 1: mean 4.6, bound 0.60
      threeFives: (await publishedBar(author, 'Three fives')).entryId, // mean 5, bound 0.44
      unrated: (await publishedBar(author, 'Unrated')).entryId,
    };
    await setRating(database.db, bars.oneFive, raters[0].id, 5);
    for (let i = 0; i < 10; i++) await setRating(database.db, bars.nineOfTen, raters[i].id, i === 0 ? 1 : 5);
    for (let i = 0; i < 3; i++) await setRating(database.db, bars.threeFives, raters[i].id, 5);
    const page = (await rater.client.get('/api/entries?sort=top')).body;
    expect(page.items.map((e: { id: string }) => e.id)).toEqual([bars.nineOfTen, bars.threeFives, bars.oneFive, bars.unrated]);
    expect(page.items[0].rating).toEqual({ count: 10, mean: 4.6, score: wilsonLowerBound(9, 10) });
    expect(page.items[0].rating.score).toBeCloseTo(0.5958, 4);
  });
});
