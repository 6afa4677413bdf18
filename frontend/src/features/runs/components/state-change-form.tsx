import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { RunStateChangeSchema } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useToast } from '../../../components/ui/use-toast';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useChangeRunState } from '../api/change-run-state';
import { ACTION_WORDS } from '../utils/run-action-words';
import type { RunAction } from '../utils/run-actions';

type StateChangeFormProps = { runId: number; runCode: string; action: RunAction; onClose: () => void };

export function StateChangeForm({ runId, runCode, action, onClose }: StateChangeFormProps) {
  const change = useChangeRunState();
  const toast = useToast();
  const words = ACTION_WORDS[action];
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(RunStateChangeSchema), defaultValues: { reason: '' } });

  const onSubmit = handleSubmit(({ reason }) =>
    change.mutate(
      { runId, action, reason },
      {
        onSuccess: () => {
          toast.show(words.done(runCode));
          onClose();
        },
        onError: (error) => applyApiErrorToForm(error, setError, ['reason']),
      },
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label={words.confirm} className="flex max-w-xl flex-col gap-4 rounded-md border-2 border-graphite-500 bg-white p-4">
      <FormError message={errors.root?.server?.message} />
      <TextAreaField label="Reason" help={words.help} autoFocus error={errors.reason?.message} {...register('reason')} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant={action === 'cancel' ? 'danger' : 'primary'} isPending={change.isPending} pendingLabel="Saving…">
          {words.confirm}
        </Button>
        <Button variant="secondary" onClick={onClose}>
          Keep as it is
        </Button>
      </div>
    </form>
  );
}
