import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { BoardDetail, BoardInvitation, BoardSummary, DesignPreset, DesignSummary } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The boards' REST routes: boards, members, invitations, and the designs listed on a board. */
@Injectable({ providedIn: 'root' })
export class BoardsApi {
  private readonly http = inject(HttpClient);

  list(): Promise<{ mine: BoardSummary[]; shared: BoardSummary[] }> {
    return firstValueFrom(this.http.get<{ mine: BoardSummary[]; shared: BoardSummary[] }>('/api/boards'));
  }

  create(name: string): Promise<BoardDetail> {
    return firstValueFrom(this.http.post<BoardDetail>('/api/boards', { name }));
  }

  get(id: string): Promise<BoardDetail> {
    return firstValueFrom(this.http.get<BoardDetail>(`/api/boards/${encodeURIComponent(id)}`));
  }

  update(id: string, patch: { name?: string; archived?: boolean }): Promise<BoardDetail> {
    return firstValueFrom(this.http.patch<BoardDetail>(`/api/boards/${encodeURIComponent(id)}`, patch));
  }

  invite(boardId: string, email: string, role: 'editor' | 'viewer'): Promise<BoardInvitation> {
    return firstValueFrom(this.http.post<BoardInvitation>(`/api/boards/${encodeURIComponent(boardId)}/invitations`, { email, role }));
  }

  revokeInvitation(boardId: string, invitationId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/boards/${encodeURIComponent(boardId)}/invitations/${encodeURIComponent(invitationId)}`));
  }

  /** Accepts the invitation in a mailed link for the signed-in account. */
  acceptInvitation(token: string): Promise<{ boardId: string }> {
    return firstValueFrom(this.http.post<{ boardId: string }>('/api/invitations/accept', { token }));
  }

  setMemberRole(boardId: string, userId: string, role: 'editor' | 'viewer'): Promise<BoardDetail> {
    return firstValueFrom(this.http.patch<BoardDetail>(`/api/boards/${encodeURIComponent(boardId)}/members/${encodeURIComponent(userId)}`, { role }));
  }

  /** The owner removes a member; a member removing themselves leaves the board. */
  removeMember(boardId: string, userId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/boards/${encodeURIComponent(boardId)}/members/${encodeURIComponent(userId)}`));
  }

  createDesign(boardId: string, title: string, preset: DesignPreset): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>(`/api/boards/${encodeURIComponent(boardId)}/designs`, { title, preset }));
  }

  duplicateDesign(designId: string): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>(`/api/designs/${encodeURIComponent(designId)}/duplicate`, {}));
  }

  renameDesign(designId: string, title: string): Promise<DesignSummary> {
    return firstValueFrom(this.http.patch<DesignSummary>(`/api/designs/${encodeURIComponent(designId)}`, { title }));
  }

  /** Moves the design to the bin for 30 days (owner). */
  deleteDesign(designId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/designs/${encodeURIComponent(designId)}`));
  }

  restoreDesign(designId: string): Promise<DesignSummary> {
    return firstValueFrom(this.http.post<DesignSummary>(`/api/designs/${encodeURIComponent(designId)}/restore`, {}));
  }
}
