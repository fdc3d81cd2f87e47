import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { AdminUpdateUserBody, AdminUser } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The admin's view of accounts; the server refuses these calls to anyone but an admin. */
@Injectable({ providedIn: 'root' })
export class AdminUsersApi {
  private readonly http = inject(HttpClient);

  list(): Promise<AdminUser[]> {
    return firstValueFrom(this.http.get<AdminUser[]>('/api/admin/users'));
  }

  update(id: string, patch: AdminUpdateUserBody): Promise<AdminUser> {
    return firstValueFrom(this.http.patch<AdminUser>(`/api/admin/users/${encodeURIComponent(id)}`, patch));
  }
}
