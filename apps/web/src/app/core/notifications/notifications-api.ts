import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { MarkReadBody, NotificationList, NotificationSettings } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The notifications' REST routes: the list, marking read, and the e-mail settings. */
@Injectable({ providedIn: 'root' })
export class NotificationsApi {
  private readonly http = inject(HttpClient);

  list(options: { limit?: number; before?: string } = {}): Promise<NotificationList> {
    const params: Record<string, string> = {};
    if (options.limit) params['limit'] = String(options.limit);
    if (options.before) params['before'] = options.before;
    return firstValueFrom(this.http.get<NotificationList>('/api/notifications', { params }));
  }

  markRead(body: MarkReadBody): Promise<{ unread: number }> {
    return firstValueFrom(this.http.post<{ unread: number }>('/api/notifications/read', body));
  }

  settings(): Promise<NotificationSettings> {
    return firstValueFrom(this.http.get<NotificationSettings>('/api/notifications/settings'));
  }

  saveSettings(settings: NotificationSettings): Promise<NotificationSettings> {
    return firstValueFrom(this.http.put<NotificationSettings>('/api/notifications/settings', settings));
  }
}
