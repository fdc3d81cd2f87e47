import { ENTRY_TAGS_MAX, tagSchema } from '@barwright/contracts';

/** The tags after an entry was typed, and what to tell the member about the part that was refused. */
export interface TagEntry {
  tags: string[];
  problem: string | null;
}

/**
 * Adds what was typed (one tag, or several separated by commas) to `current`, each tag normalised
 * as the server will store it ("Basket Weave" → "basket-weave"); duplicates are dropped, and the
 * contract's limits are stated for the first tag refused.
 */
export function addTags(current: readonly string[], typed: string): TagEntry {
  const tags = [...current];
  let problem: string | null = null;
  for (const raw of typed.split(',')) {
    if (!raw.trim()) continue;
    const parsed = tagSchema.safeParse(raw);
    if (!parsed.success) {
      problem ??= `Tag “${raw.trim()}” ${parsed.error.issues[0]?.message ?? 'is not valid'}`;
      continue;
    }
    if (tags.includes(parsed.data)) continue;
    if (tags.length >= ENTRY_TAGS_MAX) {
      problem ??= `A bar takes at most ${ENTRY_TAGS_MAX} tags`;
      continue;
    }
    tags.push(parsed.data);
  }
  return { tags, problem };
}
