import { useNavigate } from 'react-router';

import { SelectField } from '../../../components/ui/select-field';
import type { TrendSpecOption } from '../api/get-trend-specs';
import { trendSearchFor, type TrendChoice } from '../utils/trend-search';

const keyOf = (recipeId: number, specId: string) => `${recipeId}|${specId}`;

/** Pick a recipe's reading spec; the choice goes to the address and the trend follows. */
export function SpecPicker({ specs, choice }: { specs: TrendSpecOption[]; choice: TrendChoice }) {
  const navigate = useNavigate();
  const recipes = [...new Set(specs.map((s) => s.recipeCode))];
  return (
    <SelectField
      label="Reading spec"
      help="Each recipe's readings, with how many points each has."
      className="mb-6 max-w-xl print:hidden"
      value={choice ? keyOf(choice.recipeId, choice.specId) : ''}
      onChange={(event) => {
        const spec = specs.find((s) => keyOf(s.recipeId, s.specId) === event.target.value);
        void navigate({ search: trendSearchFor(spec ? { recipeId: spec.recipeId, specId: spec.specId } : null) });
      }}
    >
      <option value="">Choose a reading spec</option>
      {recipes.map((code) => (
        <optgroup key={code} label={code}>
          {specs
            .filter((s) => s.recipeCode === code)
            .map((s) => (
              <option key={keyOf(s.recipeId, s.specId)} value={keyOf(s.recipeId, s.specId)}>
                {s.name} ({s.unit}) · {s.points} points
              </option>
            ))}
        </optgroup>
      ))}
    </SelectField>
  );
}
