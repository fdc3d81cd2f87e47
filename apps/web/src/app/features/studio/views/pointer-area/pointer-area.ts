import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input } from '@angular/core';
import { CollabSession } from '../../collab/collab-session';

/**
 * A view others can point at: your pointer over it is shared (as fractions of its size, so it lands on
 * the same spot of the drawing at any screen width), and theirs are drawn over it with their names.
 */
@Component({
  selector: 'bw-pointer-area',
  template: `
    <ng-content />
    @for (peer of pointing(); track peer.clientId) {
      <span class="pointer" [style.left.%]="peer.pointer!.x * 100" [style.top.%]="peer.pointer!.y * 100" [style.color]="peer.user.colour"
            data-testid="remote-pointer" aria-hidden="true">
        <svg viewBox="0 0 16 16" width="16" height="16"><path d="M1 1 L1 13 L4.5 9.5 L7 15 L9 14 L6.5 8.5 L11.5 8.5 Z" /></svg>
        <span class="label" [style.background]="peer.user.colour">{{ peer.user.name }}</span>
      </span>
    }
  `,
  styles: `
    :host {
      position: relative;
      display: block;
    }
    .pointer {
      position: absolute;
      z-index: 2;
      pointer-events: none;
      transition: left 60ms linear, top 60ms linear;

      svg {
        display: block;
        fill: currentColor;
        stroke: #fff;
        stroke-width: 1;
      }
    }
    .label {
      position: absolute;
      left: 0.875rem;
      top: 0.875rem;
      padding: 0 0.375rem;
      border-radius: var(--mat-sys-corner-extra-small);
      color: #fff;
      font: var(--mat-sys-label-small);
      line-height: 1.1rem;
      white-space: nowrap;
    }
  `,
  host: {
    '(pointermove)': 'move($event)',
    '(pointerleave)': 'session.movePointer(null)',
  },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PointerArea {
  protected readonly session = inject(CollabSession);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** Which view this is (`profile`, `flat`, `lit`): pointers are shared per view. */
  readonly view = input.required<string>();
  protected readonly pointing = computed(() => this.session.peers().filter((p) => p.pointer?.view === this.view()));

  protected move(event: PointerEvent): void {
    const box = this.host.nativeElement.getBoundingClientRect();
    if (box.width <= 0 || box.height <= 0) return;
    const x = Math.min(1, Math.max(0, (event.clientX - box.left) / box.width));
    const y = Math.min(1, Math.max(0, (event.clientY - box.top) / box.height));
    this.session.movePointer({ view: this.view(), x: Math.round(x * 1000) / 1000, y: Math.round(y * 1000) / 1000 });
  }
}
