import type { AdminUser, Role } from '@barwright/contracts';

/** Columns the People table can sort by. */
export type PeopleSortKey = 'person' | 'email' | 'role' | 'status' | 'createdAt' | 'lastSignInAt';
export interface PeopleSort {
  active: string;
  direction: 'asc' | 'desc' | '';
}

const ROLE_RANK: Record<Role, number> = { member: 0, moderator: 1, admin: 2 };

/** Accounts whose name, e-mail, role or status ("suspended", "active") contains every word of `query`. */
export function filterPeople(users: readonly AdminUser[], query: string): AdminUser[] {
  const words = query.trim().toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...users];
  return users.filter((u) => {
    const haystack = `${u.displayName} ${u.email} ${u.role} ${u.suspended ? 'suspended' : 'active'}`.toLowerCase();
    return words.every((w) => haystack.includes(w));
  });
}

/** A stable sort; without an active column the server's order is kept. Never-signed-in sorts before any date. */
export function sortPeople(users: readonly AdminUser[], sort: PeopleSort): AdminUser[] {
  const key = sort.active as PeopleSortKey;
  if (!sort.direction || !(key in SORT_VALUE)) return [...users];
  const sign = sort.direction === 'asc' ? 1 : -1;
  const value = SORT_VALUE[key];
  return users
    .map((user, index) => ({ user, index, v: value(user) }))
    .sort((a, b) => (a.v < b.v ? -sign : a.v > b.v ? sign : a.index - b.index))
    .map((e) => e.user);
}

const SORT_VALUE: Record<PeopleSortKey, (u: AdminUser) => string | number> = {
  person: (u) => u.displayName.toLocaleLowerCase(),
  email: (u) => u.email,
  role: (u) => ROLE_RANK[u.role],
  status: (u) => (u.suspended ? 1 : 0),
  createdAt: (u) => u.createdAt,
  lastSignInAt: (u) => u.lastSignInAt ?? '',
};

/** The rows of one page; a page index past the end gives the last page. */
export function pageOfPeople(users: readonly AdminUser[], pageIndex: number, pageSize: number): AdminUser[] {
  const lastPage = Math.max(0, Math.ceil(users.length / pageSize) - 1);
  const start = Math.min(pageIndex, lastPage) * pageSize;
  return users.slice(start, start + pageSize);
}
