import { z } from 'zod';

import { DispositionInputSchema, DispositionSchema } from '@tracewright/shared';

import type { DispositionBody } from '../api/disposition-deviation';

// The shared corrective action, less the owner: a select holds '' until someone is chosen.
const CorrectiveActionTextSchema = DispositionInputSchema.shape.correctiveAction.unwrap().unwrap().pick({ note: true, dueOn: true });

/**
 * The disposition form as it is typed: the shared input's fields, with the choices a form holds
 * as text. The password is asked for afterwards, in the signature dialog.
 */
export const DispositionFormSchema = z
  .object({
    disposition: z.string().min(1, 'Choose what happens to the pieces.').pipe(DispositionSchema),
    rationale: DispositionInputSchema.shape.rationale,
    pieceIds: z.array(z.string()),
    reworkStepIds: z.array(z.string()),
    hasCorrectiveAction: z.boolean(),
    correctiveAction: z.object({ note: z.string(), ownerId: z.string(), dueOn: z.string() }),
  })
  .superRefine((values, ctx) => {
    if (!values.hasCorrectiveAction) return;
    const text = CorrectiveActionTextSchema.safeParse(values.correctiveAction);
    for (const issue of text.error?.issues ?? []) {
      ctx.addIssue({ code: 'custom', path: ['correctiveAction', ...issue.path.map(String)], message: issue.message });
    }
    if (values.correctiveAction.ownerId === '') {
      ctx.addIssue({ code: 'custom', path: ['correctiveAction', 'ownerId'], message: 'Choose who owns the corrective action.' });
    }
  });
export type DispositionFormValues = z.input<typeof DispositionFormSchema>;
export type DispositionFormOutput = z.output<typeof DispositionFormSchema>;

export const EMPTY_DISPOSITION_FORM: DispositionFormValues = {
  disposition: '',
  rationale: '',
  pieceIds: [],
  reworkStepIds: [],
  hasCorrectiveAction: false,
  correctiveAction: { note: '', ownerId: '', dueOn: '' },
};

/** The request body: the form's decision, the password typed in the dialog, the hash reviewed. */
export function dispositionBody(values: DispositionFormOutput, password: string, contentHash: string): DispositionBody {
  const { note, ownerId, dueOn } = values.correctiveAction;
  return {
    password,
    contentHash,
    disposition: values.disposition,
    rationale: values.rationale,
    pieceIds: values.pieceIds.map(Number),
    reworkStepIds: values.disposition === 'rework' ? values.reworkStepIds : [],
    correctiveAction: values.hasCorrectiveAction ? { note: note.trim(), ownerId: Number(ownerId), dueOn } : null,
  };
}
