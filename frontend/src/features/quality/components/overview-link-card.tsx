import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';

/** The way to the quality overview, kept on the queue instead of adding a navigation entry. */
export function OverviewLinkCard() {
  return (
    <Link
      to="/quality"
      className="mb-6 flex items-center gap-4 rounded-md border-2 border-graphite-300 bg-white p-4 text-graphite-900 no-underline hover:border-copper-600"
    >
      <Icon name="ledger" className="size-8 text-copper-700" />
      <span className="flex-1">
        <span className="block text-lg font-bold underline underline-offset-4">Quality overview</span>
        <span className="block text-graphite-700">Deviations not yet closed by severity and age, runs awaiting sign-off, versions awaiting review, weak capability.</span>
      </span>
      <Icon name="chevronRight" />
    </Link>
  );
}
