import { useId, useState } from 'react';
import { useNavigate } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../lib/session';
import { useRecipes } from '../api/get-recipes';
import { NewRecipeForm } from '../components/new-recipe-form';
import { RecipeTable } from '../components/recipe-table';
import { canAuthor } from '../recipe-roles';
import { recipeVersionPath } from '../utils/recipe-paths';

export function RecipesPage() {
  const recipes = useRecipes();
  const { user } = useSession();
  const navigate = useNavigate();
  const [isCreating, setIsCreating] = useState(false);
  const panelId = useId();
  const mayCreate = canAuthor(user.role);

  return (
    <>
      <PageHeader
        title="Recipes"
        description="Each recipe is one product's process, step by step. Operators run the released version."
        actions={
          mayCreate ? (
            <Button aria-expanded={isCreating} aria-controls={panelId} onClick={() => setIsCreating((v) => !v)}>
              <Icon name="plus" />
              New recipe
            </Button>
          ) : null
        }
      />
      <div id={panelId}>
        {isCreating ? (
          <div className="mb-8 rounded-md border border-graphite-300 bg-white p-5">
            <NewRecipeForm
              onCancel={() => setIsCreating(false)}
              onCreated={(recipe) => {
                const first = recipe.versions[0];
                navigate(first ? recipeVersionPath(recipe.id, first.id) : '/recipes');
              }}
            />
          </div>
        ) : null}
      </div>
      {recipes.length === 0 ? (
        <Notice title="No recipes yet">
          <p>{mayCreate ? 'Start one with “New recipe”: it opens as a draft you build step by step.' : 'Engineers write recipes; they will appear here.'}</p>
        </Notice>
      ) : (
        <RecipeTable recipes={recipes} />
      )}
    </>
  );
}
