import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type {
  AuditPage,
  CuratedItem,
  EntryCard,
  ExplorePage,
  ModerationCase,
  ModerationQueue,
  NewReportBody,
  PersonRef,
  Report,
  ReportTarget,
  ReportTargetKind,
  ShowcaseOrderBody,
} from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The desk's decisions on an item, by the path segment of their route. */
export type Decision = 'dismiss' | 'hide' | 'restore' | 'suspend-author';

const item = (t: Pick<ReportTarget, 'kind' | 'id'>) => `/api/moderation/items/${t.kind}/${encodeURIComponent(t.id)}`;

/** The moderation routes: the report members file, and the desk's queue, decisions, showcase curation and audit log. */
@Injectable({ providedIn: 'root' })
export class ModerationApi {
  private readonly http = inject(HttpClient);

  report(body: NewReportBody): Promise<Report> {
    return firstValueFrom(this.http.post<Report>('/api/reports', body));
  }

  queue(): Promise<ModerationQueue> {
    return firstValueFrom(this.http.get<ModerationQueue>('/api/moderation/queue'));
  }

  hidden(): Promise<ModerationCase[]> {
    return firstValueFrom(this.http.get<ModerationCase[]>('/api/moderation/hidden'));
  }

  case(kind: ReportTargetKind, id: string): Promise<ModerationCase> {
    return firstValueFrom(this.http.get<ModerationCase>(item({ kind, id })));
  }

  /** `hide` and `suspend-author` need a reason; `dismiss` and `restore` take an optional note. */
  decide(target: ReportTarget, decision: Decision, words: string): Promise<ModerationCase> {
    const body = decision === 'hide' || decision === 'suspend-author' ? { reason: words } : { note: words };
    return firstValueFrom(this.http.post<ModerationCase>(`${item(target)}/${decision}`, body));
  }

  /** Published bars matching a search (newest first without one), to choose one to feature. */
  async findEntries(q: string): Promise<EntryCard[]> {
    const params: Record<string, string> = { pageSize: '8', ...(q.trim() ? { q: q.trim() } : { sort: 'top' }) };
    return (await firstValueFrom(this.http.get<ExplorePage>('/api/entries', { params }))).items;
  }

  curated(): Promise<CuratedItem[]> {
    return firstValueFrom(this.http.get<CuratedItem[]>('/api/moderation/showcase'));
  }

  feature(entryId: string, note: string): Promise<CuratedItem> {
    return firstValueFrom(this.http.post<CuratedItem>('/api/moderation/showcase', { entryId, note }));
  }

  editNote(entryId: string, note: string): Promise<CuratedItem> {
    return firstValueFrom(this.http.patch<CuratedItem>(`/api/moderation/showcase/${encodeURIComponent(entryId)}`, { note }));
  }

  unfeature(entryId: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/moderation/showcase/${encodeURIComponent(entryId)}`));
  }

  /** `moved`: the entry the curator moved, so the audit log names it. */
  reorder(entryIds: string[], moved?: string): Promise<CuratedItem[]> {
    return firstValueFrom(this.http.put<CuratedItem[]>('/api/moderation/showcase/order', { entryIds, ...(moved ? { moved } : {}) } satisfies ShowcaseOrderBody));
  }

  audit(params: Record<string, string>): Promise<AuditPage> {
    return firstValueFrom(this.http.get<AuditPage>('/api/moderation/audit', { params }));
  }

  auditActors(): Promise<PersonRef[]> {
    return firstValueFrom(this.http.get<PersonRef[]>('/api/moderation/audit/actors'));
  }
}
