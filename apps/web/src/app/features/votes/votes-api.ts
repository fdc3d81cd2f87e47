import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { CreateVoteBody, Design, Vote, VoteAnswerBody, VotePair, VoteSummary } from '@barwright/contracts';
import { firstValueFrom, map } from 'rxjs';

/** "Which would you cut?": votes over a board's designs, answered in pairs. */
@Injectable({ providedIn: 'root' })
export class VotesApi {
  private readonly http = inject(HttpClient);

  list(boardId: string): Promise<VoteSummary[]> {
    return firstValueFrom(this.http.get<VoteSummary[]>(`/api/boards/${encodeURIComponent(boardId)}/votes`));
  }

  open(boardId: string, body: CreateVoteBody): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>(`/api/boards/${encodeURIComponent(boardId)}/votes`, body));
  }

  read(id: string): Promise<Vote> {
    return firstValueFrom(this.http.get<Vote>(`/api/votes/${encodeURIComponent(id)}`));
  }

  /** The next pair to answer, or null (204) when the member has answered every pair. */
  nextPair(id: string): Promise<VotePair | null> {
    return firstValueFrom(
      this.http.get<VotePair>(`/api/votes/${encodeURIComponent(id)}/next-pair`, { observe: 'response' }).pipe(map((r) => (r.status === 204 ? null : r.body))),
    );
  }

  answer(id: string, body: VoteAnswerBody): Promise<Vote> {
    return firstValueFrom(this.http.put<Vote>(`/api/votes/${encodeURIComponent(id)}/answers`, body));
  }

  close(id: string): Promise<Vote> {
    return firstValueFrom(this.http.post<Vote>(`/api/votes/${encodeURIComponent(id)}/close`, {}));
  }

  design(id: string): Promise<Design> {
    return firstValueFrom(this.http.get<Design>(`/api/designs/${encodeURIComponent(id)}`));
  }
}
