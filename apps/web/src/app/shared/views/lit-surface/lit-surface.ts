import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, model, signal, untracked, viewChild } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatSliderModule } from '@angular/material/slider';
import { METAL_TINTS, type MetalTint } from '@barwright/engine';
import type { StudyWindow } from '../study-drawing';
import type { StudyData } from '../view-data';
import { litFrame, linesInWindow } from './lit-frame';
import type { LitReply, LitRequest } from './lit-messages';

const TINT_LABELS: Readonly<Record<MetalTint, string>> = { silver: 'Silver', gold: 'Gold', brass: 'Brass' };

/**
 * The engraved plate as polished metal: the engine's height field of the grooves, shaded under a
 * light you move (drag across the plate, or the sliders) in the metal you choose. Both the surface
 * and its painting run in a worker on an OffscreenCanvas; moving the light only reshades.
 */
@Component({
  selector: 'bw-lit-surface',
  imports: [MatButtonToggleModule, MatSliderModule],
  templateUrl: './lit-surface.html',
  styleUrl: './lit-surface.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LitSurface {
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('plate');
  readonly study = input.required<StudyData>();
  readonly window = input.required<StudyWindow>();
  readonly testId = input('study-lit');

  protected readonly tints = METAL_TINTS.map((value) => ({ value, label: TINT_LABELS[value] }));
  /** The metal and the light: bound from outside when several plates share one light (compare). */
  readonly tint = model<MetalTint>('silver');
  readonly azimuth = model(60);
  readonly elevation = model(35);
  /** False: the plate alone, its light set from outside. */
  readonly controls = input(true);
  private readonly cssWidth = signal(0);
  protected readonly supported = signal(true);
  /** Times of the last painting in the worker, ms (for the caption's fine print and the benchmarks). */
  protected readonly painted = signal<LitReply | null>(null);
  protected readonly frame = computed(() => litFrame(this.study(), this.window(), this.cssWidth()));
  protected readonly shownLines = computed(() => (this.frame()?.cropped ? 'the middle lines of the study' : 'every line of the study'));

  private worker: Worker | null = null;
  private nextId = 0;

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      const canvas = this.canvas().nativeElement;
      this.worker = startWorker(canvas);
      if (!this.worker) {
        this.supported.set(false);
        return;
      }
      this.worker.addEventListener('message', (event: MessageEvent<LitReply>) => this.painted.set(event.data));
      const observer = new ResizeObserver(([entry]) => this.cssWidth.set(Math.floor(entry.contentRect.width)));
      observer.observe(canvas.parentElement!);
      destroyRef.onDestroy(() => observer.disconnect());
    });
    destroyRef.onDestroy(() => this.worker?.terminate());
    // A new study or window: a new surface (the light goes with it, so the first paint is right).
    effect(() => {
      const frame = this.frame();
      const study = this.study();
      if (!frame) return;
      untracked(() => {
        this.sendLight();
        const ratio = Math.min(2, globalThis.devicePixelRatio || 1);
        const reach = study.depth / Math.tan((study.vAngle * Math.PI) / 360) + study.spacing;
        const lines = linesInWindow(study.lines, frame.x0, frame.x1, reach);
        this.post({
          kind: 'surface', id: ++this.nextId, lines, depth: study.depth, vAngle: study.vAngle,
          window: { x0: frame.x0, x1: frame.x1, y0: frame.y0, y1: frame.y1 },
          width: Math.round(frame.widthCss * ratio), height: Math.round(frame.heightCss * ratio),
        }, lines.map((l) => l.buffer as ArrayBuffer));
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

  private sendLight(): void {
    this.post({ kind: 'light', id: ++this.nextId, light: { azimuthDeg: this.azimuth(), elevationDeg: this.elevation() }, tint: this.tint() });
  }

  private post(request: LitRequest, transfer: Transferable[] = []): void {
    this.worker?.postMessage(request, transfer);
  }
}

/** The painter's worker, holding the canvas; null where a browser has no OffscreenCanvas or module workers. */
function startWorker(canvas: HTMLCanvasElement): Worker | null {
  if (typeof Worker === 'undefined' || typeof canvas.transferControlToOffscreen !== 'function') return null;
  try {
    const worker = new Worker(new URL('./lit-surface.worker', import.meta.url), { type: 'module', name: 'lit-surface' });
    const offscreen = canvas.transferControlToOffscreen();
    worker.postMessage({ kind: 'canvas', canvas: offscreen } satisfies LitRequest, [offscreen]);
    return worker;
  } catch {
    return null;
  }
}
