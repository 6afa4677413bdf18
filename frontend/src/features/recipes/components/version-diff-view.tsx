import type { RecipeStep } from '@tracewright/shared';

import type { LoadedDiff } from '../hooks/use-version-diff';
import { ChangeList } from './change-list';
import { DiffStatusWord } from './diff-status-word';

const CELL = 'border-t border-graphite-200 px-3 py-2 align-top';

const stepCell = (steps: readonly RecipeStep[], index: number | null) => {
  if (index === null) return <span className="text-graphite-600">—</span>;
  const step = steps[index];
  return (
    <span>
      <span className="tabular text-graphite-600">{index + 1}. </span>
      {step?.title}
    </span>
  );
};

/** Two versions side by side: each step where it stood before and after, and what changed in it. */
export function VersionDiffView({ loaded }: { loaded: LoadedDiff }) {
  const { from, to, diff } = loaded;
  const changedCount = diff.steps.filter((s) => s.status !== 'unchanged').length;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-graphite-800">
        Version {from.number} → version {to.number}: {changedCount === 0 ? 'the steps are the same' : `${changedCount} ${changedCount === 1 ? 'step differs' : 'steps differ'}`}
        {diff.setupChanges.length > 0 ? `, and ${diff.setupChanges.length} setup ${diff.setupChanges.length === 1 ? 'field' : 'fields'}` : ''}.
      </p>
      {diff.setupChanges.length > 0 ? <ChangeList label="Setup changes" changes={diff.setupChanges} /> : null}
      <div className="overflow-auto rounded-md border border-graphite-300 bg-white">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">
            Steps of version {from.number} and version {to.number} side by side
          </caption>
          <thead>
            <tr className="bg-graphite-50">
              <th scope="col" className="px-3 py-2">Version {from.number}</th>
              <th scope="col" className="px-3 py-2">Change</th>
              <th scope="col" className="px-3 py-2">Version {to.number}</th>
            </tr>
          </thead>
          <tbody>
            {diff.steps.map((step) => (
              <tr key={step.stepId} className={step.status === 'unchanged' ? 'text-graphite-700' : ''}>
                <td className={CELL}>{stepCell(from.content.steps, step.beforeIndex)}</td>
                <td className={CELL}>
                  <DiffStatusWord diff={step} />
                  {step.changes.length > 0 ? <ChangeList label={`Changes in ${step.title}`} changes={step.changes} /> : null}
                </td>
                <td className={CELL}>{stepCell(to.content.steps, step.afterIndex)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
