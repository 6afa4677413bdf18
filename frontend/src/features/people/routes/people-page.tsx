import { useSuspenseQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { TextField } from '../../../components/ui/text-field';
import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { usersQueryOptions } from '../api/get-users';
import { InvitePersonForm } from '../components/invite-person-form';
import { PeopleTable } from '../components/people-table';
import { filterAndSortPeople, type PeopleSort, type PeopleSortKey } from '../utils/sort-people';

const countPeople = (n: number) => `${n} ${n === 1 ? 'person' : 'people'}`;

export function PeoplePage() {
  const { data: users } = useSuspenseQuery(usersQueryOptions());
  const { user: self } = useSession();
  const toast = useToast();
  const [isInviting, setIsInviting] = useState(false);
  const [filter, setFilter] = useState('');
  const [sort, setSort] = useState<PeopleSort>({ key: 'name', direction: 'ascending' });
  const panelId = useId();

  const onSort = (key: PeopleSortKey) =>
    setSort((s) => ({ key, direction: s.key === key && s.direction === 'ascending' ? 'descending' : 'ascending' }));
  const shown = filterAndSortPeople(users, filter, sort);

  return (
    <>
      <PageHeader
        title="People"
        description="Everyone who can sign in to this lab’s workspace, and what their role lets them do."
        actions={
          <Button aria-expanded={isInviting} aria-controls={panelId} onClick={() => setIsInviting((v) => !v)}>
            <Icon name="envelope" />
            Invite a person
          </Button>
        }
      />
      <div id={panelId}>
        {isInviting ? (
          <div className="mb-8 rounded-md border border-graphite-300 bg-white p-5">
            <InvitePersonForm
              onCancel={() => setIsInviting(false)}
              onInvited={(email) => {
                setIsInviting(false);
                toast.show(`Invitation sent to ${email}.`);
              }}
            />
          </div>
        ) : null}
      </div>
      <div className="mb-4 max-w-sm">
        <TextField label="Filter people" type="search" help="Part of a name or e-mail address." value={filter} onChange={(e) => setFilter(e.target.value)} />
      </div>
      <p role="status" className="mb-2 text-sm text-graphite-600">
        {shown.length === users.length ? countPeople(users.length) : `${shown.length} of ${countPeople(users.length)} shown`}
      </p>
      <PeopleTable users={shown} selfId={self.id} sort={sort} onSort={onSort} />
    </>
  );
}
