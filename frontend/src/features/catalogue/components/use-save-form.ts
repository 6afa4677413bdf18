import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { useNavigate } from 'react-router';

import { useToast } from '../../../components/ui/use-toast';
import { CATALOGUE_RESOURCES, type CatalogueInputs, type CatalogueKind } from '../api/catalogue-resources';
import { useSaveRecord } from '../api/save-record';
import { applySaveError } from '../utils/save-error';

type Existing = { id: number; version: number } | undefined;

/**
 * Saves a catalogue form (create, or update naming the version shown), then opens the saved
 * record. On failure the form keeps every value and shows where the problem is.
 */
export function useSaveForm<K extends CatalogueKind, T extends FieldValues>(kind: K, existing: Existing, basePath: string) {
  const save = useSaveRecord(kind);
  const navigate = useNavigate();
  const toast = useToast();
  const noun = CATALOGUE_RESOURCES[kind].noun;

  const submit = (input: CatalogueInputs[K], setError: UseFormSetError<T>, fields: readonly Path<T>[]) =>
    save.mutate(
      { input, id: existing?.id, version: existing?.version },
      {
        onSuccess: (saved) => {
          toast.show(`${noun.charAt(0).toUpperCase()}${noun.slice(1)} saved.`);
          navigate(`${basePath}/${saved.id}`);
        },
        onError: (error) => applySaveError(error, setError, fields, noun),
      },
    );
  return { submit, isPending: save.isPending };
}
