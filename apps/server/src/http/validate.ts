import type { z } from 'zod';
import { toFieldErrors } from '@barwright/contracts';
import { HttpError } from './http-error';
import { findNul, nulRefused } from './request-shape';

/**
 * Parses a request body (or query) with a contracts schema; a bad body becomes 400 with one message
 * per field. Text holding U+0000 is refused first, naming its field: no stored text may hold it.
 */
export function parseBody<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  const nul = findNul(body);
  if (nul) throw nulRefused(nul);
  const result = schema.safeParse(body ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string> = {};
  for (const { path, message } of toFieldErrors(result.error)) fields[path || 'body'] ??= message;
  const summary = Object.entries(fields).map(([p, m]) => `${p} ${m}`).join('; ');
  throw new HttpError(400, 'invalid_input', `Check the highlighted fields: ${summary}`, fields);
}
