/** Tags typed as one line, split at commas, trimmed, empty ones and repeats (any case) dropped (pure). */
export function parseTags(text: string): string[] {
  const seen = new Set<string>();
  const tags: string[] = [];
  for (const raw of text.split(',')) {
    const tag = raw.trim();
    if (tag && !seen.has(tag.toLowerCase())) {
      seen.add(tag.toLowerCase());
      tags.push(tag);
    }
  }
  return tags;
}

/** Every tag of the rack once, in alphabetical order (pure). */
export function rackTags(rosettes: readonly { tags: readonly string[] }[]): string[] {
  return [...new Set(rosettes.flatMap((r) => r.tags))].sort((a, b) => a.localeCompare(b));
}
