/** Whole days from `now` until `purgeAt` (ISO), never below 0: "kept 12 more days". */
export function daysUntil(purgeAt: string, now: Date): number {
  const ms = Date.parse(purgeAt) - now.getTime();
  return Number.isFinite(ms) ? Math.max(0, Math.ceil(ms / 86_400_000)) : 0;
}

/** How the bin states the time left, e.g. "kept 3 more days", "kept until today". */
export function keptFor(purgeAt: string, now: Date): string {
  const days = daysUntil(purgeAt, now);
  if (days === 0) return 'removed for good today';
  return days === 1 ? 'kept 1 more day' : `kept ${days} more days`;
}
