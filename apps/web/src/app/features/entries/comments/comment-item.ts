import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { renderCommentHtml, type CommentNode } from '@barwright/contracts';
import { canDelete, canEdit, editWindowText } from './comment-rules';
import { CommentForm } from './comment-form';
import { CommentsStore } from './comments-store';
import { ReportButton } from '../../moderation/report-dialog/report-button';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** One comment: its author and time, its text (escaped, links made safe by the contracts' renderer), and its actions. */
@Component({
  selector: 'bw-comment-item',
  imports: [DateTextPipe, MatButtonModule, MatIconModule, CommentForm, ReportButton],
  templateUrl: './comment-item.html',
  styleUrl: './comment-item.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CommentItem {
  private readonly store = inject(CommentsStore);
  readonly node = input.required<CommentNode>();
  readonly myId = input<string | null>(null);
  /** Replies can be answered only at the top level (threads are one level deep). */
  readonly canReply = input(false);
  /** The time the edit window is judged against; the thread ticks it each minute. */
  readonly now = input.required<Date>();
  readonly reply = output<void>();
  readonly remove = output<void>();

  protected readonly editing = signal(false);
  /** The only HTML a comment becomes: every character escaped, http(s) links with a safe rel. */
  protected readonly html = computed(() => renderCommentHtml(this.node().body ?? ''));
  protected readonly editable = computed(() => canEdit(this.node(), this.myId(), this.now()));
  protected readonly deletable = computed(() => canDelete(this.node(), this.myId()));
  protected readonly windowText = computed(() => (this.editable() ? editWindowText(this.node(), this.now()) : ''));
  protected readonly saveEdit = async (body: string) => {
    await this.store.edit(this.node().id, body);
    this.editing.set(false);
  };
}
