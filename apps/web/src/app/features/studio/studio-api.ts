import { HttpClient, HttpResponse } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { DesignMeta, DesignSummary, DesignVersion } from '@barwright/contracts';
import type { ExportFormat } from '@barwright/engine';
import { firstValueFrom } from 'rxjs';

/** A saved version as the compare view reads it: the design file as stored (not yet validated) and the notes. */
export interface VersionContent {
  design: unknown;
  notes: string;
}

/** The studio's REST routes: what the editor needs besides the live document. */
@Injectable({ providedIn: 'root' })
export class StudioApi {
  private readonly http = inject(HttpClient);

  meta(designId: string): Promise<DesignMeta> {
    return firstValueFrom(this.http.get<DesignMeta>(`${base(designId)}/meta`));
  }

  rename(designId: string, title: string): Promise<DesignSummary> {
    return firstValueFrom(this.http.patch<DesignSummary>(base(designId), { title }));
  }

  versions(designId: string): Promise<DesignVersion[]> {
    return firstValueFrom(this.http.get<DesignVersion[]>(`${base(designId)}/versions`));
  }

  saveVersion(designId: string, name: string): Promise<DesignVersion> {
    return firstValueFrom(this.http.post<DesignVersion>(`${base(designId)}/versions`, { name }));
  }

  version(designId: string, versionId: string): Promise<VersionContent> {
    return firstValueFrom(this.http.get<VersionContent>(`${base(designId)}/versions/${encodeURIComponent(versionId)}`));
  }

  /** Writes the version's values over today's as a new edit; it arrives in the editor through the live document. */
  async restoreVersion(designId: string, versionId: string): Promise<void> {
    await firstValueFrom(this.http.post(`${base(designId)}/versions/${encodeURIComponent(versionId)}/restore`, {}));
  }

  /** The export as a file: its bytes and the name the server gives it. */
  async export(designId: string, format: ExportFormat): Promise<{ blob: Blob; filename: string }> {
    const response: HttpResponse<Blob> = await firstValueFrom(
      this.http.get(`${base(designId)}/export`, { params: { format }, responseType: 'blob', observe: 'response' }),
    );
    const disposition = response.headers.get('Content-Disposition') ?? '';
    const filename = /filename="?([^";]+)"?/i.exec(disposition)?.[1] ?? `bar.${format}`;
    return { blob: response.body ?? new Blob(), filename };
  }
}

function base(designId: string): string {
  return `/api/designs/${encodeURIComponent(designId)}`;
}
