import type { RunSummary } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { TextLink } from '../../../components/ui/text-link';
import { RunStateBadge } from './run-state-badge';

const CELL = 'px-3 py-2 align-top';

export function RunRow({ run }: { run: RunSummary }) {
  return (
    <tr className="border-t border-graphite-200">
      <th scope="row" className={`${CELL} whitespace-nowrap text-left`}>
        <TextLink to={`/runs/${run.id}`}>{run.code}</TextLink>
      </th>
      <td className={CELL}>
        <span className="font-bold">{run.recipeCode}</span> {run.recipeName}
        <span className="block text-sm text-graphite-600">Version {run.versionNumber}</span>
      </td>
      <td className={CELL}>
        <RunStateBadge state={run.state} />
      </td>
      <td className={`${CELL} tabular text-right`}>{run.quantity}</td>
      <td className={`${CELL} tabular whitespace-nowrap`}>{run.dueOn ?? <span className="text-graphite-600">Not set</span>}</td>
      <td className={`${CELL} tabular whitespace-nowrap text-right`}>
        {run.doneSteps} of {run.totalSteps}
      </td>
      <td className={`${CELL} tabular text-right`}>
        {run.openDeviations > 0 ? (
          <span className="inline-flex items-center gap-1 whitespace-nowrap font-bold text-oxide-800">
            <Icon name="warning" className="size-4" />
            {run.openDeviations} not closed
          </span>
        ) : (
          <span className="text-graphite-600">0</span>
        )}
      </td>
    </tr>
  );
}
