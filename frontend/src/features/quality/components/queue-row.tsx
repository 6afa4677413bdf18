import type { DeviationQueue } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { TextLink } from '../../../components/ui/text-link';
import { ageText } from '../utils/age-text';
import { DeviationStateBadge } from './deviation-state-badge';
import { SeverityBadge } from './severity-badge';

const CELL = 'border-t border-graphite-200 px-3 py-2 align-top';

export function QueueRow({ item }: { item: DeviationQueue['items'][number] }) {
  return (
    <tr>
      <td className={CELL}>
        <SeverityBadge severity={item.severity} />
      </td>
      <th scope="row" className={`${CELL} min-w-56 text-left font-normal`}>
        <TextLink to={`/deviations/${item.id}`}>{item.title}</TextLink>
        <span className="block text-sm text-graphite-600 tabular">#{item.id}</span>
      </th>
      <td className={`${CELL} whitespace-nowrap tabular`}>{item.runCode}</td>
      <td className={`${CELL} whitespace-nowrap`}>{item.recipeCode}</td>
      <td className={CELL}>{item.stepKind ? <StepKindLabel kind={item.stepKind} size="sm" /> : <span className="text-graphite-600">Whole run</span>}</td>
      <td className={CELL}>
        <DeviationStateBadge state={item.state} />
      </td>
      <td className={CELL}>{item.assignee?.name ?? <span className="text-graphite-600">Nobody yet</span>}</td>
      <td className={`${CELL} whitespace-nowrap text-right tabular`}>{ageText(item.ageDays)}</td>
    </tr>
  );
}
