import { useState } from 'react';
import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';
import { useToast } from '../../../components/ui/use-toast';
import { isApiError } from '../../../lib/api-error';
import { CATALOGUE_RESOURCES, type CatalogueKind } from '../api/catalogue-resources';
import { useSetArchived } from '../api/set-archived';
import { useCanEditCatalogue } from '../utils/catalogue-editors';
import { conflictMessage } from '../utils/save-error';
import { ArchiveConfirm } from './archive-confirm';

type RecordActionsProps = { kind: CatalogueKind; record: { id: number; version: number; archived: boolean }; name: string; editPath: string };

/** Edit, archive and restore, for the roles that keep the catalogue; nothing for anyone else. */
export function RecordActions({ kind, record, name, editPath }: RecordActionsProps) {
  const canEdit = useCanEditCatalogue();
  const [isAsking, setIsAsking] = useState(false);
  const setArchived = useSetArchived(kind);
  const toast = useToast();
  const noun = CATALOGUE_RESOURCES[kind].noun;
  if (!canEdit) return null;

  const archive = !record.archived;
  const confirm = () =>
    setArchived.mutate(
      { id: record.id, archived: archive, version: record.version },
      {
        onSuccess: () => {
          setIsAsking(false);
          toast.show(archive ? `${name} is archived.` : `${name} is back in use.`);
        },
        onError: (error) => toast.show(isApiError(error, 409) ? conflictMessage(noun) : `Not changed: ${error.message}`, 'blocked'),
      },
    );

  if (isAsking) {
    const question = archive
      ? `Archive ${name}? It leaves the lists and cannot be picked for new work; its records and history stay, and it can be restored.`
      : `Restore ${name}? It returns to the lists and can be picked again.`;
    return (
      <ArchiveConfirm
        question={question}
        confirmLabel={archive ? 'Yes, archive' : 'Yes, restore'}
        isPending={setArchived.isPending}
        onConfirm={confirm}
        onCancel={() => setIsAsking(false)}
      />
    );
  }
  return (
    <div className="flex flex-wrap gap-2">
      {record.archived ? null : (
        <Link to={editPath} className={buttonClasses('primary')}>
          <Icon name="pencil" />
          Edit
        </Link>
      )}
      <Button variant="secondary" onClick={() => setIsAsking(true)}>
        <Icon name={archive ? 'archive' : 'refresh'} />
        {archive ? 'Archive' : 'Restore'}
      </Button>
    </div>
  );
}
