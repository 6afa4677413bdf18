import { z } from 'zod';

import { EQUIPMENT_KINDS, IsoDateSchema, PlanRunInputSchema } from '@tracewright/shared';

import type { PlanFormValues } from './plan-form-values';
import { reasonProblems, type SlotIssues } from './plan-issues';

const LotSlotSchema = z.object({
  materialType: z.enum(['ink', 'substrate']),
  materialId: z.number(),
  lotId: z.string().min(1, 'Pick the lot you will use.'),
  reason: z.string(),
});

const MachineSlotSchema = z.object({
  kind: z.enum(EQUIPMENT_KINDS.filter((k) => k !== 'instrument') as ['printer', 'heat-source', 'surface-treater']),
  versionMachineId: z.number(),
  id: z.string().min(1, 'Pick the machine you will use.'),
  reason: z.string(),
});

const InstrumentSlotSchema = z.object({ id: z.number(), chosen: z.boolean(), reason: z.string() });

/**
 * The plan form's schema: the API's own rules for quantity, due date and notes, plus a reason
 * wherever the run rules ask for one. `issuesOf` answers what the rules say about the choices.
 */
export function planFormSchema(issuesOf: (values: Pick<PlanFormValues, 'lots' | 'machines' | 'instruments'>) => SlotIssues) {
  return z
    .object({
      quantity: z.string().trim().min(1, 'Enter how many pieces to make.').transform(Number).pipe(PlanRunInputSchema.shape.quantity),
      dueOn: z.union([z.literal(''), IsoDateSchema]),
      notes: PlanRunInputSchema.shape.notes,
      lots: z.array(LotSlotSchema),
      machines: z.array(MachineSlotSchema),
      instruments: z.array(InstrumentSlotSchema),
    })
    .superRefine(
      (values, ctx) => {
        for (const { path, message } of reasonProblems(values, issuesOf(values))) ctx.addIssue({ code: 'custom', path, message });
      },
      // Reasons are checked even while another field is wrong, so every problem shows at once.
      { when: () => true },
    );
}

export type PlanFormOutput = z.output<ReturnType<typeof planFormSchema>>;
