import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, signal, untracked } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { RouterLink } from '@angular/router';
import type { CommentNode } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { countText } from '../../../shared/entry-facts/entry-facts';
import { CommentForm } from './comment-form';
import { CommentItem } from './comment-item';
import { CommentsStore } from './comments-store';

/** The comments on an entry: threads one level deep, newest thread last, with the forms to add and answer. */
@Component({
  selector: 'bw-comment-thread',
  imports: [RouterLink, CommentForm, CommentItem],
  providers: [CommentsStore],
  templateUrl: './comment-thread.html',
  styleUrl: './comment-thread.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CommentThread {
  protected readonly store = inject(CommentsStore);
  protected readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  readonly entryId = input.required<string>();
  /** Hidden entries take no new comments. */
  readonly open = input(true);
  readonly returnUrl = input('/');
  protected readonly replyingTo = signal<string | null>(null);
  /** Ticks each minute so the edit windows close on screen as they close on the server. */
  protected readonly now = signal(new Date());
  protected readonly countText = countText;

  protected readonly post = (body: string) => this.store.add(body);
  protected readonly answer = async (body: string) => {
    const parent = this.replyingTo();
    if (!parent) return;
    await this.store.add(body, parent);
    this.replyingTo.set(null);
  };

  constructor() {
    effect(() => {
      const id = this.entryId();
      untracked(() => void this.store.load(id));
    });
    const timer = setInterval(() => this.now.set(new Date()), 30_000);
    inject(DestroyRef).onDestroy(() => clearInterval(timer));
  }

  protected async remove(node: CommentNode): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: 'Delete your comment?',
      message: 'Its place in the thread stays, marked as deleted, so the replies still make sense.',
      confirmLabel: 'Delete comment',
      danger: true,
    });
    if (!confirmed) return;
    await this.store.remove(node.id);
    void this.notifier.tell('Your comment is deleted.', undefined, 3000);
  }
}
