import { inject, Injectable, signal } from '@angular/core';
import type { AdminUpdateUserBody, AdminUser } from '@barwright/contracts';
import { AdminUsersApi } from '../admin-users-api';

/** The accounts on the People page, as the server last answered them. */
@Injectable()
export class PeopleStore {
  private readonly api = inject(AdminUsersApi);
  private readonly list = signal<readonly AdminUser[]>([]);
  private readonly fetchedOnce = signal(false);
  private readonly saving = signal<ReadonlySet<string>>(new Set());

  readonly users = this.list.asReadonly();
  readonly loaded = this.fetchedOnce.asReadonly();
  /** Ids of accounts with a change on its way to the server. */
  readonly pending = this.saving.asReadonly();

  async load(): Promise<void> {
    this.list.set(await this.api.list());
    this.fetchedOnce.set(true);
  }

  async update(id: string, patch: AdminUpdateUserBody): Promise<AdminUser> {
    this.saving.update((s) => new Set(s).add(id));
    try {
      const updated = await this.api.update(id, patch);
      this.list.update((users) => users.map((u) => (u.id === id ? updated : u)));
      return updated;
    } finally {
      this.saving.update((s) => {
        const next = new Set(s);
        next.delete(id);
        return next;
      });
    }
  }
}
