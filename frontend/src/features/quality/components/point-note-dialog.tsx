import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { TrendPointNoteInputSchema, type Trend } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { useToast } from '../../../components/ui/use-toast';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useNoteTrendPoint } from '../api/note-trend-point';
import { valueText } from '../utils/trend-text';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { DialogActions } from '../../../components/ui/dialog-actions';
import { TextAreaField } from '../../../components/ui/text-area-field';

export type PointNoteMode = 'exclude' | 'include' | 'annotate';
type Point = Trend['points'][number];

const ReasonSchema = TrendPointNoteInputSchema.pick({ reason: true });
const WORDS: Record<PointNoteMode, { title: string; action: string; help: string }> = {
  exclude: { title: 'Exclude point', action: 'Exclude point', help: 'Why this reading must not count toward the limits (a known cause, a faulty meter…).' },
  include: { title: 'Include point again', action: 'Include point', help: 'Why this reading counts again.' },
  annotate: { title: 'Add a note to point', action: 'Save note', help: 'What a reader of this chart should know about this reading.' },
};

type PointNoteDialogProps = { point: Point; position: number; unit: string; mode: PointNoteMode; onClose: () => void };

/** Excluding, including or annotating a point always carries a reason, kept with the point. */
export function PointNoteDialog({ point, position, unit, mode, onClose }: PointNoteDialogProps) {
  const note = useNoteTrendPoint();
  const toast = useToast();
  const words = WORDS[mode];
  const { register, handleSubmit, setError, formState } = useForm({ resolver: zodResolver(ReasonSchema), defaultValues: { reason: '' } });
  const { errors } = formState;

  const onSubmit = handleSubmit(({ reason }) => {
    const excluded = mode === 'annotate' ? point.excluded : mode === 'exclude';
    note.mutate(
      { readingId: point.readingId, excluded, reason },
      {
        onSuccess: () => {
          toast.show(`Point ${position}: ${words.action.toLowerCase()} done.`);
          onClose();
        },
        onError: (error) => applyApiErrorToForm(error, setError, ['reason']),
      },
    );
  });

  return (
    <ModalDialog title={`${words.title} ${position}`} onClose={onClose}>
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <p>
          Run {point.runCode}
          {point.pieceCode ? `, piece ${point.pieceCode}` : ''}: <span className="font-bold tabular">{valueText(point.value, unit)}</span>
        </p>
        <FormError message={errors.root?.server?.message} />
        <TextAreaField label="Reason" rows={3} help={words.help} error={errors.reason?.message} {...register('reason')} />
        <DialogActions isPending={note.isPending} pendingLabel="Saving…" onCancel={onClose}>
          {words.action}
        </DialogActions>
      </form>
    </ModalDialog>
  );
}
