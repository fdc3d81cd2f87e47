import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { DesignEntryLinkAnswer, PublishBody, PublishResult } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

const design = (id: string) => `/api/designs/${encodeURIComponent(id)}`;

/** Publishing a board design: the entry it was published as, and a new immutable revision of it. */
@Injectable({ providedIn: 'root' })
export class PublishApi {
  private readonly http = inject(HttpClient);

  /** `GET /api/designs/:id/entry`: the design's live entry, or null when it was never published. */
  entryOf(designId: string): Promise<DesignEntryLinkAnswer> {
    return firstValueFrom(this.http.get<DesignEntryLinkAnswer>(`${design(designId)}/entry`));
  }

  /** `POST /api/designs/:id/publish`: the design's current file becomes a new revision of its entry (made on first publish). */
  publish(designId: string, body: PublishBody): Promise<PublishResult> {
    return firstValueFrom(this.http.post<PublishResult>(`${design(designId)}/publish`, body));
  }
}
