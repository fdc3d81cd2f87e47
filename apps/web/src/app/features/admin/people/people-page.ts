import { BreakpointObserver } from '@angular/cdk/layout';
import { NgTemplateOutlet } from '@angular/common';
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
import { MatMenuModule } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import { askAccountChange } from './account-change-dialog';
import { ROLE_POWERS, roleNowText, type AccountChange } from './account-change-wording';
import { PeopleStore } from './people-store';
import { filterPeople, pageOfPeople, PeopleSort, sortPeople } from './people-view';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

const WIDE_COLUMNS = ['person', 'role', 'status', 'emailVerified', 'createdAt', 'lastSignInAt', 'actions'];
const NARROW_COLUMNS = ['person'];

@Component({
  selector: 'bw-people-page',
  imports: [
    DateTextPipe, NgTemplateOutlet, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatMenuModule,
    MatPaginatorModule, MatProgressBarModule, MatSelectModule, MatSortModule, MatTableModule,
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
  /** "Designs bars on their boards, …": the role's powers as a sentence of its own. */
  protected readonly powerOf = (role: Role) => ROLE_POWERS[role].charAt(0).toUpperCase() + ROLE_POWERS[role].slice(1);
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

  /** Asks to confirm with a reason; applies the role, then offers to undo it (the undo is audited as one). */
  protected async changeRole(user: AdminUser, change: MatSelectChange<Role>): Promise<void> {
    const from = user.role;
    const reason = await this.ask(user, { kind: 'role', from, to: change.value });
    if (reason === null) {
      change.source.value = from; // the select already shows the choice; put it back
      return;
    }
    try {
      const updated = await this.store.update(user.id, { role: change.value, reason });
      if (await this.notifier.tell(roleNowText(updated.displayName, updated.role), 'Undo', 10_000)) {
        const undone = await this.store.update(user.id, { role: from, reason: `Undo of: ${reason}`.slice(0, 500), undo: true });
        void this.notifier.tell(`Undone: ${roleNowText(undone.displayName, undone.role)}`, undefined, 4000);
      }
    } catch (error) {
      change.source.value = from;
      throw error;
    }
  }

  protected async toggleSuspension(user: AdminUser): Promise<void> {
    const suspend = !user.suspended;
    const reason = await this.ask(user, { kind: suspend ? 'suspend' : 'restore' });
    if (reason === null) return;
    const updated = await this.store.update(user.id, { suspended: suspend, ...(reason ? { reason } : {}) });
    void this.notifier.tell(updated.suspended ? `${updated.displayName} is suspended.` : `${updated.displayName} can sign in again.`, undefined, 4000);
  }

  private ask(user: AdminUser, change: AccountChange): Promise<string | null> {
    return askAccountChange(this.dialog, { name: user.displayName, email: user.email, change });
  }
}
