import { ROLE_LABELS } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { TextLink } from '../../../components/ui/text-link';
import { useSession } from '../../../lib/session';
import { RoleWelcome } from '../components/role-welcome';

export function HomePage() {
  const { user } = useSession();
  const firstName = user.name.split(' ')[0] ?? user.name;
  const role = ROLE_LABELS[user.role];

  return (
    <>
      <PageHeader title={`Welcome, ${firstName}`} description={`Your role: ${role.name}. ${role.summary}`} />
      <div className="space-y-6">
        {user.hasPin ? null : (
          <div className="max-w-prose">
            <Notice title="You have no PIN yet.">
              <p>
                On shared tablets, a PIN saves typing your password. <TextLink to="/my-pin">Set your PIN</TextLink>.
              </p>
            </Notice>
          </div>
        )}
        <RoleWelcome role={user.role} />
      </div>
    </>
  );
}
