import { Link } from 'react-router';

import type { RecipeSummary } from '@tracewright/shared';

import { recipeVersionPath } from '../utils/recipe-paths';
import { VersionStateBadge } from './version-state-badge';

const CELL = 'border-t border-graphite-200 px-3 py-2 align-middle';
const HEAD = 'sticky top-0 bg-graphite-50 px-3 py-2 text-left font-bold text-graphite-800';

/** Every recipe with the version being worked on and the one operators may run. */
export function RecipeTable({ recipes }: { recipes: readonly RecipeSummary[] }) {
  return (
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label="Recipes">
      <table className="w-full border-collapse">
        <caption className="sr-only">Recipes, their latest version and the released version</caption>
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Code</th>
            <th scope="col" className={HEAD}>Name</th>
            <th scope="col" className={HEAD}>Product</th>
            <th scope="col" className={HEAD}>Latest version</th>
            <th scope="col" className={HEAD}>Released version</th>
          </tr>
        </thead>
        <tbody>
          {recipes.map((recipe) => {
            const latest = recipe.latestVersion;
            return (
              <tr key={recipe.id}>
                <th scope="row" className={`${CELL} font-bold`}>
                  {latest ? (
                    <Link to={recipeVersionPath(recipe.id, latest.id)} className="text-graphite-900 underline decoration-graphite-400 underline-offset-4 hover:text-copper-700">
                      {recipe.code}
                    </Link>
                  ) : (
                    recipe.code
                  )}
                </th>
                <td className={CELL}>{recipe.name}</td>
                <td className={CELL}>{recipe.product}</td>
                <td className={CELL}>
                  {latest ? (
                    <span className="inline-flex items-center gap-2">
                      <span className="tabular">v{latest.number}</span>
                      <VersionStateBadge state={latest.state} />
                    </span>
                  ) : (
                    '—'
                  )}
                </td>
                <td className={CELL}>
                  {recipe.releasedVersion ? (
                    <Link
                      to={recipeVersionPath(recipe.id, recipe.releasedVersion.id)}
                      aria-label={`Open released version ${recipe.releasedVersion.number} of ${recipe.code}`}
                      className="tabular font-bold text-copper-700 underline underline-offset-4"
                    >
                      v{recipe.releasedVersion.number}
                    </Link>
                  ) : (
                    <span className="text-graphite-600">None yet</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
