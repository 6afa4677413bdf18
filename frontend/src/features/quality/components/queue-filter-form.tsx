import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';

import { STEP_KIND_LABELS, STEP_KINDS, type DeviationQuery } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { recipeOptionsQueryOptions, runOptionsQueryOptions } from '../api/get-filter-options';
import { peopleQueryOptions } from '../api/get-people';
import { useLatestQuery } from '../hooks/use-latest-query';
import { deviationSearchFor } from '../utils/deviation-search';
import { filterValuesOf, queryFromValues, type QueueFilterValues } from '../utils/queue-filter-values';
import { OptionSelect } from './option-select';

const SORTS = [
  { value: 'newest', label: 'Newest first' },
  { value: 'oldest', label: 'Oldest first' },
  { value: 'severity', label: 'Most severe first' },
];

/** Filters apply with the button (or Enter), so the list does not jump while several are set. */
export function QueueFilterForm({ query }: { query: DeviationQuery }) {
  const navigate = useNavigate();
  const latest = useLatestQuery(query);
  const recipes = useQuery(recipeOptionsQueryOptions());
  const runs = useQuery(runOptionsQueryOptions());
  const operators = useQuery(peopleQueryOptions('operators'));
  const fromAddress = filterValuesOf(query);
  const [values, setValues] = useState(fromAddress);
  // The address can change under the form (back button, a chip): take its values then.
  const [shown, setShown] = useState(fromAddress);
  if (JSON.stringify(shown) !== JSON.stringify(fromAddress)) {
    setShown(fromAddress);
    setValues(fromAddress);
  }
  const field = (name: keyof QueueFilterValues) => ({
    name,
    value: values[name],
    onChange: (event: { target: { value: string } }) => setValues((v) => ({ ...v, [name]: event.target.value })),
  });

  return (
    <form
      role="search"
      aria-label="Filter deviations"
      className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-4"
      onSubmit={(event) => {
        event.preventDefault();
        void navigate({ search: deviationSearchFor(queryFromValues(latest, values)) });
      }}
    >
      <OptionSelect label="Recipe" anyLabel="Any recipe" options={recipes.data} isUnavailable={recipes.isError} {...field('recipeId')} />
      <OptionSelect label="Run" anyLabel="Any run" options={runs.data} isUnavailable={runs.isError} help="The 100 latest runs." {...field('runId')} />
      <SelectField label="Step kind" {...field('stepKind')}>
        <option value="">Any step kind</option>
        {STEP_KINDS.map((kind) => (
          <option key={kind} value={kind}>
            {STEP_KIND_LABELS[kind]}
          </option>
        ))}
      </SelectField>
      <OptionSelect
        label="Operator"
        anyLabel="Any operator"
        options={operators.data?.map((p) => ({ id: p.id, label: p.name }))}
        isUnavailable={operators.isError}
        {...field('operatorId')}
      />
      <TextField label="Raised from" type="date" {...field('from')} />
      <TextField label="Raised to" type="date" {...field('to')} />
      <TextField label="Search text" type="search" maxLength={100} help="Title, run or recipe code." {...field('q')} />
      <SelectField label="Sort" {...field('sort')}>
        {SORTS.map((s) => (
          <option key={s.value} value={s.value}>
            {s.label}
          </option>
        ))}
      </SelectField>
      <div className="flex flex-wrap items-center gap-4 sm:col-span-2 lg:col-span-4">
        <Button type="submit">Show deviations</Button>
        <TextLink to="/deviations">Clear all filters</TextLink>
      </div>
    </form>
  );
}
