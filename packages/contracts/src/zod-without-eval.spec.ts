import { config, z } from 'zod';
import { describe, expect, it } from 'vitest';
import { parseWithoutEval } from './zod-without-eval';

describe('parseWithoutEval', () => {
  it('sets jitless on the settings object zod itself reads', () => {
    parseWithoutEval();
    expect(config()).toBe((globalThis as { __zod_globalConfig?: object }).__zod_globalConfig);
    expect(config().jitless).toBe(true);
    // Parsing still works through the interpreter.
    expect(z.object({ a: z.number() }).parse({ a: 1 })).toEqual({ a: 1 });
  });
});
