import type { ReactNode } from 'react';

import { Button } from './button';

/** A dialog form's two buttons: the one that submits (saying what it does while pending) and Cancel. */
export function DialogActions({ children, pendingLabel, isPending, onCancel }: { children: ReactNode; pendingLabel: string; isPending: boolean; onCancel: () => void }) {
  return (
    <div className="flex flex-wrap gap-3">
      <Button type="submit" isPending={isPending} pendingLabel={pendingLabel}>
        {children}
      </Button>
      <Button variant="secondary" onClick={onCancel}>
        Cancel
      </Button>
    </div>
  );
}
