import type { RequestHandler } from 'express';
import { formatPath } from '@barwright/contracts';
import { HttpError } from './http-error';

/** Deepest nesting of arrays and objects a JSON body may have (a design file needs 4). */
export const MAX_BODY_DEPTH = 64;

/**
 * The path of the first string or key holding U+0000 in a parsed value, or undefined. PostgreSQL's
 * text type refuses U+0000, so such text can never be stored or searched for. Iterative, so a deep
 * value cannot overflow the stack. Only containers are stacked, in flat lists (no object or path copy
 * per element): the path is rebuilt from parent links only when U+0000 is found, so an 8 MB list of
 * a million pairs (the rack import's limit) is walked in a fraction of the time JSON.parse took.
 */
export function findNul(value: unknown): string | undefined {
  if (typeof value === 'string') return value.includes('\u0000') ? 'body' : undefined;
  if (!value || typeof value !== 'object') return undefined;
  // Every container seen: itself, its key in its parent and its parent's index here (-1 for the root).
  const seen: object[] = [value];
  const keys: PropertyKey[] = [''];
  const parents: number[] = [-1];
  const todo: number[] = [0];
  const found = (at: number, last?: PropertyKey) => {
    const path: PropertyKey[] = last === undefined ? [] : [last];
    for (let i = at; parents[i] >= 0; i = parents[i]) path.unshift(keys[i]);
    return formatPath(path) || 'body';
  };
  const visit = (at: number, key: PropertyKey, child: unknown): string | undefined => {
    if (typeof child === 'string') return child.includes('\u0000') ? found(at, key) : undefined;
    if (child && typeof child === 'object') {
      todo.push(seen.length);
      seen.push(child);
      keys.push(key);
      parents.push(at);
    }
    return undefined;
  };
  while (todo.length) {
    const at = todo.pop()!;
    const v = seen[at];
    if (Array.isArray(v)) {
      for (let i = 0; i < v.length; i++) {
        const hit = visit(at, i, v[i]);
        if (hit) return hit;
      }
    } else {
      for (const key of Object.keys(v)) {
        if (key.includes('\u0000')) return found(at);
        const hit = visit(at, key, (v as Record<string, unknown>)[key]);
        if (hit) return hit;
      }
    }
  }
  return undefined;
}

/** The nesting depth of a parsed value (a scalar is 0, `{}` is 1), counted without recursion; stops once past `limit`. Only containers are stacked. */
export function depthOf(value: unknown, limit = MAX_BODY_DEPTH): number {
  if (!value || typeof value !== 'object') return 0;
  let deepest = 0;
  const values: object[] = [value];
  const depths: number[] = [1];
  while (values.length) {
    const v = values.pop()!;
    const depth = depths.pop()!;
    if (depth > deepest) deepest = depth;
    if (deepest > limit) return deepest;
    const children: unknown[] = Array.isArray(v) ? v : Object.values(v);
    for (let i = 0; i < children.length; i++) {
      const child = children[i];
      if (child && typeof child === 'object') {
        values.push(child);
        depths.push(depth + 1);
      }
    }
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
