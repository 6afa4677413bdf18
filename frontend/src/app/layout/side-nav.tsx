import { NavLink } from 'react-router';

import type { Role } from '@tracewright/shared';

import { Icon } from '../../components/icons/icon';
import { navItemsFor } from './nav-items';

const LINK =
  'flex min-h-11 items-center gap-3 rounded-md border-l-4 px-3 py-2 text-graphite-800 hover:bg-graphite-100';

export function SideNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main" className="border-b border-graphite-200 bg-graphite-50 p-3 md:border-r md:border-b-0">
      <ul className="flex flex-wrap gap-1 md:flex-col">
        {navItemsFor(role).map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                `${LINK} ${isActive ? 'border-copper-600 bg-white font-bold text-graphite-900' : 'border-transparent'}`
              }
            >
              <Icon name={item.icon} />
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
