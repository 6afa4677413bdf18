import { SelectField } from '../../../components/ui/select-field';
import type { ReleasedRecipe } from '../api/get-released-recipes';

type VersionPickerProps = { recipes: ReleasedRecipe[]; versionId: number | null; onPick: (versionId: number | null) => void };

/** Picks what to make: each recipe offers its released version, the only one that can run. */
export function VersionPicker({ recipes, versionId, onPick }: VersionPickerProps) {
  return (
    <SelectField
      label="Recipe and version"
      help="Only released versions can be run. Lots and machines below follow the version you pick."
      value={versionId === null ? '' : String(versionId)}
      onChange={(event) => onPick(event.target.value === '' ? null : Number(event.target.value))}
    >
      <option value="">Choose a recipe…</option>
      {recipes.map((recipe) => (
        <option key={recipe.id} value={recipe.releasedVersion.id}>
          {recipe.code} · {recipe.name} · version {recipe.releasedVersion.number}
        </option>
      ))}
    </SelectField>
  );
}
