import type { CdkVirtualScrollViewport, VirtualScrollStrategy } from '@angular/cdk/scrolling';
import { Subject } from 'rxjs';

/**
 * Virtual scrolling over rows of known, differing heights (a group's heading row is short, a row of
 * cards tall): the CDK's fixed-size strategy with a table of offsets instead of one size.
 */
export class RowHeightsStrategy implements VirtualScrollStrategy {
  private readonly index = new Subject<number>();
  readonly scrolledIndexChange = this.index.asObservable();
  private viewport: CdkVirtualScrollViewport | null = null;
  /** offsets[i] is the top of row i; offsets[n] the total height (px). */
  private offsets = new Float64Array(1);

  constructor(private readonly bufferPx = 600) {}

  /** The rows' heights (px), in order; called whenever the rows change. */
  setHeights(heights: readonly number[]): void {
    // Results stream in many times a second and mostly leave the rows as they were: then nothing is
    // laid out again (update() reads the scroll offset, which forces a layout).
    if (heights.length === this.offsets.length - 1 && heights.every((h, i) => this.offsets[i + 1] - this.offsets[i] === h)) return;
    const offsets = new Float64Array(heights.length + 1);
    for (let i = 0; i < heights.length; i++) offsets[i + 1] = offsets[i] + heights[i];
    this.offsets = offsets;
    this.update();
  }

  attach(viewport: CdkVirtualScrollViewport): void {
    this.viewport = viewport;
    this.update();
  }

  detach(): void {
    this.viewport = null;
  }

  onContentScrolled(): void {
    this.update();
  }

  onDataLengthChanged(): void {
    this.update();
  }

  onContentRendered(): void {}

  onRenderedOffsetChanged(): void {}

  scrollToIndex(index: number, behavior: ScrollBehavior): void {
    this.viewport?.scrollToOffset(this.offsets[Math.max(0, Math.min(index, this.offsets.length - 1))], behavior);
  }

  /** The last row whose top is at or above `px` (binary search). */
  private rowAt(px: number): number {
    let lo = 0;
    let hi = this.offsets.length - 2;
    if (hi < 0) return 0;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.offsets[mid] <= px) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  private update(): void {
    const viewport = this.viewport;
    if (!viewport) return;
    const rows = Math.min(viewport.getDataLength(), this.offsets.length - 1);
    viewport.setTotalContentSize(this.offsets[rows]);
    if (rows === 0) {
      viewport.setRenderedRange({ start: 0, end: 0 });
      return;
    }
    const top = viewport.measureScrollOffset();
    const first = this.rowAt(top);
    const start = this.rowAt(Math.max(0, top - this.bufferPx));
    const end = Math.min(rows, this.rowAt(top + viewport.getViewportSize() + this.bufferPx) + 1);
    viewport.setRenderedRange({ start, end });
    viewport.setRenderedContentOffset(this.offsets[start]);
    this.index.next(first);
  }
}
