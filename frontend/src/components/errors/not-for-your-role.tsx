import { ROLE_LABELS, type Role } from '@tracewright/shared';

import { Notice } from '../ui/notice';
import { TextLink } from '../ui/text-link';

type NotForYourRoleProps = { allowed: readonly Role[]; current?: Role };

const names = (roles: readonly Role[]) => roles.map((r) => ROLE_LABELS[r].name).join(' or ');

export function NotForYourRole({ allowed, current }: NotForYourRoleProps) {
  return (
    <section aria-labelledby="not-for-role-title" className="max-w-prose space-y-4">
      <h1 id="not-for-role-title" className="text-3xl font-bold">
        This page is not for your role
      </h1>
      <Notice title={`Only people with the ${names(allowed)} role can use this page.`}>
        <p>
          {current ? `You are signed in as ${ROLE_LABELS[current].name}. ` : ''}
          If you need it for your work, ask an admin to change your role.
        </p>
      </Notice>
      <p>
        <TextLink to="/">Go to the home page</TextLink>
      </p>
    </section>
  );
}
