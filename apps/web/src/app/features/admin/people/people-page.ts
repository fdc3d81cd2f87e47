import { BreakpointObserver } from '@angular/cdk/layout';
import { DatePipe, NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectChange, MatSelectModule } from '@angular/material/select';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { type AdminUser, type Role, ROLES } from '@barwright/contracts';
import { map } from 'rxjs';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { PeopleStore } from './people-store';
import { filterPeople, pageOfPeople, PeopleSort, sortPeople } from './people-view';

const WIDE_COLUMNS = ['person', 'role', 'status', 'emailVerified', 'createdAt', 'lastSignInAt', 'actions'];
const NARROW_COLUMNS = ['person'];

@Component({
  selector: 'bw-people-page',
  imports: [
    DatePipe, NgTemplateOutlet, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatPaginatorModule,
    MatProgressBarModule, MatSelectModule, MatSortModule, MatTableModule,
  ],
  providers: [PeopleStore],
  templateUrl: './people-page.html',
  styleUrl: './people-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PeoplePage {
  protected readonly store = inject(PeopleStore);
  private readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  protected readonly roles = ROLES;
  protected readonly roleLabel: Record<Role, string> = { member: 'Member', moderator: 'Moderator', admin: 'Admin' };
  protected readonly filter = signal('');
  protected readonly sort = signal<PeopleSort>({ active: 'person', direction: 'asc' });
  protected readonly pageIndex = signal(0);
  protected readonly pageSize = signal(25);

  protected readonly compact = toSignal(
    inject(BreakpointObserver)
      .observe('(max-width: 899.98px)')
      .pipe(map((s) => s.matches)),
    { initialValue: false },
  );
  protected readonly columns = computed(() => (this.compact() ? NARROW_COLUMNS : WIDE_COLUMNS));
  protected readonly matching = computed(() => sortPeople(filterPeople(this.store.users(), this.filter()), this.sort()));
  protected readonly rows = computed(() => pageOfPeople(this.matching(), this.pageIndex(), this.pageSize()));
  protected readonly suspendedCount = computed(() => this.store.users().filter((u) => u.suspended).length);
  protected readonly trackById = (_: number, user: AdminUser) => user.id;

  constructor() {
    void this.store.load();
  }

  protected isSelf(user: AdminUser): boolean {
    return user.id === this.auth.me()?.id;
  }

  protected setFilter(value: string): void {
    this.filter.set(value);
    this.pageIndex.set(0);
  }

  protected setSort(sort: Sort): void {
    this.sort.set({ active: sort.active, direction: sort.direction });
  }

  protected setPage(event: PageEvent): void {
    this.pageIndex.set(event.pageIndex);
    this.pageSize.set(event.pageSize);
  }

  protected async changeRole(user: AdminUser, change: MatSelectChange<Role>): Promise<void> {
    try {
      const updated = await this.store.update(user.id, { role: change.value });
      void this.notifier.tell(`${updated.displayName} is now ${article(updated.role)} ${updated.role}.`, undefined, 4000);
    } catch (error) {
      change.source.value = user.role; // the select already shows the refused choice; put it back
      throw error;
    }
  }

  protected async toggleSuspension(user: AdminUser): Promise<void> {
    const suspend = !user.suspended;
    const confirmed = await confirmWith(this.dialog, {
      title: suspend ? `Suspend ${user.displayName}?` : `Restore ${user.displayName}?`,
      message: suspend
        ? `${user.email} is signed out everywhere at once and cannot sign in until an admin restores the account. Their designs stay as they are.`
        : `${user.email} can sign in again with their password.`,
      confirmLabel: suspend ? 'Suspend account' : 'Restore account',
      danger: suspend,
    });
    if (!confirmed) return;
    const updated = await this.store.update(user.id, { suspended: suspend });
    void this.notifier.tell(updated.suspended ? `${updated.displayName} is suspended.` : `${updated.displayName} can sign in again.`, undefined, 4000);
  }
}

function article(role: Role): string {
  return role === 'admin' ? 'an' : 'a';
}
