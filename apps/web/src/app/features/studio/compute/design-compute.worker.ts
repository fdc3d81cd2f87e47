/// <reference lib="webworker" />
import { ArrayPool } from './array-pool';
import type { ComputeMessage, ComputeReply, ComputeRequest } from './compute-messages';
import { computeDesignViews, studyTransferables, transferables, type ComputeStage, type DesignViews, type DrawingContext, type StudyLead } from './design-views';

/*
 * The engine off the page's thread. For each request: a quick preview, then the full computation
 * (the full alone while it is fast); each stage sends its line study first, then the rest.
 * Requests that arrive meanwhile replace the waiting one, so a slider dragged fast computes only
 * the latest value; between the two stages the worker yields so a newer request can overtake.
 */
let latest: ComputeRequest | null = null;
let running = false;
/**
 * A full computation that took less than this (ms) is not preceded by a preview: the page would
 * otherwise draw twice in a row for one edit, the preview adding nothing one frame before the full.
 */
const PREVIEW_WORTH_MS = 40;
/**
 * Nor is it when the preview saves too little: a preview costing more than this share of the full's
 * time delays the full by as much as it shows early, and each preview also makes the page and the
 * plates draw once more (measured: a 45 ms full behind a 25 ms preview finished ~100 ms later).
 */
const PREVIEW_MAX_SHARE = 1 / 3;
let lastFullMs = Infinity;
let lastPreviewMs = 0;

/** Whether a preview is worth computing before the full, judged on the last of each. */
function previewWorth(): boolean {
  return lastFullMs >= PREVIEW_WORTH_MS && lastPreviewMs <= lastFullMs * PREVIEW_MAX_SHARE;
}
/** The last full computation's warnings and depth: a preview's bar drawing marks them as the page shows them meanwhile. */
let lastMarks: DrawingContext | undefined;

/** The arrays of views the page has let go, written over by the next computations. */
const pool = new ArrayPool();

/**
 * Full computations of a design about to be edited, run once while the worker is idle after its views
 * are sent. V8 compiles the engine as it runs it (interpreted, then baseline, then optimised code), so
 * a fresh worker's first computations take several times as long as later ones: the example bar's
 * full stage took 132, 39, 21, 14, 14, 9 … 6–12 ms in Chromium's worker on this machine, and the first
 * edits in the studio were the slowest of all (the p95 of the redraw bench). Run at opening, that
 * compiling is done before the first edit instead of in it. A request stops them (between runs), and
 * their time is the next full stage's estimate (a cold first computation would otherwise ask for
 * previews the warm engine does not need). A run starts only if, at the last full stage's time, the
 * runs stay within WARM_UP_MS in all: on a phone or a 600 mm bar six cold runs would be seconds of
 * battery for little gain, and an edit that comes during a run waits for it.
 */
const WARM_UP_RUNS = 6;
const WARM_UP_MS = 300;
let warmUpsLeft = WARM_UP_RUNS;
let warmUpSpent = 0;
let warmUpFrom: ComputeRequest | null = null;

addEventListener('message', (event: MessageEvent<ComputeMessage>) => {
  if ('recycle' in event.data) return pool.give(event.data.recycle);
  latest = event.data;
  if (!running) void work();
});

async function work(): Promise<void> {
  running = true;
  for (;;) {
    if (latest) {
      const request = latest;
      latest = null;
      if (request.warmUp) warmUpFrom = request;
      const stages: ComputeStage[] = previewWorth() ? ['preview', 'full'] : ['full'];
      for (const stage of stages) {
        if (latest) break; // overtaken: start on the newer design
        const started = performance.now();
        reply(request.id, stage, request);
        if (stage === 'full') lastFullMs = performance.now() - started;
        else lastPreviewMs = performance.now() - started;
        await nextTask();
      }
    } else if (warmUpFrom && warmUpsLeft > 0 && warmUpSpent + lastFullMs <= WARM_UP_MS) {
      warmUpsLeft--;
      warmUp(warmUpFrom);
      await nextTask();
    } else break;
  }
  running = false;
}

/** Lets the messages that came meanwhile in (a newer request overtakes). */
function nextTask(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}

/** One full computation sent nowhere: its arrays go straight back to the pool. */
function warmUp(request: ComputeRequest): void {
  try {
    const started = performance.now();
    const { study: _unsent, ...views } = viewsOf(request, 'full');
    lastFullMs = performance.now() - started;
    warmUpSpent += lastFullMs;
    pool.give(transferables(views));
  } catch {
    warmUpsLeft = 0; // the design's own request has said what is wrong with it
  }
}

/** The request's views at `stage`, on the pool's arrays, the preview's marks taken from the last full stage. */
function viewsOf(request: ComputeRequest, stage: ComputeStage, onStudy?: (lead: StudyLead) => void): DesignViews {
  return computeDesignViews(request.design, stage, request.companion, lastMarks, onStudy, pool.allocate, request.mode);
}

function reply(id: number, stage: ComputeStage, request: ComputeRequest): void {
  try {
    // The study goes ahead (its lines handed over, so the rest is sent without it).
    const lead = (lead: StudyLead) => self.postMessage({ id, lead } satisfies ComputeReply, { transfer: studyTransferables(lead.study) });
    const { study: _sent, ...views } = viewsOf(request, stage, lead);
    if (views.plan) lastMarks = { warnings: views.profile.warnings, depth: views.plan.depth };
    self.postMessage({ id, views } satisfies ComputeReply, { transfer: transferables(views) });
  } catch (error) {
    self.postMessage({ id, error: error instanceof Error ? error.message : String(error) } satisfies ComputeReply);
  }
}
