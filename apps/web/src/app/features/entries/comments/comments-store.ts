import { inject, Injectable, signal } from '@angular/core';
import type { CommentThread } from '@barwright/contracts';
import { EntriesApi } from '../entries-api';

/** One entry's comment thread; every change asks the server, then reloads the thread (so counts and order are its). */
@Injectable()
export class CommentsStore {
  private readonly api = inject(EntriesApi);
  private readonly current = signal<CommentThread | null>(null);
  private entryId = '';

  readonly thread = this.current.asReadonly();

  async load(entryId: string): Promise<void> {
    this.entryId = entryId;
    this.current.set(await this.api.comments(entryId));
  }

  async add(body: string, parentId?: string): Promise<void> {
    await this.api.addComment(this.entryId, body, parentId);
    await this.load(this.entryId);
  }

  async edit(commentId: string, body: string): Promise<void> {
    await this.api.editComment(commentId, body);
    await this.load(this.entryId);
  }

  async remove(commentId: string): Promise<void> {
    await this.api.deleteComment(commentId);
    await this.load(this.entryId);
  }
}
