import { describe, expect, it } from 'vitest';

import { aUser } from '../../../../test/api-fixtures';
import { filterAndSortPeople, type PeopleSort } from './sort-people';

const people = [
  aUser({ id: 1, name: 'Bea Quist', email: 'bea@lab.example', role: 'quality', status: 'active' }),
  aUser({ id: 2, name: 'Al Oduya', email: 'al@lab.example', role: 'operator', status: 'deactivated' }),
  aUser({ id: 3, name: 'Cy Ek', email: 'cy@print.example', role: 'admin', status: 'invited' }),
  aUser({ id: 4, name: 'Di Ek', email: 'di@lab.example', role: 'operator', status: 'active' }),
];
const names = (filter: string, sort: PeopleSort) => filterAndSortPeople(people, filter, sort).map((u) => u.name);

describe('filterAndSortPeople', () => {
  it.each<[string, PeopleSort, string[]]>([
    ['', { key: 'name', direction: 'ascending' }, ['Al Oduya', 'Bea Quist', 'Cy Ek', 'Di Ek']],
    ['', { key: 'name', direction: 'descending' }, ['Di Ek', 'Cy Ek', 'Bea Quist', 'Al Oduya']],
    // By role name (Admin, Operator, Quality), then by name within a role.
    ['', { key: 'role', direction: 'ascending' }, ['Cy Ek', 'Al Oduya', 'Di Ek', 'Bea Quist']],
    // Invited first: those still need something from someone.
    ['', { key: 'status', direction: 'ascending' }, ['Cy Ek', 'Bea Quist', 'Di Ek', 'Al Oduya']],
    ['ek', { key: 'name', direction: 'ascending' }, ['Cy Ek', 'Di Ek']],
    ['  PRINT.example ', { key: 'name', direction: 'ascending' }, ['Cy Ek']],
    ['nobody', { key: 'name', direction: 'ascending' }, []],
  ])('when filtering %j and sorting %j, then the order is %j', (filter, sort, expected) => {
    expect(names(filter, sort)).toEqual(expected);
  });

  it('when sorting, then the given list is left untouched', () => {
    const before = people.map((u) => u.id);
    filterAndSortPeople(people, '', { key: 'name', direction: 'descending' });
    expect(people.map((u) => u.id)).toEqual(before);
  });
});
