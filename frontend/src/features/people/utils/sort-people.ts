import { ROLE_LABELS, type User, type UserStatus } from '@tracewright/shared';

export type PeopleSortKey = 'name' | 'role' | 'status';
export type SortDirection = 'ascending' | 'descending';
export type PeopleSort = { key: PeopleSortKey; direction: SortDirection };

// Status sorts by what needs attention first, not alphabetically.
const STATUS_ORDER: Record<UserStatus, number> = { invited: 0, active: 1, deactivated: 2 };

const byName = (a: User, b: User) => a.name.localeCompare(b.name);
const COMPARE: Record<PeopleSortKey, (a: User, b: User) => number> = {
  name: byName,
  role: (a, b) => ROLE_LABELS[a.role].name.localeCompare(ROLE_LABELS[b.role].name) || byName(a, b),
  status: (a, b) => STATUS_ORDER[a.status] - STATUS_ORDER[b.status] || byName(a, b),
};

/** Filters by name or e-mail (any part, any case), then sorts; the input is left untouched. */
export function filterAndSortPeople(users: readonly User[], filter: string, sort: PeopleSort): User[] {
  const needle = filter.trim().toLowerCase();
  const kept = needle
    ? users.filter((u) => u.name.toLowerCase().includes(needle) || u.email.toLowerCase().includes(needle))
    : [...users];
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return kept.sort((a, b) => sign * COMPARE[sort.key](a, b));
}
