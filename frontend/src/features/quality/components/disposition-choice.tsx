import type { UseFormRegisterReturn } from 'react-hook-form';

import { DISPOSITION_LABELS, DISPOSITIONS } from '@tracewright/shared';

import { ChoiceBox } from './choice-box';
import { ChoiceFieldset } from './choice-fieldset';

const HELP: Record<(typeof DISPOSITIONS)[number], string> = {
  'use-as-is': 'the pieces go on unchanged',
  rework: 'the pieces repeat chosen steps in a linked rework run',
  scrap: 'the pieces are discarded',
  'return-to-supplier': 'the material goes back to who supplied it',
};

export function DispositionChoice({ registration, error }: { registration: UseFormRegisterReturn; error?: string }) {
  return (
    <ChoiceFieldset legend="What happens to the pieces" error={error}>
      {DISPOSITIONS.map((d) => (
        <ChoiceBox key={d} type="radio" value={d} {...registration}>
          <span className="font-bold">{DISPOSITION_LABELS[d]}</span> <span className="text-graphite-700">— {HELP[d]}</span>
        </ChoiceBox>
      ))}
    </ChoiceFieldset>
  );
}
