import { HttpClient, HttpHeaders } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { BoardSummary, Design, MeasuredPreview } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The measured-rosette preview (the server parses the table) and what creating a design from it needs. */
@Injectable({ providedIn: 'root' })
export class RosettesApi {
  private readonly http = inject(HttpClient);

  /** `POST /api/rosettes/measured/preview` with the table as a text/csv body; bad rows come back as errors, not as a refusal. */
  preview(table: string): Promise<MeasuredPreview> {
    return firstValueFrom(
      this.http.post<MeasuredPreview>('/api/rosettes/measured/preview', table, { headers: new HttpHeaders({ 'Content-Type': 'text/csv' }) }),
    );
  }

  boards(): Promise<{ mine: BoardSummary[]; shared: BoardSummary[] }> {
    return firstValueFrom(this.http.get<{ mine: BoardSummary[]; shared: BoardSummary[] }>('/api/boards'));
  }

  /** `POST /api/boards/:id/designs` with a whole design file; a refused field comes back as `file.<path>`. */
  createDesign(boardId: string, title: string, file: Design): Promise<{ id: string }> {
    return firstValueFrom(this.http.post<{ id: string }>(`/api/boards/${encodeURIComponent(boardId)}/designs`, { title, file }));
  }
}
