import type { Blocker } from 'react-router';

import { Button } from '../../../components/ui/button';
import { ModalDialog } from '../../../components/ui/modal-dialog';

/** Asked when someone leaves the builder with unsaved edits. */
export function LeaveConfirm({ blocker }: { blocker: Blocker }) {
  if (blocker.state !== 'blocked') return null;
  return (
    <ModalDialog title="Leave without saving?" onClose={() => blocker.reset()}>
      <p className="mb-4">Your edits to this version are not saved yet. If you leave now, they are lost.</p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => blocker.reset()}>Stay and keep editing</Button>
        <Button variant="secondary" onClick={() => blocker.proceed()}>
          Leave without saving
        </Button>
      </div>
    </ModalDialog>
  );
}
