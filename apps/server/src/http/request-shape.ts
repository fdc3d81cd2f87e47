import type { RequestHandler } from 'express';
import { formatPath } from '@barwright/contracts';
import { HttpError } from './http-error';

/** Deepest nesting of arrays and objects a JSON body may have (a design file needs 4). */
export const MAX_BODY_DEPTH = 64;

/**
 * The path of the first string or key holding U+0000 in a parsed value, or undefined. PostgreSQL's
 * text type refuses U+0000, so such text can never be stored or searched for. Iterative, so a deep
 * value cannot overflow the stack.
 */
export function findNul(value: unknown): string | undefined {
  const stack: Array<{ value: unknown; path: PropertyKey[] }> = [{ value, path: [] }];
  while (stack.length) {
    const { value: v, path } = stack.pop()!;
    if (typeof v === 'string') {
      if (v.includes('\u0000')) return formatPath(path) || 'body';
    } else if (v && typeof v === 'object') {
      for (const [key, child] of Object.entries(v)) {
        if (key.includes('\u0000')) return formatPath(path) || 'body';
        stack.push({ value: child, path: [...path, Array.isArray(v) ? Number(key) : key] });
      }
    }
  }
  return undefined;
}

/** The nesting depth of a parsed value (a scalar is 0, `{}` is 1), counted without recursion; stops once past `limit`. */
export function depthOf(value: unknown, limit = MAX_BODY_DEPTH): number {
  let deepest = 0;
  const stack: Array<[unknown, number]> = [[value, 1]];
  while (stack.length) {
    const [v, depth] = stack.pop()!;
    if (!v || typeof v !== 'object') continue;
    deepest = Math.max(deepest, depth);
    if (deepest > limit) return deepest;
    for (const child of Object.values(v)) stack.push([child, depth + 1]);
  }
  return deepest;
}

/** 400 naming the field (or query parameter) that holds U+0000. */
export const nulRefused = (field: string) =>
  new HttpError(400, 'invalid_input', `Check the highlighted fields: ${field} must not contain the NUL character (U+0000)`, {
    [field]: 'must not contain the NUL character (U+0000)',
  });

/**
 * Runs after the JSON parser, before any route: refuses a body nested deeper than MAX_BODY_DEPTH
 * (validation, Yjs and JSON handling recurse over it) and U+0000 in any query parameter (several
 * routes read the query without a schema). Bodies are checked for U+0000 by `parseBody`.
 */
export const refuseHostileShapes: RequestHandler = (req, _res, next) => {
  const field = findNul(req.query);
  if (field) return next(nulRefused(field));
  if (depthOf(req.body) > MAX_BODY_DEPTH) {
    return next(new HttpError(400, 'too_deep', `The request body is nested deeper than the limit of ${MAX_BODY_DEPTH} levels.`, { body: `must be nested at most ${MAX_BODY_DEPTH} levels deep` }));
  }
  next();
};
