import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, model, output, signal, untracked, viewChild } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatSliderModule } from '@angular/material/slider';
import { METAL_TINTS, type MetalTint } from '@barwright/engine';
import type { StudyWindow } from '../study-drawing';
import type { StudyData } from '../view-data';
import { linesInWindow, plateFrame } from './plate-frame';
import type { PlateReply, PlateRequest } from './plate-messages';
import { platesDue, type PlateInputs } from './plates-due';

const TINT_LABELS: Readonly<Record<MetalTint, string>> = { silver: 'Silver', gold: 'Gold', brass: 'Brass' };
/** Thinnest line drawn on the flat plate, CSS px. */
const HAIRLINE_PX = 1;
/** A plate this near the screen counts as on it (CSS px). None: a larger margin drew the flat plate, 63 px below the studio's fold at 1280 × 900, on every edit; a plate scrolled to shows its last picture for one redraw. */
const NEAR_SCREEN_PX = 0;

/**
 * The line study's two plates over one window at true scale: flat (ink lines as wide as the grooves)
 * and lit (the engine's height field of the grooves, shaded as polished metal under a light you move,
 * in the metal you choose). Each is drawn in a worker of its own on an OffscreenCanvas, so the page's thread
 * only hands over the lines; moving the light reshades without computing the surface again. A plate
 * off the screen is drawn when it comes into view (plates-due.ts says why).
 */
