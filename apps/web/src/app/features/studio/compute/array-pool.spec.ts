import { describe, expect, it } from 'vitest';
import { ArrayPool } from './array-pool';

describe('the compute worker’s pool of handed-back arrays', () => {
  it('writes a new array over a buffer handed back, as it is, and gives new memory when none fits', () => {
    const pool = new ArrayPool();
    const first = pool.allocate(1000);
    expect(first.length).toBe(1000);
    first.fill(7);
    pool.give([first.buffer as ArrayBuffer]);
    const again = pool.allocate(990); // a bar a few samples shorter: the same buffer
    expect(again.buffer).toBe(first.buffer);
    expect(again.length).toBe(990);
    expect(again.every((v) => v === 7)).toBe(true); // not cleared: the engine writes every element
    expect(pool.size).toBe(0);
    expect(pool.allocate(1000).buffer).not.toBe(first.buffer); // taken: new memory
  });

  it('leaves a buffer far larger than asked for a later, larger bar, and lets detached buffers go', () => {
    const pool = new ArrayPool(2);
    const large = new ArrayBuffer(8 * 4000);
    pool.give([large]);
    expect(pool.allocate(1000).buffer).not.toBe(large);
    expect(pool.size).toBe(1);
    const detached = new ArrayBuffer(8000);
    structuredClone(detached, { transfer: [detached] });
    pool.give([detached]);
    expect(pool.size).toBe(1);
    expect(pool.allocate(3900).buffer).toBe(large);
  });

  it('keeps the newest buffers when full: a bar edited to another size is served again', () => {
    const pool = new ArrayPool(2);
    pool.give([new ArrayBuffer(8 * 4000), new ArrayBuffer(8 * 4000)]); // an old size
    const newer = [new ArrayBuffer(8 * 1000), new ArrayBuffer(8 * 1000)];
    pool.give(newer);
    expect(pool.size).toBe(2);
    expect(newer).toContain(pool.allocate(1000).buffer);
    expect(newer).toContain(pool.allocate(1000).buffer);
  });

  it('serves a lobe count typed up from 20 to 29 and back on the first edit’s memory', () => {
    // Four arrays an edit; the bar's samples follow the period (3 000 a lobe here, as the example bar's).
    const pool = new ArrayPool();
    const fresh = new Set<ArrayBuffer>();
    const seen = new Set<ArrayBuffer>();
    const lobes = [20, 21, 22, 23, 24, 25, 26, 27, 28, 29, 20, 21, 29, 20];
    for (const l of lobes) {
      const arrays = [0, 1, 2, 3].map(() => pool.allocate(3000 * l + 1));
      for (const a of arrays) {
        if (!seen.has(a.buffer as ArrayBuffer)) fresh.add(a.buffer as ArrayBuffer);
        seen.add(a.buffer as ArrayBuffer);
      }
      pool.give(arrays.map((a) => a.buffer as ArrayBuffer));
    }
    expect(fresh.size).toBe(4);
  });

  it('takes the smallest buffer that fits, leaving the larger for a larger bar', () => {
    const pool = new ArrayPool();
    const [small, large] = [new ArrayBuffer(8 * 1100), new ArrayBuffer(8 * 1900)];
    pool.give([large, small]);
    expect(pool.allocate(1000).buffer).toBe(small);
    expect(pool.allocate(1500).buffer).toBe(large);
  });

  it('does not hold a buffer twice, so no two arrays of one computation share memory', () => {
    const pool = new ArrayPool();
    const buffer = new ArrayBuffer(8 * 1000);
    pool.give([buffer, buffer]);
    pool.give([buffer]);
    expect(pool.size).toBe(1);
    const [a, b] = [pool.allocate(1000), pool.allocate(1000)];
    expect(a.buffer).not.toBe(b.buffer);
  });
});
