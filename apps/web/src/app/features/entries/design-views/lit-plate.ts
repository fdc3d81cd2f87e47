import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { MatSliderModule } from '@angular/material/slider';
import type { StudyData } from '../../studio/compute/design-views';
import { azimuthOf, lightFrom } from '../../studio/views/groove-lighting';
import { renderLit, type LitFrame } from '../../studio/views/lit-raster';
import { yRange } from '../../studio/views/plot-geometry';
import { windowRange, type StudyWindow } from '../../studio/views/study-drawing';

/** Tallest the plate is drawn (CSS px); a taller window shows its middle lines. */
const MAX_HEIGHT_PX = 320;
const DARK = [34, 38, 44] as const;
const BRIGHT = [247, 248, 250] as const;

/**
 * The engraved surface as polished metal, for a study given by input (the studio's lit view follows
 * its live document instead). The light moves by dragging across the plate or with the two sliders.
 */
@Component({
  selector: 'bw-lit-plate',
  imports: [MatSliderModule],
  templateUrl: './lit-plate.html',
  styleUrl: './lit-plate.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LitPlate {
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('plate');
  readonly study = input.required<StudyData>();
  readonly window = input.required<StudyWindow>();
  /** Groove depth in mm and the V-cutter's included angle in degrees. */
  readonly depthMm = input.required<number>();
  readonly vAngle = input.required<number>();

  protected readonly azimuth = signal(60);
  protected readonly elevation = signal(35);
  private readonly cssWidth = signal(0);
  private frameRequest = 0;

  private readonly frame = computed(() => {
    const study = this.study();
    const width = this.cssWidth();
    if (width <= 0) return null;
    const [x0, x1] = windowRange(study, this.window());
    let low = Infinity;
    let high = -Infinity;
    for (const line of study.lines) {
      const [lo, hi] = yRange(line, x0, x1);
      low = Math.min(low, lo);
      high = Math.max(high, hi);
    }
    const margin = Math.max(study.width, study.spacing);
    low -= margin;
    high += margin;
    const perPx = (x1 - x0) / width;
    const heightCss = Math.min(MAX_HEIGHT_PX, Math.max(48, (high - low) / perPx));
    const span = heightCss * perPx;
    const y0 = span < high - low ? (low + high) / 2 - span / 2 : low;
    return { x0, x1, y0, y1: y0 + span, widthCss: width, heightCss };
  });

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      const element = this.canvas().nativeElement.parentElement!;
      const observer = new ResizeObserver(([entry]) => this.cssWidth.set(Math.floor(entry.contentRect.width)));
      observer.observe(element);
      destroyRef.onDestroy(() => observer.disconnect());
    });
    effect(() => {
      const frame = this.frame();
      const lines = this.study().lines;
      const depth = this.depthMm();
      const vAngle = this.vAngle();
      const light = lightFrom(this.azimuth(), this.elevation());
      if (!frame) return;
      untracked(() => {
        cancelAnimationFrame(this.frameRequest);
        this.frameRequest = requestAnimationFrame(() => this.paint(frame, { lines, depth, vAngle, light }));
      });
    });
    destroyRef.onDestroy(() => cancelAnimationFrame(this.frameRequest));
  }

  protected drag(event: PointerEvent): void {
    if (event.buttons !== 1 && event.type !== 'pointerdown') return;
    const box = (event.currentTarget as HTMLElement).getBoundingClientRect();
    const dx = event.clientX - (box.left + box.width / 2);
    const dy = box.top + box.height / 2 - event.clientY;
    if (Math.hypot(dx, dy) > 4) this.azimuth.set(Math.round(azimuthOf(dx, dy)));
  }

  protected setAzimuth(event: Event): void {
    this.azimuth.set(Number((event.target as HTMLInputElement).value));
  }

  protected setElevation(event: Event): void {
    this.elevation.set(Number((event.target as HTMLInputElement).value));
  }

  private paint(
    frame: NonNullable<ReturnType<LitPlate['frame']>>,
    cut: { lines: Float64Array[]; depth: number; vAngle: number; light: ReturnType<typeof lightFrom> },
  ): void {
    const canvas = this.canvas().nativeElement;
    const ratio = Math.min(2, canvas.ownerDocument.defaultView?.devicePixelRatio ?? 1);
    const px: LitFrame = { x0: frame.x0, x1: frame.x1, y0: frame.y0, y1: frame.y1, width: Math.round(frame.widthCss * ratio), height: Math.round(frame.heightCss * ratio) };
    canvas.width = px.width;
    canvas.height = px.height;
    canvas.style.height = `${frame.heightCss}px`;
    const pixels = renderLit({ lines: cut.lines, depth: cut.depth, vAngle: cut.vAngle, frame: px, light: cut.light, dark: DARK, bright: BRIGHT });
    canvas.getContext('2d')?.putImageData(new ImageData(pixels as Uint8ClampedArray<ArrayBuffer>, px.width, px.height), 0, 0);
  }
}
