import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { PublishBody, PublishResult } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** `POST /api/designs/:id/publish`: the design's current file becomes a new immutable revision of its entry. */
@Injectable({ providedIn: 'root' })
export class PublishApi {
  private readonly http = inject(HttpClient);

  publish(designId: string, body: PublishBody): Promise<PublishResult> {
    return firstValueFrom(this.http.post<PublishResult>(`/api/designs/${encodeURIComponent(designId)}/publish`, body));
  }
}
