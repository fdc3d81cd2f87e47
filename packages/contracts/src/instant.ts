import * as z from 'zod';

/**
 * Instants a query may name: from 1970 to the end of 9999. The ISO formats allow year 0000, which
 * PostgreSQL's timestamptz refuses (there is no year 0 AD), and JavaScript's Date ends in 275760;
 * everything a club records falls well inside this range.
 */
export const EARLIEST_INSTANT_MS = Date.UTC(1970, 0, 1);
export const LATEST_INSTANT_MS = Date.UTC(9999, 11, 31, 23, 59, 59, 999);
const inRange = (ms: number) => Number.isFinite(ms) && ms >= EARLIEST_INSTANT_MS && ms <= LATEST_INSTANT_MS;
const rangeMessage = 'must be between 1970-01-01 and 9999-12-31';

/** An ISO 8601 time with an offset (`2024-05-01T12:00:00Z`), within the range above. */
export const isoInstant = (error = 'must be an ISO 8601 time') =>
  z.iso.datetime({ error, offset: true }).refine((s) => inRange(Date.parse(s)), rangeMessage);

/** A calendar day (`2024-05-01`, taken as UTC) or an ISO 8601 time, within the range above. */
export const dayOrInstant = (error = 'must be a date (YYYY-MM-DD) or an ISO 8601 time') =>
  z
    .union([z.iso.date(), z.iso.datetime({ offset: true })], { error })
    .refine((s) => inRange(Date.parse(s.length === 10 ? `${s}T00:00:00Z` : s)), rangeMessage);
