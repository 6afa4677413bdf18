import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';

import type { RecipeStep } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { writeDrafts } from '../utils/write-drafts';
import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';
import { PhotoPicker } from './photo-picker';
import { ReportProblemFormSchema, SEVERITY_CHOICES } from './report-problem-schema';

type ReportProblemDialogProps = { step: RecipeStep | null; onClose: () => void };

/**
 * Reporting a problem: what happened, how bad, which pieces, and photos from the camera. It
 * goes through the outbox like every write, photos first, so it works with no network too.
 */
export function ReportProblemDialog({ step, onClose }: ReportProblemDialogProps) {
  const { run, record } = useBench();
  const [photos, setPhotos] = useState<File[]>([]);
  const { register, handleSubmit, formState } = useForm({
    resolver: zodResolver(ReportProblemFormSchema),
    defaultValues: { description: '', severity: 'minor' as const, aboutStep: step !== null, pieceIds: [] as string[] },
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (form) => {
    const stepId = form.aboutStep && step ? step.id : null;
    const uploads = [];
    for (const photo of photos) {
      const upload = await record(writeDrafts.uploadPhoto(run.id, stepId, photo));
      if (!upload) return;
      uploads.push(upload.id);
    }
    const fields = { stepId, pieceIds: form.pieceIds.map(Number), description: form.description, severity: form.severity };
    if (await record(writeDrafts.reportProblem(run.id, fields, uploads))) onClose();
  });

  return (
    <BenchDialog title="Report a problem" onClose={onClose} wide>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
        <label className="flex flex-col gap-1 font-bold">
          What happened?
          <textarea {...register('description')} rows={4} aria-invalid={errors.description ? true : undefined} aria-describedby={errors.description ? 'problem-description-error' : undefined} className="min-h-32 rounded-lg border-2 border-graphite-500 p-3 font-normal" />
        </label>
        {errors.description ? (
          <p id="problem-description-error" className="font-bold text-oxide-700">
            {errors.description.message}
          </p>
        ) : null}
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 font-bold">How bad is it?</legend>
          {SEVERITY_CHOICES.map((choice) => (
            <label key={choice.value} className="flex min-h-14 items-center gap-3 rounded-lg border-2 border-graphite-300 px-3 has-checked:border-copper-600 has-checked:bg-copper-50">
              <input type="radio" value={choice.value} {...register('severity')} className="size-6 accent-copper-600" />
              <span>
                <span className="font-bold">{choice.label}</span> — {choice.help}
              </span>
            </label>
          ))}
        </fieldset>
        {step ? (
          <label className="flex min-h-14 items-center gap-3">
            <input type="checkbox" {...register('aboutStep')} className="size-6 accent-copper-600" />
            About this step: {step.title}
          </label>
        ) : null}
        {run.pieces.length > 0 ? (
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-bold">Which pieces? (none ticked: the whole run)</legend>
            <div className="flex flex-wrap gap-2">
              {run.pieces.map((piece) => (
                <label key={piece.id} className="flex min-h-12 items-center gap-2 rounded-lg border-2 border-graphite-300 px-3 has-checked:border-copper-600 has-checked:bg-copper-50">
                  <input type="checkbox" value={String(piece.id)} {...register('pieceIds')} className="size-6 accent-copper-600" />
                  {piece.code}
                </label>
              ))}
            </div>
          </fieldset>
        ) : null}
        <PhotoPicker photos={photos} onChange={setPhotos} />
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" className={benchButton('secondary')} onClick={onClose}>
            Cancel
          </button>
          <button type="submit" className={benchButton('danger')} disabled={isSubmitting}>
            Report the problem
          </button>
        </div>
      </form>
    </BenchDialog>
  );
}
