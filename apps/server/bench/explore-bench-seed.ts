/**
 * Demo data for the Explore benchmark: members, entries with the facts Explore filters on, and
 * ratings, inserted in bulk (a few thousand rows per statement). Invented for the benchmark only.
 */
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { WAVE_SHAPES, MATERIALS, POSITIVE_STARS } from '@barwright/contracts';
import { entries, entryRatings, users } from '../../../db/schema';
import type { Db } from '../src/database/database';
import { searchDocument } from '../src/publishing/publishing-service';
import { wilsonLowerBound } from '../src/ratings/wilson-score';

/** A small deterministic generator (mulberry32), so every run seeds the same rows. */
export function random(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const TAGS = ['barleycorn', 'basket-weave', 'moire', 'plain', 'twist', 'watch-dial', 'pen', 'box-lid', 'trial', 'keeper', 'brass', 'fine', 'coarse', 'club-night', 'spiral', 'flame'];
const WORDS = ['Sine', 'Pointed', 'Scalloped', 'Flat-top', 'Fourier', 'Wheat', 'Ripple', 'Sunburst', 'Wave', 'Lattice', 'Weave', 'Flame', 'Shell', 'Rope'];
const CUTTERS_MM = [3.175, 4.7625, 6, 6.35, 8];

export interface SeedCounts {
  members: number;
  entries: number;
  ratingsPerEntry: number;
}

async function inBatches<T>(rows: T[], size: number, insert: (batch: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += size) await insert(rows.slice(i, i + size));
}

/** Seeds and returns the member ids (for the author filter). Ratings come from distinct members per entry. */
export async function seedExplore(db: Db, counts: SeedCounts): Promise<{ memberIds: string[] }> {
  const rand = random(20260314);
  const pick = <T>(list: readonly T[]) => list[Math.floor(rand() * list.length)];
  const memberRows = Array.from({ length: counts.members }, (_, i) => ({ id: randomUUID(), email: `bench${i}@example.test`, displayName: `Turner ${i}`, passwordHash: 'x' }));
  await inBatches(memberRows, 1000, (b) => db.insert(users).values(b));
  const memberIds = memberRows.map((m) => m.id);

  const ids: string[] = [];
  const start = Date.now() - counts.entries * 60_000;
  const ratings: { entryId: string; userId: string; stars: number }[] = [];
  const entryRows = Array.from({ length: counts.entries }, (_, i) => {
    const id = randomUUID();
    ids.push(id);
    const parent = i > 10 && rand() < 0.3 ? ids[Math.floor(rand() * i)] : null;
    const tags = [...new Set([pick(TAGS), pick(TAGS), pick(TAGS)])].slice(0, 1 + Math.floor(rand() * 3));
    const title = `${pick(WORDS)} ${pick(WORDS).toLowerCase()} ${6 + Math.floor(rand() * 67)}`;
    const description = `${pick(WORDS)} pattern for a ${pick(['pen', 'box lid', 'watch dial', 'case back'])}, cut in ${pick(['acrylic', 'brass', 'A2'])}.`;
    const first = Math.floor(rand() * counts.members);
    let positive = 0;
    let total = 0;
    for (let k = 0; k < counts.ratingsPerEntry; k++) {
      const stars = Math.min(5, 1 + Math.floor(rand() * 5.6));
      ratings.push({ entryId: id, userId: memberIds[(first + k) % counts.members], stars });
      total += stars;
      if (stars >= POSITIVE_STARS) positive++;
    }
    const n = counts.ratingsPerEntry;
    return {
      id,
      authorId: pick(memberIds),
      rootEntryId: id,
      parentEntryId: parent,
      title,
      description,
      tags,
      lobes: 6 + Math.floor(rand() * 67),
      wave: pick(WAVE_SHAPES),
      material: pick(MATERIALS),
      cutterDiameterMm: pick(CUTTERS_MM),
      search: searchDocument({ title, description, tags }),
      ratingCount: n,
      ratingSum: total,
      ratingPositive: positive,
      ratingScore: wilsonLowerBound(positive, n),
      commentCount: Math.floor(rand() * rand() * 40),
      publishedAt: new Date(start + i * 60_000),
      updatedAt: new Date(start + i * 60_000),
    };
  });
  const remixes = new Map<string, number>();
  for (const e of entryRows) if (e.parentEntryId) remixes.set(e.parentEntryId, (remixes.get(e.parentEntryId) ?? 0) + 1);
  for (const e of entryRows) Object.assign(e, { remixCount: remixes.get(e.id) ?? 0 });
  await inBatches(entryRows, 1000, (b) => db.insert(entries).values(b));
  await inBatches(ratings, 5000, (b) => db.insert(entryRatings).values(b));
  await db.execute(sql`ANALYZE`);
  return { memberIds };
}
