import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { MatSliderModule } from '@angular/material/slider';
import { DesignCompute } from '../../compute/design-compute';
import type { StudyData } from '../../compute/design-views';
import { azimuthOf, lightFrom, type Light } from '../groove-lighting';
import { renderLit, type LitFrame } from '../lit-raster';
import { yRange } from '../plot-geometry';
import { PointerArea } from '../pointer-area/pointer-area';
import { windowRange, type StudyWindow } from '../study-drawing';

/** Tallest the lit plate is drawn (CSS px); a taller window shows its middle lines. */
const MAX_HEIGHT_PX = 360;
/** Metal from its darkest shadow to its brightest highlight (RGB). */
const DARK = [34, 38, 44] as const;
const BRIGHT = [247, 248, 250] as const;

/**
 * The engraved surface as metal: each V-groove shaded by the angle between its walls and a light
 * you can move (drag across the plate, or the two sliders).
 */
@Component({
  selector: 'bw-lit-study',
  imports: [MatSliderModule, PointerArea],
  templateUrl: './lit-study.html',
  styleUrl: './lit-study.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LitStudy {
  private readonly compute = inject(DesignCompute);
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('plate');

  readonly window = input.required<StudyWindow>();
  protected readonly azimuth = signal(60);
  protected readonly elevation = signal(35);
  private readonly cssWidth = signal(0);
  private frameRequest = 0;
  protected readonly shownLines = signal('');

  private readonly frame = computed(() => {
    const study = this.compute.views()?.study;
    const width = this.cssWidth();
    if (!study || width <= 0) return null;
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
    const mid = (low + high) / 2;
    const span = heightCss * perPx;
    const y0 = span < high - low ? mid - span / 2 : low;
    return { x0, x1, y0, y1: y0 + span, widthCss: width, heightCss, cropped: span < high - low };
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
      const study = this.compute.views()?.study;
      const light = lightFrom(this.azimuth(), this.elevation());
      if (!frame || !study) return;
      untracked(() => this.schedule(() => this.paint(frame, study, light)));
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

  private schedule(work: () => void): void {
    cancelAnimationFrame(this.frameRequest);
    this.frameRequest = requestAnimationFrame(work);
  }

  private paint(frame: NonNullable<ReturnType<LitStudy['frame']>>, study: StudyData, light: Light): void {
    const canvas = this.canvas().nativeElement;
    const ratio = Math.min(2, canvas.ownerDocument.defaultView?.devicePixelRatio ?? 1);
    const px: LitFrame = { x0: frame.x0, x1: frame.x1, y0: frame.y0, y1: frame.y1, width: Math.round(frame.widthCss * ratio), height: Math.round(frame.heightCss * ratio) };
    canvas.width = px.width;
    canvas.height = px.height;
    canvas.style.height = `${frame.heightCss}px`;
    const pixels = renderLit({ lines: study.lines, depth: study.depth, vAngle: study.vAngle, frame: px, light, dark: DARK, bright: BRIGHT });
    canvas.getContext('2d')?.putImageData(new ImageData(pixels as Uint8ClampedArray<ArrayBuffer>, px.width, px.height), 0, 0);
    this.shownLines.set(frame.cropped ? 'the middle lines of the study' : 'every line of the study');
  }
}
