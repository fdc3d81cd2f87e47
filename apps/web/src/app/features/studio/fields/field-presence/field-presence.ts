import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input } from '@angular/core';
import { CollabSession } from '../../collab/collab-session';

/**
 * Wraps one field of the editor: tells the others when you are editing it, and shows who else is,
 * with a ring in their colour and their name.
 */
@Component({
  selector: 'bw-field-presence',
  template: `
    <ng-content />
    @if (editors().length > 0) {
      <span class="who" data-testid="field-presence">
        @for (peer of editors(); track peer.clientId) {
          <span class="name" [style.background]="peer.user.colour">{{ peer.user.name }}</span>
        }
        <span class="bw-visually-hidden"> {{ editors().length === 1 ? 'is' : 'are' }} editing this field</span>
      </span>
    }
  `,
  styles: `
    :host {
      position: relative;
      display: block;
      border-radius: var(--mat-sys-corner-small);
    }
    :host(.edited) {
      box-shadow: 0 0 0 2px var(--bw-presence);
    }
    .who {
      position: absolute;
      top: -0.7rem;
      right: 0.5rem;
      z-index: 1;
      display: flex;
      gap: 0.25rem;
      pointer-events: none;
    }
    .name {
      padding: 0 0.375rem;
      border-radius: var(--mat-sys-corner-extra-small);
      color: #fff;
      font: var(--mat-sys-label-small);
      line-height: 1.1rem;
      white-space: nowrap;
    }
  `,
  host: {
    '[class.edited]': 'editors().length > 0',
    '[style.--bw-presence]': 'editors()[0]?.user?.colour ?? null',
    '[attr.data-field]': 'field()',
    '(focusin)': 'session.focusField(field())',
    '(focusout)': 'leave($event)',
  },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FieldPresence {
  protected readonly session = inject(CollabSession);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** Dotted path of the field, as in the design file: `rosette.layers[0].lobes`. */
  readonly field = input.required<string>();
  protected readonly editors = computed(() => this.session.peers().filter((p) => p.field === this.field()));

  protected leave(event: FocusEvent): void {
    const next = event.relatedTarget as Node | null;
    if (!next || !this.host.nativeElement.contains(next)) this.session.focusField(null);
  }
}
