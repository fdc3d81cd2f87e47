import { notFound } from './http-error';

/**
 * An id as the database stores it: the canonical 8-4-4-4-12 hex form. Checked before any query,
 * because PostgreSQL's uuid type refuses anything else with an error (a 500), and a malformed id
 * cannot name anything (a 404).
 */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const isUuid = (value: unknown): value is string => typeof value === 'string' && UUID.test(value);

/** The id itself, or 404 naming what it should have been the id of. */
export function requireUuid(value: unknown, what: string): string {
  if (!isUuid(value)) throw notFound(what);
  return value;
}
