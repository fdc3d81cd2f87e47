import { describe, expect, it } from 'vitest';
import { chunkSize, MAX_CHUNK, poolSize, timeLeft, wantsMore } from './sweep-schedule';

describe('sweep schedule', () => {
  it('hands out small chunks, never more than MAX_CHUNK, never none while jobs remain', () => {
    expect(chunkSize(5000, 2)).toBe(MAX_CHUNK);
    expect(chunkSize(20, 2)).toBe(3); // several chunks each, so both workers end together
    expect(chunkSize(1, 8)).toBe(1);
    expect(chunkSize(0, 2)).toBe(0);
    expect(chunkSize(10, 0)).toBe(3);
  });

  it('splits every job into chunks that add up (no job lost or repeated)', () => {
    for (const [total, workers] of [[1, 1], [7, 2], [500, 2], [5000, 8], [33, 3]]) {
      let next = 0;
      let chunks = 0;
      while (next < total) {
        const size = chunkSize(total - next, workers);
        expect(size).toBeGreaterThan(0);
        next += size;
        chunks++;
      }
      expect(next).toBe(total);
      expect(chunks).toBeGreaterThanOrEqual(Math.min(total, workers));
    }
  });

  it('keeps two chunks waiting behind the one in work', () => {
    expect(wantsMore(0, 8)).toBe(true);
    expect(wantsMore(16, 8)).toBe(true);
    expect(wantsMore(17, 8)).toBe(false);
    expect(wantsMore(1, 0)).toBe(true);
  });

  it('sizes the pool one worker per core, 1 to 8', () => {
    expect(poolSize(undefined)).toBe(1);
    expect(poolSize(0)).toBe(1);
    expect(poolSize(2)).toBe(2);
    expect(poolSize(32)).toBe(8);
  });

  it('estimates the time left from the throughput so far', () => {
    expect(timeLeft(0, 500, 1000)).toBeNull();
    expect(timeLeft(3, 500, 1000)).toBeNull(); // too few to tell
    expect(timeLeft(50, 500, 100)).toBeNull(); // too early: start-up dominates
    expect(timeLeft(100, 500, 1000)).toBe(4000);
    expect(timeLeft(250, 5000, 500)).toBe(9500);
    expect(timeLeft(500, 500, 1234)).toBe(0);
  });
});
