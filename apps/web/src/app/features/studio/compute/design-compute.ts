import { afterNextRender, computed, DestroyRef, inject, Injectable, Injector, signal } from '@angular/core';
import type { Design } from '@barwright/contracts';
import type { Companion } from '@barwright/engine';
import type { ProfileMode } from '../../../shared/views/profile-drawing';
import type { ComputeReply, ComputeRequest, RecycleMessage } from './compute-messages';
import { computeDesignViews, studyLeadOf, transferables, type DesignViews, type StudyLead } from './design-views';

/** How long a refinement may run before the views say they are still working (ms). */
const PROGRESS_AFTER_MS = 150;

/**
 * Computes the live views of the editor's design in a Web Worker: a preview in a few milliseconds,
 * then the full computation (tens of milliseconds for a 150 mm bar). Only the newest request counts.
 */
@Injectable()
export class DesignCompute {
  private readonly worker = createWorker();
  private nextId = 0;
  private readonly requested = signal(0);
  private readonly shown = signal<{ id: number; views: DesignViews } | null>(null);
  /** `settled`: no later stage will replace this study (it was put back after a stage failed), so even a preview's is final. */
  private readonly lead = signal<{ id: number; lead: StudyLead; settled?: boolean } | null>(null);
  private readonly refined = signal<{ id: number; views: DesignViews } | null>(null);
  private readonly slow = signal(false);
  private readonly failure = signal<string | null>(null);
  private readonly sentAt = new Map<number, number>();
  private readonly latency = signal<number | null>(null);
  private slowTimer: ReturnType<typeof setTimeout> | null = null;
  private readonly companionKind = signal<Companion | null>(null);
  /** The bar view's mode: the worker draws the bar in it alone. */
  private profileMode: ProfileMode = 'detail';
  private lastDesign: Design | null = null;
  /** The design will be edited here (the studio), so the worker warms its engine up (ComputeRequest.warmUp). */
  private editing = false;
  /** Whether a plate of the line study is on the screen (true until the plates say otherwise). */
  private studyInView = true;
  /**
   * A stage's study held back while no plate is on the screen: applied with the rest of its views, so
   * the page redraws once an edit rather than once for the study's captions, in the middle of the
   * worker's computation (two cores), and again for the bar.
   */
  private heldLead: { id: number; lead: StudyLead } | null = null;
  private readonly injector = inject(Injector);
  /** Views replaced or dropped, whose arrays go back to the worker once the page has rendered without them. */
  private readonly retired: Omit<DesignViews, 'study'>[] = [];
  private releasing = false;

  /** The newest views computed (a preview until the full computation lands). */
  readonly views = computed(() => this.shown()?.views ?? null);
  /**
   * The newest line study with its stage and period: it comes ahead of the rest of its views, so the
   * plates draw it while the worker finishes the bar's drawings (the same object `views` carries after).
   */
  readonly study = computed(() => this.lead()?.lead ?? null);
  /**
   * True while the study is a preview's with the full computation to follow: the plates then draw only
   * the flat plate (the lit one waits for the final study).
   */
  readonly studyIsDraft = computed(() => {
    const lead = this.lead();
    return lead?.lead.stage === 'preview' && !lead.settled;
  });
  /** The newest full computation: the cut plan and the warnings come from it. */
  readonly full = computed(() => this.refined()?.views ?? null);
  /** True while the full computation of the newest design has been running for a while. */
  readonly working = this.slow.asReadonly();
  readonly error = this.failure.asReadonly();
  /** From handing the design to the worker to the first of its views back (after their study), ms; the redraw follows in the next frame. */
  readonly lastLatencyMs = this.latency.asReadonly();
  /** The companion bar the bar view shows beside the design's own (null: none). */
  readonly companion = this.companionKind.asReadonly();

  constructor() {
    this.worker?.addEventListener('message', (event: MessageEvent<ComputeReply>) => this.receive(event.data));
    inject(DestroyRef).onDestroy(() => {
      this.worker?.terminate();
      if (this.slowTimer) clearTimeout(this.slowTimer);
    });
  }

  /** Asks for the views of `design`; earlier requests still waiting are dropped. */
  request(design: Design): void {
    this.lastDesign = design;
    const companion = this.companionKind() ?? undefined;
    const mode = this.profileMode;
    const id = ++this.nextId;
    this.requested.set(id);
    this.sentAt.set(id, performance.now());
    if (this.slowTimer) clearTimeout(this.slowTimer);
    this.slowTimer = setTimeout(() => this.slow.set((this.refined()?.id ?? 0) < this.requested()), PROGRESS_AFTER_MS);
    if (this.worker) {
      this.worker.postMessage({ id, design, companion, mode, warmUp: this.editing } satisfies ComputeRequest);
    } else {
      // No worker (an old browser): compute here, after this frame, full stage only.
      setTimeout(() => computeHere(id, design, companion, mode).forEach((reply) => this.receive(reply)), 0);
    }
  }

