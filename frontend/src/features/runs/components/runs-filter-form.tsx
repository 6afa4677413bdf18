import { useState } from 'react';
import { useNavigate } from 'react-router';

import { RUN_STATES, RunStateSchema } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import type { RunListFilters } from '../api/run-keys';
import { searchFor } from '../utils/run-list-filters';
import { RUN_STATE_LOOK } from '../utils/run-state-look';

/** A new state shows at once; typed text waits for Enter or the button, so the list does not jump per key. */
export function RunsFilterForm({ filters }: { filters: RunListFilters }) {
  const navigate = useNavigate();
  const [q, setQ] = useState(filters.q);
  // The address can change under the form (back button, a link): take its text then, keeping focus.
  const [shownQ, setShownQ] = useState(filters.q);
  if (shownQ !== filters.q) {
    setShownQ(filters.q);
    setQ(filters.q);
  }
  const show = (state: RunListFilters['state'], text: string) => navigate({ search: searchFor({ state, q: text.trim(), page: 1 }) });

  return (
    <form
      role="search"
      aria-label="Filter runs"
      className="mb-4 flex flex-wrap items-end gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        show(filters.state, q);
      }}
    >
      <SelectField
        label="State"
        className="w-48"
        value={filters.state}
        onChange={(event) => {
          const state = RunStateSchema.safeParse(event.target.value);
          show(state.success ? state.data : '', q);
        }}
      >
        <option value="">All states</option>
        {RUN_STATES.map((state) => (
          <option key={state} value={state}>
            {RUN_STATE_LOOK[state].label}
          </option>
        ))}
      </SelectField>
      <TextField label="Run or recipe" type="search" maxLength={100} className="w-72" value={q} onChange={(event) => setQ(event.target.value)} />
      <Button type="submit" variant="secondary">
        Show runs
      </Button>
    </form>
  );
}
