import { availableParallelism } from 'node:os';

/**
 * The compute budget: engine work (exports, thumbnails) runs in worker threads, one job per thread,
 * each stopped when it runs longer than `timeoutMs` or its heap passes `maxHeapMb`; at most
 * `maxQueue` jobs wait, and one more is refused with 503 and Retry-After.
 */
export interface ComputeLimits {
  /** Worker threads: one core stays free for the request thread. */
  threads: number;
  /** Running time of one job, from the moment a worker takes it (ms). */
  timeoutMs: number;
  /** Old-generation heap of a worker (MB, worker resourceLimits.maxOldGenerationSizeMb). */
  maxHeapMb: number;
  /** Jobs waiting for a thread, beyond those running. */
  maxQueue: number;
  /** Retry-After when the queue is full (s). */
  retryAfterSeconds: number;
  /** Bytes of finished exports of published revisions kept in memory (they never change). */
  cacheBytes: number;
}

/**
 * Measured on a 2-core machine: a design at the contracts' complexity bounds profiles, exports
 * (SVG, DXF, G-code, CSV, PDF) and draws its thumbnail in at most about 2 s and 500 MB of process
 * memory, so 10 s and a 768 MB heap leave room for a loaded machine.
 */
export const DEFAULT_COMPUTE_LIMITS: ComputeLimits = {
  threads: Math.max(1, Math.min(4, availableParallelism() - 1)),
  timeoutMs: 10_000,
  maxHeapMb: 768,
  maxQueue: 16,
  retryAfterSeconds: 10,
  cacheBytes: 64 * 1024 * 1024,
};
