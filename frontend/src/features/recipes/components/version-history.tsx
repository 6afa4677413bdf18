import { Link } from 'react-router';

import type { RecipeDetail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { recipeVersionPath } from '../utils/recipe-paths';
import { VersionStateBadge } from './version-state-badge';

type VersionHistoryProps = { recipe: RecipeDetail; currentVersionId: number };

/** Every version, newest first: who wrote it, and who released it when. */
export function VersionHistory({ recipe, currentVersionId }: VersionHistoryProps) {
  return (
    <ol className="flex flex-col gap-2" aria-label="Version history">
      {recipe.versions.map((v) => (
        <li key={v.id} className={`flex flex-wrap items-center gap-x-4 gap-y-1 rounded-md border bg-white px-3 py-2 ${v.id === currentVersionId ? 'border-copper-600' : 'border-graphite-200'}`}>
          {v.id === currentVersionId ? (
            <span className="font-bold" aria-current="page">
              Version {v.number} (open here)
            </span>
          ) : (
            <Link to={recipeVersionPath(recipe.id, v.id)} className="font-bold text-copper-700 underline underline-offset-4">
              Version {v.number}
            </Link>
          )}
          <VersionStateBadge state={v.state} />
          <span className="text-sm text-graphite-700">
            by {v.author.name}, {formatDateTime(v.createdAt)}
          </span>
          {v.releasedBy && v.releasedAt ? (
            <span className="text-sm text-graphite-700">
              released by {v.releasedBy.name}, {formatDateTime(v.releasedAt)}
            </span>
          ) : null}
          {v.changeNote ? <span className="w-full text-sm text-graphite-800">{v.changeNote}</span> : null}
        </li>
      ))}
    </ol>
  );
}
