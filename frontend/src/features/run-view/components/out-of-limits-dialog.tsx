import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';

type OutOfLimitsDialogProps = { message: string; onConfirm: () => void; onClose: () => void; closeLabel?: string };

/** Asks before an out-of-limit value is recorded; recording it raises a deviation for quality. */
export function OutOfLimitsDialog({ message, onConfirm, onClose, closeLabel = 'Check the value again' }: OutOfLimitsDialogProps) {
  return (
    <BenchDialog title="This reading is out of limits" onClose={onClose} tone="warning">
      <div className="flex flex-col gap-4">
        <p>{message}</p>
        <p className="font-bold">Measure again if you can. If the value is right, record it: a deviation is raised for quality to review.</p>
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" className={benchButton('secondary')} onClick={onClose} data-autofocus>
            {closeLabel}
          </button>
          <button type="button" className={benchButton('danger')} onClick={onConfirm}>
            Record anyway
          </button>
        </div>
      </div>
    </BenchDialog>
  );
}