@Component({
  selector: 'bw-study-plates',
  imports: [MatButtonToggleModule, MatSliderModule],
  templateUrl: './study-plates.html',
  styleUrl: './study-plates.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyPlates {
  private readonly flatCanvas = viewChild.required<ElementRef<HTMLCanvasElement>>('flat');
  private readonly litCanvas = viewChild.required<ElementRef<HTMLCanvasElement>>('lit');
  readonly study = input.required<StudyData>();
  readonly window = input.required<StudyWindow>();
  /** The period on the bar (mm), written on the flat plate as a fingerprint of what is drawn. */
  readonly period = input<number | null>(null);
  readonly idPrefix = input('');
  /**
   * The study is a draft (a quick preview, the final one following): only the flat plate is drawn
   * from it; the lit plate's surface, the costly part, waits for the final study.
   */
  readonly draft = input(false);

  protected readonly tints = METAL_TINTS.map((value) => ({ value, label: TINT_LABELS[value] }));
  /** The metal and the light: bound from outside when several plates share one light (compare). */
  readonly tint = model<MetalTint>('silver');
  readonly azimuth = model(60);
  readonly elevation = model(35);
  /** False: the plates alone, the light set from outside. */
  readonly controls = input(true);
  /**
   * Whether either plate is on the screen, told on the first observation and whenever it changes. The
   * studio holds a new study back from views nobody sees until the rest of its views come.
   */
  readonly inView = output<boolean>();
  /** What `inView` last said: nothing until the first observation, which is always told (plates made again on the screen must say so). */
  private toldInView: boolean | null = null;
  private readonly cssWidth = signal(0);
  private readonly themeChanges = signal(0);
  protected readonly supported = signal(true);
  /** The newest request each plate shows finished (for tests and benchmarks: the plate is drawn when it equals `requested`). */
  protected readonly flatShown = signal(0);
  protected readonly litShown = signal(0);
  /** The newest request the lit plate shows at all: its quick surface, before the anti-aliased one. */
  protected readonly litFirst = signal(0);
  protected readonly requested = signal(0);
  /** The newest request the lit plate is to show (drafts leave it). */
  protected readonly litRequested = signal(0);
  protected readonly frame = computed(() => plateFrame(this.study(), this.window(), this.cssWidth()));
  protected readonly shownLines = computed(() => (this.frame()?.cropped ? 'the middle lines of the study' : 'every line of the study'));

  /** A worker per plate: the lit surface is computed while the flat plate is drawn. */
  private workers: PlateWorkers | null = null;
  private nextId = 0;
  /** The flat plate's ink and ground as the page resolves them (read once, and again when the theme changes: reading styles forces a style pass). */
  private colours: { ink: string; ground: string } | null = null;
  /** The light and metal last handed to the worker. */
  private lightSent = '';
  /** Which plates are on the screen (until the first observation: both, so a page's first picture is not held back). */
  private readonly onScreen = signal({ flat: true, lit: true });
  /**
   * Each plate's height on the page (CSS px): that of the picture it was last sent, so a plate off the
   * screen keeps its place (changing it moved and repainted what lies below on every edit) and one on
   * it changes size with its new picture, not before.
   */
  protected readonly heights = signal({ flat: 0, lit: 0 });
  /** What each plate was last sent. */
  private readonly sent: { flat: PlateInputs | null; lit: PlateInputs | null } = { flat: null, lit: null };

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      this.workers = startWorkers(this.flatCanvas().nativeElement, this.litCanvas().nativeElement);
      if (!this.workers) {
        this.supported.set(false);
        return;
      }
      for (const worker of Object.values(this.workers)) {
        worker.addEventListener('message', (event: MessageEvent<PlateReply>) => {
          const reply = event.data;
          if (reply.plate === 'flat') this.flatShown.set(reply.id);
          else {
            this.litFirst.set(reply.id);
            if (reply.fine) this.litShown.set(reply.id);
          }
        });
      }
      const observer = new ResizeObserver(([entry]) => this.cssWidth.set(Math.floor(entry.contentRect.width)));
      observer.observe(this.flatCanvas().nativeElement.parentElement!);
      const flatCanvas = this.flatCanvas().nativeElement;
      const seen = new IntersectionObserver(
        (entries) => {
          const next = { ...this.onScreen() };
          for (const entry of entries) next[entry.target === flatCanvas ? 'flat' : 'lit'] = entry.isIntersecting;
          this.onScreen.set(next);
          const inView = next.flat || next.lit;
          if (inView !== this.toldInView) this.inView.emit((this.toldInView = inView));
        },
        { rootMargin: `${NEAR_SCREEN_PX}px 0px` },
      );
      seen.observe(flatCanvas);
      seen.observe(this.litCanvas().nativeElement);
      // The ground toggle (light or dark) changes a class or attribute high up: read the colours again, redraw.
      const theme = new MutationObserver(() => {
        this.colours = null;
        this.themeChanges.update((n) => n + 1);
      });
      for (const el of [document.documentElement, document.body]) theme.observe(el, { attributes: true, attributeFilter: ['class', 'data-theme', 'style'] });
      destroyRef.onDestroy(() => {
        observer.disconnect();
        seen.disconnect();
        theme.disconnect();
      });
    });
    destroyRef.onDestroy(() => {
      this.workers?.flat.terminate();
      this.workers?.lit.terminate();
    });
    // A new study or window: new pictures for the plates on the screen (the light goes first, so the
    // first lit paint is right); a plate coming into view gets the newest. A draft made final (its full
    // computation failed, so it stays) is drawn again, the lit plate this time.
    effect(() => {
      const frame = this.frame();
      const study = this.study();
      const draft = this.draft();
      const theme = this.themeChanges();
      const visible = this.onScreen();
      if (!frame) return;
      untracked(() => {
        const now: PlateInputs = { study, frame, theme };
        const due = platesDue(now, draft, { visible: visible.flat, sent: this.sent.flat }, { visible: visible.lit, sent: this.sent.lit });
        if (!this.workers || (!due.flat && !due.lit)) return;
        if (due.lit) this.sendLight();
        const ratio = Math.min(2, globalThis.devicePixelRatio || 1);
        const reach = study.depth / Math.tan((study.vAngle * Math.PI) / 360) + study.spacing;
        const lines = linesInWindow(study.lines, frame.x0, frame.x1, reach);
        const colours = this.colours ?? this.readColours();
        const id = ++this.nextId;
        const request: PlateRequest = {
          kind: 'surface', id, lines, width: study.width, depth: study.depth, vAngle: study.vAngle,
          window: { x0: frame.x0, x1: frame.x1, y0: frame.y0, y1: frame.y1 },
          widthPx: Math.round(frame.widthCss * ratio), heightPx: Math.round(frame.heightCss * ratio),
          ...colours,
          hairlinePx: HAIRLINE_PX * ratio,
        };
        const transfer = lines.map((l) => l.buffer as ArrayBuffer);
        const heights = this.heights();
        this.heights.set({ flat: due.flat ? frame.heightCss : heights.flat, lit: due.lit ? frame.heightCss : heights.lit });
        // When both draw, the flat worker gets a copy of the lines (tens of kB) and the lit one takes them over.
        if (due.flat) {
          this.sent.flat = now;
          this.requested.set(id);
          this.workers.flat.postMessage(request, due.lit ? [] : transfer);
        }
        if (due.lit) {
          this.sent.lit = now;
          this.litRequested.set(id);
          this.workers.lit.postMessage(request, transfer);
        }
      });
    });
    effect(() => {
      this.azimuth();
      this.elevation();
      this.tint();
      untracked(() => this.sendLight());
    });
  }

  protected drag(event: PointerEvent): void {
    if (event.buttons !== 1 && event.type !== 'pointerdown') return;
    const box = (event.currentTarget as HTMLElement).getBoundingClientRect();
    const dx = event.clientX - (box.left + box.width / 2);
    const dy = box.top + box.height / 2 - event.clientY;
    if (Math.hypot(dx, dy) > 4) this.azimuth.set(Math.round(((Math.atan2(dy, dx) * 180) / Math.PI + 360) % 360));
  }

  protected setAzimuth(event: Event): void {
    this.azimuth.set(Number((event.target as HTMLInputElement).value));
  }

  protected setElevation(event: Event): void {
    this.elevation.set(Number((event.target as HTMLInputElement).value));
  }

  protected setTint(tint: MetalTint): void {
    this.tint.set(tint);
  }

  private readColours(): { ink: string; ground: string } {
    const style = getComputedStyle(this.flatCanvas().nativeElement);
    this.colours = { ink: style.color, ground: style.backgroundColor };
    return this.colours;
  }

  /** Sends the light and metal when they differ from the last sent (a repeat would reshade the held surface for nothing). */
  private sendLight(): void {
    const light = { azimuthDeg: this.azimuth(), elevationDeg: this.elevation() };
    const key = `${light.azimuthDeg} ${light.elevationDeg} ${this.tint()}`;
    if (key === this.lightSent) return;
    this.lightSent = key;
    this.workers?.lit.postMessage({ kind: 'light', light, tint: this.tint() } satisfies PlateRequest);
  }
}

interface PlateWorkers {
  flat: Worker;
  lit: Worker;
}

/** The plates' workers, each holding its canvas; null where a browser has no OffscreenCanvas or module workers. */
function startWorkers(flat: HTMLCanvasElement, lit: HTMLCanvasElement): PlateWorkers | null {
  if (typeof Worker === 'undefined' || typeof flat.transferControlToOffscreen !== 'function') return null;
  const started: Worker[] = [];
  try {
    const start = (plate: 'flat' | 'lit', element: HTMLCanvasElement): Worker => {
      const worker = new Worker(new URL('./study-plates.worker', import.meta.url), { type: 'module', name: `study-plates-${plate}` });
      started.push(worker);
      const canvas = element.transferControlToOffscreen();
      worker.postMessage({ kind: 'canvas', plate, canvas } satisfies PlateRequest, [canvas]);
      return worker;
    };
    return { flat: start('flat', flat), lit: start('lit', lit) };
  } catch {
    for (const worker of started) worker.terminate();
    return null;
  }
}
