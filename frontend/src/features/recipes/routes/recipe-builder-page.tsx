import { useParams } from 'react-router';

import { RecipeBuilder } from '../components/recipe-builder';

/** Lazily loaded (drag and drop comes with it). Keyed by version, so another version starts afresh. */
export function RecipeBuilderPage() {
  const params = useParams();
  const recipeId = Number(params.recipeId);
  const versionId = Number(params.versionId);
  return <RecipeBuilder key={versionId} recipeId={recipeId} versionId={versionId} />;
}
