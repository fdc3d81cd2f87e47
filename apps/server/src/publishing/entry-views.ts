import type { EntryCard, EntryFacts, EntryRevision, MaterialId, PersonRef, RatingSummary, RevisionListItem, WaveShape } from '@barwright/contracts';
import type { EntryRevisionRow, EntryRow } from '../../../../db/schema';

/** Relative URLs of an entry's pictures (the API serves them). */
export const thumbnailUrl = (entryId: string, revision?: number) =>
  revision === undefined ? `/api/entries/${entryId}/thumbnail.svg` : `/api/entries/${entryId}/revisions/${revision}/thumbnail.svg`;

export const ratingSummary = (e: Pick<EntryRow, 'ratingCount' | 'ratingSum' | 'ratingScore'>): RatingSummary => ({
  count: e.ratingCount,
  mean: e.ratingCount ? Math.round((e.ratingSum / e.ratingCount) * 100) / 100 : null,
  score: e.ratingScore,
});

const factsOf = (r: Omit<EntryRow, 'search'> | EntryRevisionRow): EntryFacts => ({
  title: r.title,
  description: r.description,
  tags: r.tags,
  lobes: r.lobes,
  wave: r.wave as WaveShape,
  material: r.material as MaterialId,
  cutterDiameterMm: r.cutterDiameterMm,
});

export const toEntryCard = (e: Omit<EntryRow, 'search'>, author: PersonRef): EntryCard => ({
  id: e.id,
  ...factsOf(e),
  author,
  publishedAt: e.publishedAt.toISOString(),
  updatedAt: e.updatedAt.toISOString(),
  revisionCount: e.latestRevision,
  rating: ratingSummary(e),
  remixCount: e.remixCount,
  commentCount: e.commentCount,
  thumbnailUrl: thumbnailUrl(e.id),
});

export const toEntryRevision = (r: EntryRevisionRow, author: PersonRef): EntryRevision => ({
  entryId: r.entryId,
  number: r.number,
  ...factsOf(r),
  author,
  createdAt: r.createdAt.toISOString(),
  design: r.design,
  thumbnailUrl: thumbnailUrl(r.entryId, r.number),
});

export const toRevisionListItem = (r: Pick<EntryRevisionRow, 'number' | 'title' | 'createdAt'>, author: PersonRef): RevisionListItem => ({
  number: r.number,
  title: r.title,
  author,
  createdAt: r.createdAt.toISOString(),
});
