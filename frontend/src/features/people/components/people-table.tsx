import type { User } from '@tracewright/shared';

import type { PeopleSort, PeopleSortKey } from '../utils/sort-people';
import { PersonRow } from './person-row';
import { SortHeader } from './sort-header';

type PeopleTableProps = { users: User[]; selfId: number; sort: PeopleSort; onSort: (key: PeopleSortKey) => void };

const PLAIN_HEAD = 'sticky top-0 z-10 whitespace-nowrap bg-graphite-100 px-3 text-left font-bold';

export function PeopleTable({ users, selfId, sort, onSort }: PeopleTableProps) {
  return (
    // The scroll box keeps the header in view (sticky) while a long list scrolls.
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label="People table">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">People in this lab. Column headers with buttons sort the table.</caption>
        <thead>
          <tr>
            <SortHeader label="Name" sortKey="name" sort={sort} onSort={onSort} />
            <th scope="col" className={PLAIN_HEAD}>E-mail</th>
            <SortHeader label="Role" sortKey="role" sort={sort} onSort={onSort} />
            <SortHeader label="Status" sortKey="status" sort={sort} onSort={onSort} />
            <th scope="col" className={PLAIN_HEAD}>PIN set</th>
            <th scope="col" className={PLAIN_HEAD}>Last sign-in</th>
            <th scope="col" className={PLAIN_HEAD}>Actions</th>
          </tr>
        </thead>
        <tbody>
          {users.map((user) => (
            <PersonRow key={user.id} user={user} isSelf={user.id === selfId} />
          ))}
        </tbody>
      </table>
    </div>
  );
}
