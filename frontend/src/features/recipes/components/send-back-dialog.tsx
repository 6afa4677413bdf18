import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { SendBackInputSchema, type RecipeVersionView } from '@tracewright/shared';

import { FormError } from '../../../components/ui/form-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useSendBackVersion } from '../api/send-back-version';
import { ModalDialog } from '../../../components/ui/modal-dialog';
import { DialogActions } from '../../../components/ui/dialog-actions';
import { TextAreaField } from '../../../components/ui/text-area-field';

type SendBackDialogProps = { view: RecipeVersionView; onSentBack: () => void; onClose: () => void };

/** Returns a version to its author as a draft, with what needs to change. */
export function SendBackDialog({ view, onSentBack, onClose }: SendBackDialogProps) {
  const sendBack = useSendBackVersion();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(SendBackInputSchema), defaultValues: { comment: '' } });

  const onSubmit = handleSubmit((input) =>
    sendBack.mutate({ versionId: view.id, input }, { onSuccess: onSentBack, onError: (error) => applyApiErrorToForm(error, setError, ['comment']) }),
  );

  return (
    <ModalDialog title={`Send version ${view.number} back to ${view.author.name}`} onClose={onClose}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        <FormError message={errors.root?.server?.message} />
        <TextAreaField label="What needs to change" rows={5} help="The author sees this on the draft and by e-mail." error={errors.comment?.message} {...register('comment')} />
        <DialogActions isPending={sendBack.isPending} pendingLabel="Sending…" onCancel={onClose}>
          Send back
        </DialogActions>
      </form>
    </ModalDialog>
  );
}
