/// <reference lib="webworker" />
import { computeBatch } from '@barwright/engine';
import { packItem, POST_EVERY_MS, resultTransferables, SWEEP_STEP_MM, type SweepReply, type SweepRequest, type ThumbRequest, type WireResult } from './sweep-messages';
import type { SweepJob } from './sweep-types';
import { paintThumb } from './thumb-paint';

/*
 * One worker of the sweep's pool. It computes the jobs it is handed in order, a slice of at most
 * POST_EVERY_MS at a time, posting each slice's results (buffers transferred) before yielding, so a
 * cancel, a new run or a thumbnail gets in between candidates. Thumbnails go first: the grid shows
 * them while the sweep still runs. Yields go through a MessageChannel, not setTimeout (nested
 * timeouts are held back to 4 ms, longer than a candidate takes).
 */
let run = 0;
let queue: SweepJob[] = [];
let head = 0;
const thumbs = new Map<number, ThumbRequest>();
let scheduled = false;
const tick = new MessageChannel();
tick.port1.onmessage = work;

addEventListener('message', (event: MessageEvent<SweepRequest>) => {
  const request = event.data;
  switch (request.kind) {
    case 'jobs':
      if (request.run !== run) {
        run = request.run;
        queue = [];
        head = 0;
      }
      queue.push(...request.jobs);
      break;
    case 'cancel':
      if (request.run >= run) {
        run = request.run;
        queue = [];
        head = 0;
      }
      break;
    case 'thumb':
      thumbs.set(request.id, request);
      break;
    case 'drop-thumb':
      thumbs.delete(request.id);
      break;
  }
  schedule();
});

function schedule(): void {
  if (scheduled || (head >= queue.length && thumbs.size === 0)) return;
  scheduled = true;
  tick.port2.postMessage(null);
}

function work(): void {
  scheduled = false;
  const started = performance.now();
  // Thumbnails first, the oldest request first: each is a few ms.
  for (const [id, request] of thumbs) {
    thumbs.delete(id);
    const t0 = performance.now();
    let bitmap: ImageBitmap | null = null;
    try {
      bitmap = paintThumb(request);
    } catch {
      bitmap = null;
    }
    post({ kind: 'thumb', id, bitmap, ms: performance.now() - t0 }, bitmap ? [bitmap] : []);
    if (performance.now() - started > POST_EVERY_MS) return schedule();
  }
  const results: WireResult[] = [];
  while (head < queue.length && (results.length === 0 || performance.now() - started < POST_EVERY_MS)) {
    const job = queue[head++];
    results.push(packItem(job.index, computeBatch([job.candidate], { step: SWEEP_STEP_MM })[0]));
  }
  if (head >= queue.length) {
    queue = [];
    head = 0;
  }
  if (results.length) post({ kind: 'results', run, results, pending: queue.length - head }, resultTransferables(results));
  schedule();
}

function post(reply: SweepReply, transfer: Transferable[]): void {
  self.postMessage(reply, transfer);
}
