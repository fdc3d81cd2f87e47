import fc from 'fast-check';

/**
 * fast-check arbitraries for fuzzing the API from its OpenAPI document: values that follow a JSON
 * schema (as the document's request bodies and parameters give them) and hostile values that do
 * not. For tests.
 */
type Schema = Record<string, unknown> & {
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
  prefixItems?: Schema[];
  oneOf?: Schema[];
  anyOf?: Schema[];
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  maxItems?: number;
  format?: string;
  $ref?: string;
};

export const NUL_STRINGS = ['\u0000', 'a\u0000b', 'caption\u0000', '\u0000'.repeat(40)];

/** Values that break careless code: NUL, huge and odd numbers, odd dates and ids, wrong types. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...NUL_STRINGS),
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER * 16, -0, 0.1 + 0.2, 2 ** 31, -(2 ** 63)),
  fc.constantFrom('0000-01-01T00:00:00Z', '+275760-09-13T00:00:00Z', '0000-00-00', '9'.repeat(400), '1e999', 'NaN', '-1'),
  fc.constantFrom('0'.repeat(36), '-'.repeat(36), 'ffffffff-ffff-ffff-ffff-ffffffffffffff', '{00000000-0000-0000-0000-000000000000}'),
  fc.constantFrom('\uD800', '\uFFFF', 'é'.repeat(300), '<script>alert(1)</script>', "'; drop table users; --", '%s%n', ' '.repeat(20)),
  fc.constantFrom(null, true, [], {}, [[[]]], { __proto__: { polluted: true } }, { constructor: { prototype: { polluted: true } } }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.anything({ maxDepth: 3 }),
);

/** A value following `schema` (loosely: cross-field rules are not known here). */
export function fromSchema(schema: Schema | undefined, resolve: (ref: string) => Schema, depth = 0): fc.Arbitrary<unknown> {
  if (!schema) return fc.jsonValue({ maxDepth: 2 });
  if (schema.$ref) return fromSchema(resolve(schema.$ref), resolve, depth);
  const next = (s: Schema | undefined) => fromSchema(s, resolve, depth + 1);
  if (schema.const !== undefined) return fc.constant(schema.const);
  if (schema.enum) return fc.constantFrom(...schema.enum);
  const choices = schema.oneOf ?? schema.anyOf;
  if (choices) return fc.oneof(...choices.map(next));
  const type = Array.isArray(schema.type) ? schema.type[0] : schema.type;
  switch (type) {
    case 'string':
      return stringFor(schema);
    case 'integer':
      return fc.integer({ min: Math.ceil(schema.minimum ?? -1000), max: Math.floor(schema.maximum ?? 100_000) });
    case 'number':
      return fc.double({ min: schema.minimum ?? -1000, max: schema.maximum ?? 100_000, noNaN: true, noDefaultInfinity: true });
    case 'boolean':
      return fc.boolean();
    case 'null':
      return fc.constant(null);
    case 'array':
      if (schema.prefixItems) return fc.tuple(...schema.prefixItems.map(next));
      return depth > 8 ? fc.constant([]) : fc.array(next(schema.items), { maxLength: Math.min(schema.maxItems ?? 4, 4) });
    case 'object': {
      const props = Object.entries(schema.properties ?? {});
      if (depth > 8 || !props.length) return fc.dictionary(fc.string({ maxLength: 8 }), fc.jsonValue({ maxDepth: 1 }), { maxKeys: 3 });
      const requiredKeys = schema.required ?? [];
      return fc.record(Object.fromEntries(props.map(([k, s]) => [k, next(s)])), { requiredKeys: requiredKeys.filter((k) => props.some(([p]) => p === k)) });
    }
    default:
      return fc.jsonValue({ maxDepth: 2 });
  }
}

function stringFor(schema: Schema): fc.Arbitrary<string> {
  const min = schema.minLength ?? 0;
  const max = Math.max(min, Math.min(schema.maxLength ?? 60, 200));
  switch (schema.format) {
    case 'email':
      return fc.emailAddress();
    case 'uuid':
      return fc.uuid();
    case 'date-time':
      return fc.date({ min: new Date(0), max: new Date(Date.UTC(2100, 0)), noInvalidDate: true }).map((d) => d.toISOString());
    case 'date':
      return fc.date({ min: new Date(0), max: new Date(Date.UTC(2100, 0)), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));
    default:
      return fc.string({ minLength: min, maxLength: max, unit: 'grapheme' });
  }
}

/** The value with its `n`-th node (in a walk, modulo their count) replaced by `replacement`; the root counts. */
export function replaceNode(value: unknown, n: number, replacement: unknown): unknown {
  const nodes: Array<{ parent?: Record<string, unknown>; key?: string }> = [{}];
  const copy = structuredClone(value);
  const stack: unknown[] = [copy];
  while (stack.length) {
    const v = stack.pop();
    if (!v || typeof v !== 'object') continue;
    for (const [key, child] of Object.entries(v)) {
      nodes.push({ parent: v as Record<string, unknown>, key });
      stack.push(child);
    }
  }
  const { parent, key } = nodes[n % nodes.length];
  if (!parent) return replacement;
  parent[key!] = replacement;
  return copy;
}

/** A value following `schema` with one node made hostile (a NUL string, a huge number, a wrong type…). */
export const hostileFromSchema = (schema: Schema | undefined, resolve: (ref: string) => Schema) =>
  fc.tuple(fromSchema(schema, resolve), fc.nat(), hostileValue).map(([v, n, h]) => replaceNode(v, n, h));

/** JSON text nested `depth` levels deep, as objects or arrays (built as text: JSON.stringify would recurse). */
export const deeplyNested = (depth: number, kind: 'object' | 'array') =>
  kind === 'object' ? `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}` : `${'['.repeat(depth)}${']'.repeat(depth)}`;
