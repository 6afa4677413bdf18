import type { CheckSummary, RecipeVersionView } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { BuilderActions, type BuilderActionsProps } from './builder-actions';
import { CheckCounts } from './check-counts';
import { SaveState } from './save-state';
import { VersionStateBadge } from './version-state-badge';

type BuilderHeaderProps = BuilderActionsProps & { view: RecipeVersionView; summary: CheckSummary };

/** Which recipe and version this is, where it stands, and what can be done with it. */
export function BuilderHeader({ view, summary, ...actions }: BuilderHeaderProps) {
  const { recipe, signature } = view;
  return (
    <header className="mb-4 flex flex-col gap-3 border-b border-graphite-200 pb-4">
      <title>{`${recipe.code} v${view.number} · Tracewright`}</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm font-bold tracking-wide text-graphite-600">{recipe.code}</p>
          <h1 className="text-3xl font-bold text-graphite-900">{recipe.name}</h1>
          <p className="text-graphite-700">{recipe.product}</p>
        </div>
        <BuilderActions {...actions} />
      </div>
      <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
        <span className="tabular text-lg font-bold">Version {view.number}</span>
        <VersionStateBadge state={view.state} />
        <span className="text-sm text-graphite-700">by {view.author.name}</span>
        {signature ? (
          <span className="text-sm text-graphite-700">
            released by {signature.printedName}, {formatDateTime(signature.signedAt)}
          </span>
        ) : null}
        {actions.mode === 'author' ? <SaveState isDirty={actions.isDirty} /> : null}
        <CheckCounts summary={summary} />
      </div>
    </header>
  );
}
