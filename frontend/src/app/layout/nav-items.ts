import type { Role } from '@tracewright/shared';

import type { IconName } from '../../components/icons/icon-paths';
import { ROUTE_ROLES } from '../route-roles';

export type NavItem = { to: string; label: string; icon: IconName; roles?: readonly Role[]; end?: boolean };

// No `roles` means everyone who is signed in.
export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/', label: 'Home', icon: 'home', end: true },
  { to: '/recipes', label: 'Recipes', icon: 'ledger' },
  { to: '/runs', label: 'Runs', icon: 'clipboard' },
  { to: '/deviations', label: 'Deviations', icon: 'warning', roles: ROUTE_ROLES.quality },
  { to: '/trends', label: 'Trends', icon: 'trend', roles: ROUTE_ROLES.quality },
  { to: '/materials', label: 'Materials', icon: 'flask' },
  { to: '/equipment', label: 'Equipment', icon: 'printer' },
  { to: '/calculator', label: 'Calculator', icon: 'calculator' },
  { to: '/audit', label: 'Audit log', icon: 'history', roles: ROUTE_ROLES.audit },
  { to: '/people', label: 'People', icon: 'people', roles: ROUTE_ROLES.people },
  { to: '/settings', label: 'Lab settings', icon: 'sliders', roles: ROUTE_ROLES.settings },
  { to: '/dev/mail', label: 'Outgoing mail', icon: 'outbox', roles: ROUTE_ROLES.devMail },
  { to: '/my-pin', label: 'My PIN', icon: 'keypad' },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.roles || item.roles.includes(role));
}
