import type { User } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { PersonActions } from './person-actions';
import { PersonStatus } from './person-status';
import { RoleSelect } from './role-select';

const CELL = 'border-t border-graphite-200 px-3 py-2 align-middle';

/** `isSelf`: an admin cannot lock themselves out from this screen; another admin must do it. */
export function PersonRow({ user, isSelf }: { user: User; isSelf: boolean }) {
  return (
    <tr>
      <th scope="row" className={`${CELL} whitespace-nowrap text-left font-bold`}>
        {user.name}
        {isSelf ? <span className="ml-2 font-normal text-graphite-600">(you)</span> : null}
      </th>
      <td className={CELL}>
        {/* Long addresses may wrap after the @, never inside a name or at a domain's hyphen. */}
        {user.email.split('@').map((part, i) => (
          <span key={i}>
            {i === 0 ? null : (
              <>
                @<wbr />
              </>
            )}
            <span className="whitespace-nowrap">{part}</span>
          </span>
        ))}
      </td>
      <td className={`${CELL} min-w-52`}>
        <RoleSelect user={user} disabled={isSelf} />
      </td>
      <td className={CELL}>
        <PersonStatus status={user.status} />
      </td>
      <td className={CELL}>{user.hasPin ? 'Yes' : 'No'}</td>
      <td className={`${CELL} tabular`}>
        {user.lastSignInAt ? (
          <time dateTime={user.lastSignInAt}>
            {/* Date and time may go on two lines, but neither breaks at its own hyphen or colon. */}
            {formatDateTime(user.lastSignInAt)
              .split(' ')
              .map((part) => (
                <span key={part} className="inline-block whitespace-nowrap pr-1">
                  {part}
                </span>
              ))}
          </time>
        ) : (
          'Never'
        )}
      </td>
      <td className={`${CELL} min-w-56`}>{isSelf ? null : <PersonActions user={user} />}</td>
    </tr>
  );
}
