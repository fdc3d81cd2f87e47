import { DestroyRef, inject, Injectable, signal } from '@angular/core';
import type { SweepReply, SweepRequest, ThumbRequest } from './sweep-messages';
import { unpackResult } from './sweep-messages';
import { chunkSize, poolSize, timeLeft, wantsMore } from './sweep-schedule';
import { IDLE_PROGRESS, type SweepItem, type SweepJob, type SweepProgress } from './sweep-types';

export type { SweepItem, SweepJob, SweepProgress } from './sweep-types';

interface PoolWorker {
  worker: Worker;
  /** Jobs handed to it in this run and not yet answered. */
  pending: number;
}

/** Least time between two progress counts while a run goes on (ms). */
const PUBLISH_MS = 200;

type ThumbCallback = (bitmap: ImageBitmap | null) => void;

/**
 * Computes a sweep in a pool of Web Workers, one per core (at most 8), never on the page's thread.
 * Jobs are handed out in small chunks, each worker kept one chunk ahead, so every core stays busy and
 * results stream back as they are done; each is passed to the run's `onResult` by its index. A new
 * run cancels the one before. The same workers draw the grid's thumbnails, ahead of their queued jobs.
 * Provided by the sweep page (its workers end with it).
 */
@Injectable()
export class SweepRunner {
  private readonly state = signal<SweepProgress>(IDLE_PROGRESS);
  readonly progress = this.state.asReadonly();

  private pool: PoolWorker[] | null = null;
  private run_ = 0;
  private jobs: readonly SweepJob[] = [];
  private next = 0;
  private startedAt = 0;
  private done = 0;
  private failed = 0;
  private onResult: ((index: number, item: SweepItem) => void) | null = null;
  private nextThumb = 0;
  private readonly thumbCallbacks = new Map<number, ThumbCallback>();
  private thumbTurn = 0;
  private publishQueued = false;

  constructor() {
    inject(DestroyRef).onDestroy(() => {
      for (const p of this.pool ?? []) p.worker.terminate();
      this.pool = null;
      this.thumbCallbacks.clear();
      this.onResult = null;
    });
  }

  /** Computes `jobs`, calling `onResult` for each as it comes (in no set order). Cancels a run in progress. */
  run(jobs: readonly SweepJob[], onResult: (index: number, item: SweepItem) => void): void {
    const pool = this.workers();
    this.run_++;
    this.jobs = jobs;
    this.next = 0;
    this.done = 0;
    this.failed = 0;
    this.startedAt = performance.now();
    this.onResult = onResult;
    if (!pool) {
      this.state.set({ state: 'done', done: jobs.length, failed: jobs.length, total: jobs.length, msLeft: 0 });
      for (const job of jobs) onResult(job.index, { ok: false, message: 'This browser cannot run the sweep (it has no Web Workers).' });
      return;
    }
    for (const p of pool) {
      p.pending = 0;
      if (jobs.length === 0) this.post(p, { kind: 'cancel', run: this.run_ });
    }
    this.state.set({ state: jobs.length ? 'running' : 'done', done: 0, failed: 0, total: jobs.length, msLeft: null });
    // Two chunks each to start: one to work on, one waiting.
    for (let round = 0; round < 3; round++) for (const p of pool) this.refill(p);
  }

  /** Stops the run: the workers drop their queued jobs at once, results still on their way are ignored. */
  cancel(): void {
    const current = this.state();
    if (current.state !== 'running') return;
    this.run_++;
    for (const p of this.pool ?? []) {
      p.pending = 0;
      this.post(p, { kind: 'cancel', run: this.run_ });
    }
    this.onResult = null;
    this.state.set({ ...current, state: 'cancelled', msLeft: null });
  }

  /**
   * Draws a thumbnail in a pool worker, ahead of its queued jobs. `done` gets the picture (null when it
   * could not be drawn); the returned function drops the request (the picture, if it still comes, is closed unseen).
   */
  paintThumb(request: Omit<ThumbRequest, 'kind' | 'id'>, done: ThumbCallback): () => void {
    const pool = this.workers();
    if (!pool) {
      done(null);
      return () => undefined;
    }
    const id = ++this.nextThumb;
    // Round robin: the workers are equally busy with the run, and a thumbnail waits for at most one slice.
    const p = pool[this.thumbTurn++ % pool.length];
    this.thumbCallbacks.set(id, done);
    const line = request.line.slice(); // the item keeps its own; a copy of one period is a few KB
    this.post(p, { ...request, kind: 'thumb', id, line }, [line.buffer]);
    return () => {
      if (this.thumbCallbacks.delete(id)) this.post(p, { kind: 'drop-thumb', id });
    };
  }

  private workers(): PoolWorker[] | null {
    if (this.pool) return this.pool;
    if (typeof Worker === 'undefined') return null;
    const count = poolSize(globalThis.navigator?.hardwareConcurrency);
    const pool: PoolWorker[] = [];
    try {
      for (let i = 0; i < count; i++) {
        const worker = new Worker(new URL('./sweep.worker', import.meta.url), { type: 'module', name: `sweep-${i + 1}` });
        const p: PoolWorker = { worker, pending: 0 };
        worker.addEventListener('message', (event: MessageEvent<SweepReply>) => this.receive(p, event.data));
        pool.push(p);
      }
    } catch {
      for (const p of pool) p.worker.terminate();
      return null;
    }
    this.pool = pool;
    return pool;
  }

  private receive(p: PoolWorker, reply: SweepReply): void {
    if (reply.kind === 'thumb') {
      const done = this.thumbCallbacks.get(reply.id);
      this.thumbCallbacks.delete(reply.id);
      if (done) done(reply.bitmap);
      else reply.bitmap?.close();
      return;
    }
    if (reply.run !== this.run_ || !this.onResult) return;
    p.pending = Math.max(0, p.pending - reply.results.length);
    for (const r of reply.results) {
      this.done++;
      if (!r.ok) this.failed++;
      this.onResult(r.index, unpackResult(r));
    }
    this.refill(p);
    if (this.done >= this.jobs.length) {
      this.publish();
      this.onResult = null;
      this.jobs = [];
    } else if (!this.publishQueued) {
      // A few times a second, not every frame: each new count restyles and repaints the page, whose
      // thread every result has to pass through on its way from the workers.
      this.publishQueued = true;
      setTimeout(() => {
        this.publishQueued = false;
        if (this.state().state === 'running') this.publish();
      }, PUBLISH_MS);
    }
  }

  /** The progress of the current run from its counts. */
  private publish(): void {
    const total = this.state().total;
    const finished = this.done >= total;
    this.state.set({
      state: finished ? 'done' : 'running',
      done: this.done,
      failed: this.failed,
      total,
      msLeft: finished ? 0 : timeLeft(this.done, total, performance.now() - this.startedAt),
    });
  }

  private refill(p: PoolWorker): void {
    const remaining = this.jobs.length - this.next;
    const size = chunkSize(remaining, this.pool?.length ?? 1);
    if (size === 0 || !wantsMore(p.pending, size)) return;
    const chunk = this.jobs.slice(this.next, this.next + size);
    this.next += size;
    p.pending += size;
    this.post(p, { kind: 'jobs', run: this.run_, jobs: chunk as SweepJob[] });
  }

  private post(p: PoolWorker, request: SweepRequest, transfer: Transferable[] = []): void {
    p.worker.postMessage(request, transfer);
  }
}
