import { HttpClient, type HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { PHOTO_FIELD, type Photo, type PhotoFields } from '@barwright/contracts';
import { firstValueFrom, type Observable } from 'rxjs';

/** Where photos hang: a published entry, or a design on a board. */
export type PhotoTarget = { entryId: string } | { designId: string };

const base = (t: PhotoTarget) => ('entryId' in t ? `/api/entries/${encodeURIComponent(t.entryId)}` : `/api/designs/${encodeURIComponent(t.designId)}`);

/** The shop log's routes: list, multipart upload with progress events, delete. */
@Injectable({ providedIn: 'root' })
export class ShopLogApi {
  private readonly http = inject(HttpClient);

  list(target: PhotoTarget): Promise<Photo[]> {
    return firstValueFrom(this.http.get<Photo[]>(`${base(target)}/photos`));
  }

  /** The upload as HttpClient events, progress included (the form is multipart: the image in `photo`). */
  upload(target: PhotoTarget, file: File, fields: PhotoFields): Observable<HttpEvent<Photo>> {
    const form = new FormData();
    for (const [key, value] of Object.entries(fields)) if (value !== undefined) form.append(key, String(value));
    form.append(PHOTO_FIELD, file, file.name);
    return this.http.post<Photo>(`${base(target)}/photos`, form, { reportProgress: true, observe: 'events' });
  }

  remove(photoId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/photos/${encodeURIComponent(photoId)}`));
  }
}
