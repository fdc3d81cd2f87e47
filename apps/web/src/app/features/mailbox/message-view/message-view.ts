import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatTabsModule } from '@angular/material/tabs';
import { DomSanitizer, SafeHtml } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import type { MailboxMessage } from '@barwright/contracts';
import { messageLinks } from '../message-links';
import { framedMailHtml } from './framed-mail-html';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** One message: its header, the HTML part in a sandboxed frame, the text part, and its links as buttons. */
@Component({
  selector: 'bw-message-view',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatIconModule, MatTabsModule],
  templateUrl: './message-view.html',
  styleUrl: './message-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MessageView {
  private readonly sanitizer = inject(DomSanitizer);
  private readonly origin = inject(DOCUMENT).location.origin;

  readonly message = input.required<MailboxMessage>();
  /** Narrow screens show one pane at a time, so the view offers a way back to the list. */
  readonly compact = input(false);
  readonly back = output<void>();

  protected readonly links = computed(() => messageLinks(this.message().text, this.origin));
  /**
   * Angular's sanitizer would strip the mail's own styling; the frame's sandbox (no scripts, no same-origin,
   * top navigation only on a click) is what keeps the mail's HTML harmless, so it is passed through as is.
   */
  protected readonly frameHtml = computed<SafeHtml>(() => this.sanitizer.bypassSecurityTrustHtml(framedMailHtml(this.message().html)));
}
