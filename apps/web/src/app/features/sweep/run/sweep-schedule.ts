/*
 * The pure arithmetic of a run: how many jobs a worker is handed at a time, when it is refilled, and
 * the time left from the throughput so far.
 */

/**
 * Most jobs in one chunk: ~50 ms of work at the sweep's step. A cancel or a new run does not wait for
 * it (the worker drops its queue between slices); the last chunks are smaller, so the workers end together.
 */
export const MAX_CHUNK = 32;

/**
 * Jobs in the next chunk for a worker: small enough that every worker gets several (the last ones
 * end together and the first results come soon), at most MAX_CHUNK, at least one.
 */
export function chunkSize(remaining: number, workers: number): number {
  if (remaining <= 0) return 0;
  return Math.max(1, Math.min(MAX_CHUNK, Math.ceil(remaining / (Math.max(1, workers) * 4))));
}

/**
 * Whether a worker with `pending` queued jobs should get another chunk: it keeps two chunks waiting
 * behind the one it works on (about 100 ms of work), so it never idles while its results wait for the
 * page's thread, busy laying out the grid, to take them and hand out more (one chunk ahead, the
 * workers idled whenever the page's thread was busy for a frame or two: 5 000 took 18 s, not 5).
 */
export function wantsMore(pending: number, chunk: number): boolean {
  return pending <= 2 * Math.max(1, chunk);
}

/** Pool size: one worker per core, at least 1, at most 8. */
export function poolSize(cores: number | undefined): number {
  return Math.max(1, Math.min(8, Math.floor(cores ?? 1) || 1));
}

/** Least work and time before the estimate is shown: the first candidates include the workers' start-up. */
const MIN_DONE = 4;
const MIN_ELAPSED_MS = 200;

/**
 * Time left (ms) from the throughput so far, done / elapsed, for the `total − done` still to come;
 * null while too little is done to tell, 0 when everything is.
 */
export function timeLeft(done: number, total: number, elapsedMs: number): number | null {
  if (done >= total) return 0;
  if (done < MIN_DONE || elapsedMs < MIN_ELAPSED_MS) return null;
  return Math.round(((total - done) * elapsedMs) / done);
}
