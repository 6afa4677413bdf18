import type { Role } from '@tracewright/shared';

export type WelcomeLink = { to: string; label: string; what: string };
export type WelcomeContent = { now: WelcomeLink[]; later: string };

const MY_PIN: WelcomeLink = { to: '/my-pin', label: 'My PIN', what: 'set a PIN to switch to yourself quickly on a shared tablet.' };
const AUDIT: WelcomeLink = { to: '/audit', label: 'Audit log', what: 'see who changed what, and when, with the values before and after.' };

/**
 * What each role can really do in this release, and what is still to come. Kept honest on
 * purpose: no tiles for screens that do not exist yet.
 */
export const WELCOME: Record<Role, WelcomeContent> = {
  admin: {
    now: [
      { to: '/people', label: 'People', what: 'invite people, give them a role, resend invitations, deactivate accounts.' },
      { to: '/settings', label: 'Lab settings', what: 'set the lab’s name, time zone and paper size for printouts.' },
      { to: '/dev/mail', label: 'Outgoing mail', what: 'read the mails the system sent, while mail capture is on.' },
      AUDIT,
      MY_PIN,
    ],
    later: 'Materials, equipment and recipes come next; people you invite now will find them here.',
  },
  quality: {
    now: [AUDIT, MY_PIN],
    later: 'Reviewing and releasing recipe versions, deviations and trends come in later releases.',
  },
  engineer: {
    now: [MY_PIN],
    later: 'Writing recipes, materials and equipment records, and the process checks come in later releases.',
  },
  operator: {
    now: [MY_PIN],
    later: 'Running released recipes at the bench, step by step with timers and readings, comes in a later release.',
  },
};
