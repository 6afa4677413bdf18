import type { Role } from '@tracewright/shared';

import { TextLink } from '../../../components/ui/text-link';
import { WELCOME } from './role-welcome-content';

export function RoleWelcome({ role }: { role: Role }) {
  const { now, later } = WELCOME[role];
  return (
    <div className="max-w-prose space-y-6">
      <section aria-labelledby="can-do-now" className="space-y-3">
        <h2 id="can-do-now" className="text-xl font-bold">
          What you can do here now
        </h2>
        <ul className="space-y-2">
          {now.map((link) => (
            <li key={link.to}>
              <TextLink to={link.to}>{link.label}</TextLink>: {link.what}
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="coming-later" className="space-y-2">
        <h2 id="coming-later" className="text-xl font-bold">
          Still to come
        </h2>
        <p className="text-graphite-700">{later}</p>
      </section>
    </div>
  );
}
