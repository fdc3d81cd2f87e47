import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { CollabSession } from './collab-session';
import { STATUS_TEXT } from './connection-status';

/**
 * The link's status for screen readers: one live region, in the page from its first frame, whose words
 * change. The chip that shows the status moves (the header on a wide screen, the strip that stays in
 * sight on a phone) and a region inserted already reading "Live" is not announced; this one stays put.
 */
@Component({
  selector: 'bw-connection-announcer',
  template: `<span class="bw-visually-hidden" role="status" data-testid="connection-announcer">Connection: {{ text() }}</span>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConnectionAnnouncer {
  private readonly session = inject(CollabSession);
  protected readonly text = computed(() => STATUS_TEXT[this.session.status()]);
}
