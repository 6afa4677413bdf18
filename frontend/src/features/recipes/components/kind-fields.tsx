import type { ReactNode } from 'react';

import type { StepKind } from '@tracewright/shared';

import { AttachPartsFields } from './attach-parts-fields';
import { CureFields } from './cure-fields';
import { DryFields } from './dry-fields';
import { InspectFields } from './inspect-fields';
import { PrintPassFields } from './print-pass-fields';
import type { KindFieldsProps } from './step-fields-context';
import { SurfaceTreatmentFields } from './surface-treatment-fields';
import { TransferFields } from './transfer-fields';

const FIELDS: Record<StepKind, (props: KindFieldsProps) => ReactNode> = {
  'surface-treatment': SurfaceTreatmentFields,
  'print-pass': PrintPassFields,
  dry: DryFields,
  cure: CureFields,
  transfer: TransferFields,
  'attach-parts': AttachPartsFields,
  inspect: InspectFields,
};

/** The settings of the step's own kind, from that kind's params schema. */
export function KindFields({ kind, ...props }: KindFieldsProps & { kind: StepKind }) {
  const Fields = FIELDS[kind];
  return (
    <section aria-labelledby="kind-fields-title" className="flex flex-col gap-4">
      <h3 id="kind-fields-title" className="text-base font-bold text-graphite-800">
        Settings
      </h3>
      <Fields {...props} />
    </section>
  );
}
