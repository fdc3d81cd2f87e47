import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { BoardSummary, DesignsBatchBody, SavedSweep, SweepBody, SweepSummary } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The member's saved sweeps (/api/rack/sweeps), the boards they may add to, and the shortlist sent to a board in one request. */
@Injectable({ providedIn: 'root' })
export class SweepApi {
  private readonly http = inject(HttpClient);

  list(): Promise<SweepSummary[]> {
    return firstValueFrom(this.http.get<SweepSummary[]>('/api/rack/sweeps'));
  }

  read(id: string): Promise<SavedSweep> {
    return firstValueFrom(this.http.get<SavedSweep>(`/api/rack/sweeps/${encodeURIComponent(id)}`));
  }

  /** Saves a new sweep (no id) or replaces a saved one. */
  save(id: string | null, body: SweepBody): Promise<SavedSweep> {
    return firstValueFrom(
      id ? this.http.put<SavedSweep>(`/api/rack/sweeps/${encodeURIComponent(id)}`, body) : this.http.post<SavedSweep>('/api/rack/sweeps', body),
    );
  }

  remove(id: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/rack/sweeps/${encodeURIComponent(id)}`));
  }

  boards(): Promise<{ mine: BoardSummary[]; shared: BoardSummary[] }> {
    return firstValueFrom(this.http.get<{ mine: BoardSummary[]; shared: BoardSummary[] }>('/api/boards'));
  }

  /** All or nothing: every design is made, or none and the refused fields come back as `designs.<i>.…`. */
  sendToBoard(boardId: string, body: DesignsBatchBody): Promise<{ ids: string[] }> {
    return firstValueFrom(this.http.post<{ ids: string[] }>(`/api/boards/${encodeURIComponent(boardId)}/designs/batch`, body));
  }
}
