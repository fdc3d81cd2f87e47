import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { SweepRunner } from './sweep-runner';
import type { SweepItem, SweepLight, SweepStudy } from './sweep-types';
import { arrayTop, thumbPixels, thumbWindow, THUMB_MM } from './thumb-frame';

/** The light a thumbnail is drawn under unless the page sets one: the studio's lit plate's default. */
const DEFAULT_LIGHT: Required<SweepLight> = { azimuth: 60, elevation: 35, tint: 'silver' };

/**
 * A candidate's small lit study: its engraved line laid as the line study (with the phase schedule),
 * over a window THUMB_MM.width (16 mm) across for every candidate, as high as its box (10 mm in
 * its own shape), so the grid is at one true scale; shaded as
 * metal like the studio's lit plate. Drawn by the sweep's pool workers (SweepRunner, provided by the
 * page) as an ImageBitmap that the page's thread only hands to a 'bitmaprenderer' canvas. A thumbnail
 * exists only while the grid shows it (virtual scroll); one removed before its picture comes drops
 * its request, and a picture arriving after that is closed unseen.
 */
@Component({
  selector: 'bw-sweep-thumb',
  template: `<canvas
    #canvas
    data-testid="sweep-thumb"
    [attr.data-drawn]="drawn() ? 'true' : null"
    role="img"
    [attr.aria-label]="label()"
  ></canvas>`,
  styles: `
    :host {
      display: block;
      aspect-ratio: ${THUMB_MM.width} / ${THUMB_MM.height};
    }
    canvas {
      display: block;
      width: 100%;
      height: 100%;
      border-radius: 4px;
      background: var(--mat-sys-surface-container-high, #d8d8d8);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepThumb {
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');
  private readonly runner = inject(SweepRunner);
  readonly item = input.required<SweepItem>();
  /** The line-study settings, mm and degrees. */
  readonly study = input.required<SweepStudy>();
  readonly light = input<SweepLight | null>(null);

  protected readonly drawn = signal(false);
  /** The canvas's box (CSS px): THUMB_MM's shape unless the page sizes the thumbnail. */
  private readonly box = signal({ width: 0, height: 0 });
  protected readonly label = computed(() => {
    const { width, height } = this.box();
    const high = width > 0 ? (THUMB_MM.width * height) / width : THUMB_MM.height;
    return `Lit line study, ${THUMB_MM.width} × ${+high.toFixed(1)} mm at true scale`;
  });
  private drop: (() => void) | null = null;
  private destroyed = false;

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      // The width from a ResizeObserver: reading it off the element would force a layout per thumbnail while scrolling.
      const observer = new ResizeObserver(([entry]) => {
        const [width, height] = [Math.floor(entry.contentRect.width), Math.floor(entry.contentRect.height)];
        if (width !== this.box().width || height !== this.box().height) this.box.set({ width, height });
      });
      observer.observe(this.canvas().nativeElement);
      destroyRef.onDestroy(() => observer.disconnect());
    });
    destroyRef.onDestroy(() => {
      this.destroyed = true;
      this.drop?.();
      this.drop = null;
    });
    effect(() => {
      const item = this.item();
      const study = this.study();
      const light = { ...DEFAULT_LIGHT, ...(this.light() ?? {}) };
      const { width, height } = this.box();
      if (!item.ok || width <= 0 || height <= 0) return;
      untracked(() => {
        this.drop?.();
        const { widthPx, heightPx, heightMm } = thumbPixels(width, height, globalThis.devicePixelRatio);
        this.drop = this.runner.paintThumb(
          {
            line: item.line,
            step: item.step,
            study,
            window: thumbWindow(study, arrayTop(item.line), heightMm),
            widthPx,
            heightPx,
            light: { azimuthDeg: light.azimuth, elevationDeg: light.elevation },
            tint: light.tint,
          },
          (bitmap) => this.show(bitmap),
        );
      });
    });
  }

  private show(bitmap: ImageBitmap | null): void {
    this.drop = null;
    if (!bitmap) return;
    if (this.destroyed) {
      bitmap.close();
      return;
    }
    const canvas = this.canvas().nativeElement;
    if (canvas.width !== bitmap.width || canvas.height !== bitmap.height) [canvas.width, canvas.height] = [bitmap.width, bitmap.height];
    const context = canvas.getContext('bitmaprenderer');
    if (!context) {
      bitmap.close();
      return;
    }
    context.transferFromImageBitmap(bitmap);
    this.drawn.set(true);
  }
}
