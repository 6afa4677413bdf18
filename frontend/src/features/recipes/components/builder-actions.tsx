import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';

export type BuilderActionsProps = {
  mode: 'author' | 'review' | 'released' | 'read-only';
  isDirty: boolean;
  pending: { save: boolean; submit: boolean; newVersion: boolean };
  onSave: () => void;
  onSubmit: () => void;
  onRelease: () => void;
  onSendBack: () => void;
  onNewVersion: () => void;
};

/** The header's buttons: what this person can do with this version in its state. */
export function BuilderActions({ mode, isDirty, pending, onSave, onSubmit, onRelease, onSendBack, onNewVersion }: BuilderActionsProps) {
  if (mode === 'author') {
    return (
      <div className="flex flex-wrap items-center gap-2">
        <Button variant={isDirty ? 'primary' : 'secondary'} isPending={pending.save} pendingLabel="Saving…" onClick={onSave}>
          Save
        </Button>
        <Button variant={isDirty ? 'secondary' : 'primary'} isPending={pending.submit} pendingLabel="Sending…" onClick={onSubmit}>
          Send for review
        </Button>
      </div>
    );
  }
  if (mode === 'review') {
    return (
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={onRelease}>
          <Icon name="check" />
          Release
        </Button>
        <Button variant="secondary" onClick={onSendBack}>
          Send back
        </Button>
      </div>
    );
  }
  if (mode === 'released') {
    return (
      <Button isPending={pending.newVersion} pendingLabel="Starting…" onClick={onNewVersion}>
        <Icon name="plus" />
        New version
      </Button>
    );
  }
  return null;
}
