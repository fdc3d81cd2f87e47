import type { AdminUser } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { filterPeople, pageOfPeople, sortPeople } from './people-view';

const user = (over: Partial<AdminUser>): AdminUser => ({
  id: over.email ?? 'x', email: 'x@example.test', displayName: 'X', role: 'member', emailVerified: true,
  suspended: false, createdAt: '2026-01-01T00:00:00Z', lastSignInAt: null, ...over,
});
const people = [
  user({ email: 'bea@example.test', displayName: 'Bea Lathe', role: 'admin', createdAt: '2026-03-01T00:00:00Z', lastSignInAt: '2026-05-01T00:00:00Z' }),
  user({ email: 'al@example.test', displayName: 'al Rack', role: 'moderator', suspended: true, createdAt: '2026-02-01T00:00:00Z' }),
  user({ email: 'cy@example.test', displayName: 'Cy Spindle', createdAt: '2026-01-01T00:00:00Z', lastSignInAt: '2026-04-01T00:00:00Z' }),
];
const names = (list: AdminUser[]) => list.map((u) => u.displayName);

describe('filterPeople', () => {
  it('matches every word against name, e-mail, role and status', () => {
    expect(names(filterPeople(people, 'LATHE'))).toEqual(['Bea Lathe']);
    expect(names(filterPeople(people, 'suspended'))).toEqual(['al Rack']);
    expect(names(filterPeople(people, 'example member'))).toEqual(['Cy Spindle']);
    expect(filterPeople(people, '   ')).toHaveLength(3);
  });
});

describe('sortPeople', () => {
  it('sorts names without regard to case', () => {
    expect(names(sortPeople(people, { active: 'person', direction: 'asc' }))).toEqual(['al Rack', 'Bea Lathe', 'Cy Spindle']);
  });

  it('ranks roles member < moderator < admin', () => {
    expect(names(sortPeople(people, { active: 'role', direction: 'desc' }))).toEqual(['Bea Lathe', 'al Rack', 'Cy Spindle']);
  });

  it('puts never-signed-in first when ascending', () => {
    expect(names(sortPeople(people, { active: 'lastSignInAt', direction: 'asc' }))).toEqual(['al Rack', 'Cy Spindle', 'Bea Lathe']);
  });

  it("keeps the server's order without a direction or with an unknown column", () => {
    expect(sortPeople(people, { active: 'person', direction: '' })).toEqual(people);
    expect(sortPeople(people, { active: 'shoeSize', direction: 'asc' })).toEqual(people);
  });
});

describe('pageOfPeople', () => {
  it('slices one page and clamps past the end to the last page', () => {
    expect(names(pageOfPeople(people, 1, 2))).toEqual(['Cy Spindle']);
    expect(names(pageOfPeople(people, 9, 2))).toEqual(['Cy Spindle']);
    expect(pageOfPeople([], 0, 10)).toEqual([]);
  });
});
