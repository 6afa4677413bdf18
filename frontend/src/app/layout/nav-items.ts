import type { Role } from '@tracewright/shared';

import type { IconName } from '../../components/icons/icon-paths';
import { ROUTE_ROLES } from '../route-roles';

/** `what`: one line on what the page is for, shown beside its link on the home page. */
export type NavItem = { to: string; label: string; what: string; icon: IconName; roles?: readonly Role[]; end?: boolean };

// No `roles` means everyone who is signed in.
export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/', label: 'Home', what: 'what waits for you today.', icon: 'home', end: true },
  { to: '/recipes', label: 'Recipes', what: 'recipes and their versions: steps, materials, settings and the process checks on them.', icon: 'ledger' },
  { to: '/runs', label: 'Runs', what: 'runs of released recipes: plan them, print travellers, follow each step and its readings.', icon: 'clipboard' },
  { to: '/deviations', label: 'Deviations', what: 'every departure from a recipe: review it, decide what happens to the pieces, close it.', icon: 'warning', roles: ROUTE_ROLES.quality },
  { to: '/trends', label: 'Trends', what: 'readings across runs on control charts, with capability against the limits.', icon: 'trend', roles: ROUTE_ROLES.quality },
  { to: '/materials', label: 'Materials', what: 'inks and substrates with their properties, and their lots with expiry dates.', icon: 'flask' },
  { to: '/equipment', label: 'Equipment', what: 'printers, heat sources, surface treaters and instruments, with calibration dates.', icon: 'printer' },
  { to: '/calculator', label: 'Calculator', what: 'the process checks on their own: jetting, wetting, line geometry, resistance, heat and capability.', icon: 'calculator' },
  { to: '/audit', label: 'Audit log', what: 'who changed what, and when, with the values before and after.', icon: 'history', roles: ROUTE_ROLES.audit },
  { to: '/people', label: 'People', what: 'invite people, give them a role, resend invitations, deactivate accounts.', icon: 'people', roles: ROUTE_ROLES.people },
  { to: '/settings', label: 'Lab settings', what: 'the lab’s name, time zone and paper size for printouts.', icon: 'sliders', roles: ROUTE_ROLES.settings },
  { to: '/dev/mail', label: 'Outgoing mail', what: 'the mails the system sent, while mail capture is on.', icon: 'outbox', roles: ROUTE_ROLES.devMail },
  { to: '/my-pin', label: 'My PIN', what: 'set a PIN to switch to yourself quickly on a shared tablet.', icon: 'keypad' },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.roles || item.roles.includes(role));
}
