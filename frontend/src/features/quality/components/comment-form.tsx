import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { CommentInputSchema } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { useToast } from '../../../components/ui/use-toast';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useAddComment } from '../api/add-comment';
import { DetailSection } from './detail-section';

/** A note for the record; it joins the history with the writer's name and the time. */
export function CommentForm({ deviationId }: { deviationId: number }) {
  const comment = useAddComment();
  const toast = useToast();
  const { register, handleSubmit, setError, reset, formState } = useForm({ resolver: zodResolver(CommentInputSchema), defaultValues: { text: '' } });
  const { errors } = formState;

  const onSubmit = handleSubmit(({ text }) =>
    comment.mutate(
      { id: deviationId, text },
      {
        onSuccess: () => {
          reset();
          toast.show('Comment added to the history.');
        },
        onError: (error) => applyApiErrorToForm(error, setError, ['text']),
      },
    ),
  );

  return (
    <DetailSection title="Add a comment">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <FormError message={errors.root?.server?.message} />
        <TextAreaField label="Comment" rows={3} error={errors.text?.message} {...register('text')} />
        <div>
          <Button type="submit" variant="secondary" isPending={comment.isPending} pendingLabel="Adding…">
            Add comment
          </Button>
        </div>
      </form>
    </DetailSection>
  );
}
