import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatTooltipModule } from '@angular/material/tooltip';
import { CollabSession } from '../collab/collab-session';
import { fieldLabel } from '../fields/field-catalogue';
import { initials, peoplePresent } from '../collab/presence';

/** Who is here: you first, then the others, each in their colour, with the field they are editing. */
@Component({
  selector: 'bw-presence-bar',
  imports: [MatTooltipModule],
  template: `
    <ul class="avatars" aria-label="People in this design" data-testid="presence">
      @if (session.self(); as me) {
        <li class="avatar self" [style.--bw-person]="me.colour" [matTooltip]="me.name + ' (you)'" data-testid="presence-self">
          <span aria-hidden="true">{{ initials(me.name) }}</span><span class="bw-visually-hidden">{{ me.name }} (you)</span>
        </li>
      }
      @for (peer of people(); track peer.user.id) {
        <li class="avatar" [style.--bw-person]="peer.user.colour" [matTooltip]="describe(peer.user.name, peer.field)" data-testid="presence-peer"
            [attr.data-name]="peer.user.name">
          <span aria-hidden="true">{{ initials(peer.user.name) }}</span>
          <span class="bw-visually-hidden">{{ describe(peer.user.name, peer.field) }}</span>
        </li>
      }
    </ul>
    <span class="count bw-muted" data-testid="presence-count">{{ people().length === 0 ? 'Only you here' : people().length + 1 + ' here' }}</span>
  `,
  styles: `
    :host {
      display: flex;
      align-items: center;
      gap: 0.5rem;
    }
    .avatars {
      display: flex;
      margin: 0;
      padding: 0;
      list-style: none;
    }
    .avatar {
      display: grid;
      place-items: center;
      width: 2rem;
      height: 2rem;
      margin-left: -0.375rem;
      border: 2px solid var(--mat-sys-surface);
      border-radius: 50%;
      background: var(--bw-person);
      color: #fff;
      font: var(--mat-sys-label-medium);
      font-weight: 500;
      cursor: default;

      &:first-child {
        margin-left: 0;
      }
      &.self {
        box-shadow: 0 0 0 2px var(--bw-person);
      }
    }
    .count {
      font: var(--mat-sys-label-medium);
      white-space: nowrap;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PresenceBar {
  protected readonly session = inject(CollabSession);
  protected readonly people = computed(() => peoplePresent(this.session.peers()));
  protected readonly initials = initials;

  protected describe(name: string, field: string | null): string {
    return field ? `${name}, editing ${fieldLabel(field)}` : name;
  }
}
