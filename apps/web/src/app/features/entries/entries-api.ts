import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type {
  BoardDetail,
  BoardSummary,
  CommentNode,
  CommentThread,
  EntryCard,
  EntryChanges,
  EntryDetail,
  EntryRevision,
  Lineage,
  RatingAnswer,
  RemixResult,
} from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

const entry = (id: string) => `/api/entries/${encodeURIComponent(id)}`;

/** The design page's REST routes: the entry, its revisions, rating, comments, remix and lineage. */
@Injectable({ providedIn: 'root' })
export class EntriesApi {
  private readonly http = inject(HttpClient);

  detail(id: string): Promise<EntryDetail> {
    return firstValueFrom(this.http.get<EntryDetail>(entry(id)));
  }

  /** Removes the entry for everyone (its author only). */
  deleteEntry(id: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(entry(id)));
  }

  revision(id: string, n: number): Promise<EntryRevision> {
    return firstValueFrom(this.http.get<EntryRevision>(`${entry(id)}/revisions/${n}`));
  }

  rate(id: string, stars: number): Promise<RatingAnswer> {
    return firstValueFrom(this.http.put<RatingAnswer>(`${entry(id)}/rating`, { stars }));
  }

  unrate(id: string): Promise<RatingAnswer> {
    return firstValueFrom(this.http.delete<RatingAnswer>(`${entry(id)}/rating`));
  }

  comments(id: string): Promise<CommentThread> {
    return firstValueFrom(this.http.get<CommentThread>(`${entry(id)}/comments`));
  }

  addComment(id: string, body: string, parentId?: string): Promise<CommentNode> {
    return firstValueFrom(this.http.post<CommentNode>(`${entry(id)}/comments`, parentId ? { body, parentId } : { body }));
  }

  editComment(commentId: string, body: string): Promise<CommentNode> {
    return firstValueFrom(this.http.patch<CommentNode>(`/api/comments/${encodeURIComponent(commentId)}`, { body }));
  }

  deleteComment(commentId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/comments/${encodeURIComponent(commentId)}`));
  }

  remix(id: string, boardId: string): Promise<RemixResult> {
    return firstValueFrom(this.http.post<RemixResult>(`${entry(id)}/remix`, { boardId }));
  }

  /** The member's boards (to remix onto one they may edit). */
  boards(): Promise<{ mine: BoardSummary[]; shared: BoardSummary[] }> {
    return firstValueFrom(this.http.get<{ mine: BoardSummary[]; shared: BoardSummary[] }>('/api/boards'));
  }

  createBoard(name: string): Promise<BoardDetail> {
    return firstValueFrom(this.http.post<BoardDetail>('/api/boards', { name }));
  }

  lineage(id: string): Promise<Lineage> {
    return firstValueFrom(this.http.get<Lineage>(`${entry(id)}/lineage`));
  }

  remixes(id: string): Promise<EntryCard[]> {
    return firstValueFrom(this.http.get<EntryCard[]>(`${entry(id)}/remixes`));
  }

  changes(id: string): Promise<EntryChanges> {
    return firstValueFrom(this.http.get<EntryChanges>(`${entry(id)}/changes`));
  }

  /** Where a download of the latest (or a given) revision comes from; the server names the file. */
  exportUrl(id: string, format: string, revision?: number): string {
    return `${entry(id)}/export?format=${encodeURIComponent(format)}${revision === undefined ? '' : `&revision=${revision}`}`;
  }
}
