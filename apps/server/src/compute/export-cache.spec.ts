import { describe, expect, it } from 'vitest';
import type { ExportedFile } from '@barwright/engine';
import { ExportCache } from './export-cache';

const file = (content: string): ExportedFile => ({ filename: 'bar.svg', mime: 'image/svg+xml', content });

describe('export cache', () => {
  it('computes a file once, and once only for requests that arrive while it is computed', async () => {
    const cache = new ExportCache(1000);
    let runs = 0;
    const compute = async () => {
      runs++;
      await new Promise((r) => setTimeout(r, 10));
      return file('abc');
    };
    const files = await Promise.all([cache.get('r1:svg', compute), cache.get('r1:svg', compute)]);
    expect(files.map((f) => f.content)).toEqual(['abc', 'abc']);
    await cache.get('r1:svg', compute);
    expect(runs).toBe(1);
  });

  it('drops the least recently used files past its byte bound, and keeps none larger than the bound', async () => {
    const cache = new ExportCache(10);
    await cache.get('a', async () => file('aaaa'));
    await cache.get('b', async () => file('bbbb'));
    await cache.get('a', async () => file('new!')); // a is now the most recent
    await cache.get('c', async () => file('cccc'));
    expect(cache.size).toBe(8);
    expect((await cache.get('a', async () => file('miss'))).content).toBe('aaaa');
    expect((await cache.get('b', async () => file('miss'))).content).toBe('miss');
    await cache.get('huge', async () => file('x'.repeat(11)));
    expect(cache.size).toBeLessThanOrEqual(10);
  });

  it('keeps nothing when the computation fails', async () => {
    const cache = new ExportCache(100);
    await expect(cache.get('a', async () => { throw new Error('too heavy'); })).rejects.toThrow('too heavy');
    expect((await cache.get('a', async () => file('ok'))).content).toBe('ok');
  });
});
