import { MessageChannel } from 'node:worker_threads';
import type { ErrorRequestHandler } from 'express';
import { Piscina } from 'piscina';
import type { Design } from '@barwright/contracts';
import type { ExportedFile, ExportFormat } from '@barwright/engine';
import { HttpError } from '../http/http-error';
import { DEFAULT_COMPUTE_LIMITS, type ComputeLimits } from './compute-limits';
import type { ComputeResult, ComputeTask } from './compute-worker';

/** 503 when every thread is busy and the queue is full; the route's answer carries Retry-After. */
export class ComputeBusyError extends HttpError {
  constructor(readonly retryAfterSeconds: number) {
    super(503, 'busy', `The server is busy computing other designs. Try again in ${retryAfterSeconds} s.`);
  }
}

/** Error handler, before the one that answers: a busy answer says when to come back. */
export const retryAfterWhenBusy: ErrorRequestHandler = (error, _req, res, next) => {
  if (error instanceof ComputeBusyError) res.set('Retry-After', String(error.retryAfterSeconds));
  next(error);
};

// The worker is a .ts file under tsx (development, tests) and a .js file in a compiled build.
const workerExtension = import.meta.url.endsWith('.ts') ? '.ts' : '.js';
const WORKER_FILE = new URL(`./compute-worker${workerExtension}`, import.meta.url).href;

/**
 * Engine work off the request thread: a piscina pool with a time and heap budget per job and a
 * bounded queue (see ComputeLimits). Created by main.ts (and by tests), closed on shutdown.
 */
export class ComputePool {
  readonly limits: ComputeLimits;
  private readonly pool: Piscina<{ task: ComputeTask; started: unknown }, ComputeResult>;

  constructor(limits: Partial<ComputeLimits> = {}, log: (error: unknown) => void = console.error) {
    this.limits = { ...DEFAULT_COMPUTE_LIMITS, ...limits };
    this.pool = new Piscina({
      filename: WORKER_FILE,
      // vitest does not carry tsx into worker threads; under `node --import tsx` this repeats what they inherit.
      execArgv: workerExtension === '.ts' ? ['--import', 'tsx'] : [],
      minThreads: 0, // no thread until the first job; idle ones end after idleTimeout
      maxThreads: this.limits.threads,
      idleTimeout: 30_000,
      concurrentTasksPerWorker: 1,
      resourceLimits: { maxOldGenerationSizeMb: this.limits.maxHeapMb },
    });
    // A worker that fails outside a job (while starting) must not take the server down.
    this.pool.on('error', (error) => log(error));
  }

  /** A design file in one format (the design already validated); `title` is the design's name printed on a PDF. */
  exportDesign(design: Design, format: ExportFormat, name: string, extra: { title?: string } = {}): Promise<ExportedFile> {
    return this.run({ kind: 'export', design, format, name, ...extra }, `${format.toUpperCase()} export`) as Promise<ExportedFile>;
  }

  /** The card thumbnail of a design (SVG text). */
  thumbnailSvg(design: Design): Promise<string> {
    return this.run({ kind: 'thumbnail', design }, 'thumbnail') as Promise<string>;
  }

  /** Jobs running or waiting for a thread. */
  get pending(): number {
    return this.inFlight;
  }

  private inFlight = 0;

  async close(): Promise<void> {
    await this.pool.close({ force: true });
  }

  private async run(task: ComputeTask, what: string): Promise<ComputeResult> {
    const { maxQueue, timeoutMs, retryAfterSeconds } = this.limits;
    if (this.inFlight >= this.limits.threads + maxQueue) throw new ComputeBusyError(retryAfterSeconds);
    const channel = new MessageChannel();
    const abort = new AbortController();
    let timer: NodeJS.Timeout | undefined;
    channel.port1.once('message', () => {
      timer = setTimeout(() => abort.abort(), timeoutMs);
    });
    channel.port1.unref();
    this.inFlight++;
    try {
      return await this.pool.run({ task, started: channel.port2 }, { transferList: [channel.port2], signal: abort.signal });
    } catch (error) {
      throw tooHeavy(error, what, abort.signal.aborted, this.limits) ?? error;
    } finally {
      this.inFlight--;
      clearTimeout(timer);
      channel.port1.close();
    }
  }
}

/** The 422 for a job stopped by its budget; undefined for any other failure. */
function tooHeavy(error: unknown, what: string, timedOut: boolean, limits: ComputeLimits): HttpError | undefined {
  const lighter = 'make the design lighter: fewer lines, layers, lobes or Fourier harmonics, or a shorter bar';
  if (timedOut) {
    return new HttpError(422, 'too_heavy', `The ${what} of this design takes longer than the server's limit of ${limits.timeoutMs / 1000} s; ${lighter}.`);
  }
  if ((error as { code?: string } | null)?.code === 'ERR_WORKER_OUT_OF_MEMORY') {
    return new HttpError(422, 'too_heavy', `The ${what} of this design needs more memory than the server's limit of ${limits.maxHeapMb} MB; ${lighter}.`);
  }
  return undefined;
}
