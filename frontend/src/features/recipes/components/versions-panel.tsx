import { useState } from 'react';

import type { RecipeDetail } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { LoadingState } from '../../../components/ui/loading-state';
import { SelectField } from '../../../components/ui/select-field';
import { useVersionDiff } from '../hooks/use-version-diff';
import { VersionDiffView } from './version-diff-view';
import { VersionHistory } from './version-history';

type VersionsPanelProps = { recipe: RecipeDetail; currentVersionId: number; hasUnsavedEdits: boolean };

/** History of the recipe's versions, and any two of them compared side by side. */
export function VersionsPanel({ recipe, currentVersionId, hasUnsavedEdits }: VersionsPanelProps) {
  const versions = recipe.versions;
  const currentIndex = versions.findIndex((v) => v.id === currentVersionId);
  // By default: the version open here against the one before it (the list is newest first).
  const [fromId, setFromId] = useState<number | null>(versions[currentIndex + 1]?.id ?? null);
  const [toId, setToId] = useState<number | null>(currentVersionId);
  const { loaded, isLoading, error } = useVersionDiff(fromId, toId);
  const options = versions.map((v) => (
    <option key={v.id} value={v.id}>
      Version {v.number}
    </option>
  ));

  return (
    <section aria-labelledby="versions-title" className="flex flex-col gap-4">
      <h2 id="versions-title" className="text-lg font-bold">
        Versions
      </h2>
      <VersionHistory recipe={recipe} currentVersionId={currentVersionId} />
      {versions.length < 2 ? (
        <p className="text-graphite-600">Once there is a second version, you can compare them here.</p>
      ) : (
        <>
          <h3 className="font-bold">Compare two versions</h3>
          <p className="text-sm text-graphite-600">{hasUnsavedEdits ? 'This compares saved versions; save to include your latest edits.' : 'This compares saved versions.'}</p>
          <div className="grid max-w-xl gap-4 sm:grid-cols-2">
            <SelectField label="Earlier version" value={fromId ?? ''} onChange={(e) => setFromId(e.target.value ? Number(e.target.value) : null)}>
              <option value="">Pick a version</option>
              {options}
            </SelectField>
            <SelectField label="Later version" value={toId ?? ''} onChange={(e) => setToId(e.target.value ? Number(e.target.value) : null)}>
              <option value="">Pick a version</option>
              {options}
            </SelectField>
          </div>
          {error ? <FormError message={error.message} /> : null}
          {isLoading ? <LoadingState label="Loading the two versions…" /> : null}
          {loaded && fromId !== toId ? <VersionDiffView loaded={loaded} /> : null}
          {fromId !== null && fromId === toId ? <p className="text-graphite-600">Pick two different versions.</p> : null}
        </>
      )}
    </section>
  );
}
