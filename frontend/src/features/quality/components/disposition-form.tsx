import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';

import type { DeviationDetail } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import type { ApiError } from '../../../lib/api-error';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { DispositionFormSchema, EMPTY_DISPOSITION_FORM, type DispositionFormOutput, type DispositionFormValues } from '../utils/disposition-form-schema';
import { ChoiceBox } from './choice-box';
import { CorrectiveActionFields } from './corrective-action-fields';
import { DetailSection } from './detail-section';
import { DispositionChoice } from './disposition-choice';
import { DispositionSignDialog } from './disposition-sign-dialog';
import { PiecePicker } from './piece-picker';
import { ReworkStepPicker } from './rework-step-picker';

const SERVER_FIELDS = ['disposition', 'rationale', 'pieceIds', 'reworkStepIds'] as const;

/** Decide what happens to the pieces; the decision is signed in a dialog before it is sent. */
export function DispositionForm({ deviation }: { deviation: DeviationDetail }) {
  const decided = new Set(deviation.dispositions.flatMap((d) => d.pieceIds));
  const defaults: DispositionFormValues = {
    ...EMPTY_DISPOSITION_FORM,
    pieceIds: deviation.pieces.filter((p) => !decided.has(p.id)).map((p) => String(p.id)),
  };
  const { register, handleSubmit, watch, reset, setError, formState } = useForm<DispositionFormValues, unknown, DispositionFormOutput>({
    resolver: zodResolver(DispositionFormSchema),
    defaultValues: defaults,
  });
  const { errors } = formState;
  const [toSign, setToSign] = useState<DispositionFormOutput | null>(null);

  // A 400 from the server about the decision itself belongs under the form's fields, not the dialog.
  const onInvalid = (error: ApiError) => {
    setToSign(null);
    applyApiErrorToForm(error, setError, SERVER_FIELDS);
    return true;
  };

  return (
    <DetailSection title="Disposition">
      <form noValidate onSubmit={handleSubmit(setToSign)} className="flex max-w-2xl flex-col gap-5 rounded-md border-2 border-graphite-300 bg-white p-4">
        <FormError message={errors.root?.server?.message} />
        <DispositionChoice registration={register('disposition')} error={errors.disposition?.message} />
        <PiecePicker deviation={deviation} registration={register('pieceIds')} error={errors.pieceIds?.message} />
        {watch('disposition') === 'rework' ? <ReworkStepPicker runId={deviation.run.id} registration={register('reworkStepIds')} error={errors.reworkStepIds?.message} /> : null}
        <TextAreaField label="Rationale" rows={4} help="Why this decision is right for these pieces; at least 10 characters." error={errors.rationale?.message} {...register('rationale')} />
        <ChoiceBox type="checkbox" {...register('hasCorrectiveAction')}>
          Add a corrective action
        </ChoiceBox>
        {watch('hasCorrectiveAction') ? <CorrectiveActionFields register={register} errors={errors.correctiveAction} /> : null}
        <div>
          <Button type="submit">Sign disposition…</Button>
        </div>
      </form>
      {toSign ? (
        <DispositionSignDialog
          deviation={deviation}
          values={toSign}
          onClose={() => setToSign(null)}
          onInvalid={onInvalid}
          onSigned={() => {
            setToSign(null);
            reset(EMPTY_DISPOSITION_FORM);
          }}
        />
      ) : null}
    </DetailSection>
  );
}