  /**
   * The design is edited here: once the first views are sent, the worker runs the engine a few times
   * more while idle, so that the first edits do not wait for V8 to compile it. Pages that only show a
   * design (an entry, a comparison) do not ask: they are computed once.
   */
  expectEdits(): void {
    this.editing = true;
  }

  /** Computes a companion bar with the design from now on (null: none), starting with the current design. */
  setCompanion(kind: Companion | null): void {
    this.companionKind.set(kind);
    if (this.lastDesign) this.request(this.lastDesign);
  }

  /**
   * The bar view's mode from now on. Nothing is computed again: the view draws the mode it was just
   * switched to itself, once, and the next edit's drawing comes in that mode.
   */
  setProfileMode(mode: ProfileMode): void {
    this.profileMode = mode;
  }

  /** Whether a plate of the line study is on the screen: a study is shown as soon as it comes only then. */
  setStudyInView(inView: boolean): void {
    this.studyInView = inView;
    if (inView) this.showHeldLead();
  }

  private showHeldLead(): void {
    const held = this.heldLead;
    this.heldLead = null;
    if (held && held.id >= (this.lead()?.id ?? 0)) this.lead.set(held);
  }

  private receive(reply: ComputeReply): void {
    if ('error' in reply) {
      if (reply.id === this.requested()) this.failure.set(reply.error);
      // A stage that sent its study and then failed: the plates go back to the study of the views shown,
      // so they never show a study whose bar and cut plan do not exist; nothing follows it, so the lit
      // plate draws it even when it is a preview's.
      if (this.heldLead?.id === reply.id) this.heldLead = null;
      if (this.lead()?.id === reply.id) this.lead.set(leadOf(this.shown()));
      return;
    }
    if ('lead' in reply) {
      if (reply.id < (this.lead()?.id ?? 0)) return;
      this.heldLead = { id: reply.id, lead: reply.lead };
      if (this.studyInView) this.showHeldLead();
      return;
    }
    this.showHeldLead();
    const sent = this.sentAt.get(reply.id);
    if (sent !== undefined) {
      this.latency.set(performance.now() - sent);
      this.sentAt.delete(reply.id);
    }
    // The worker sends each stage's lead just before the rest: the newest lead is this stage's.
    const lead = this.lead();
    if (lead?.id !== reply.id || lead.lead.stage !== reply.views.stage) return this.retire(reply.views);
    const views: DesignViews = { ...reply.views, study: lead.lead.study };
    const before = [this.shown()?.views, this.refined()?.views];
    let used = false;
    if (reply.id >= (this.shown()?.id ?? 0)) {
      this.shown.set({ id: reply.id, views });
      used = true;
    }
    if (views.stage === 'full' && reply.id >= (this.refined()?.id ?? 0)) {
      this.refined.set({ id: reply.id, views });
      used = true;
      if (reply.id === this.requested()) {
        this.slow.set(false);
        this.failure.set(null);
      }
    }
    this.retire(...before, used ? undefined : views);
  }

  /**
   * Hands the arrays of views no longer shown back to the worker, which writes the next computations
   * over them (fresh memory is slow in its thread). After the next render, so that no view still
   * reads them (a handed-back array is emptied here); those still shown are kept.
   */
  private retire(...views: (Omit<DesignViews, 'study'> | undefined)[]): void {
    if (!this.worker) return;
    for (const v of views) if (v) this.retired.push(v);
    if (this.releasing || !this.retired.length) return;
    this.releasing = true;
    afterNextRender(
      () => {
        this.releasing = false;
        const held = new Set([this.shown()?.views, this.refined()?.views].flatMap((v) => (v ? transferables(v) : [])));
        const free = [...new Set(this.retired.splice(0).flatMap((v) => transferables(v)))].filter((b) => !held.has(b) && b.byteLength > 0);
        if (free.length) this.worker?.postMessage({ recycle: free } satisfies RecycleMessage, free);
      },
      { injector: this.injector },
    );
  }
}

/** The lead the shown views came with, for going back to it. */
function leadOf(shown: { id: number; views: DesignViews } | null): { id: number; lead: StudyLead; settled: true } | null {
  return shown && { id: shown.id, lead: studyLeadOf(shown.views), settled: true };
}

function createWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./design-compute.worker', import.meta.url), { type: 'module', name: 'design-compute' });
  } catch {
    return null;
  }
}

/** The worker's replies, computed on the page: the lead, then the rest. */
function computeHere(id: number, design: Design, companion?: Companion, mode?: ProfileMode): ComputeReply[] {
  try {
    const replies: ComputeReply[] = [];
    const { study: _sent, ...views } = computeDesignViews(design, 'full', companion, undefined, (lead) => replies.push({ id, lead }), undefined, mode);
    return [...replies, { id, views }];
  } catch (error) {
    return [{ id, error: error instanceof Error ? error.message : String(error) }];
  }
}
