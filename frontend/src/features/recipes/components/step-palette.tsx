import { STEP_KINDS, type StepKind } from '@tracewright/shared';

import { PaletteItem } from './palette-item';

type StepPaletteProps = { onAdd: (kind: StepKind) => void; hasSelection: boolean };

/** The seven step kinds; each adds a step after the selected one (or at the end). */
export function StepPalette({ onAdd, hasSelection }: StepPaletteProps) {
  return (
    <section aria-labelledby="palette-title" className="flex flex-col gap-3">
      <h2 id="palette-title" className="text-lg font-bold">
        Step kinds
      </h2>
      <p className="text-sm text-graphite-600">{hasSelection ? 'Adds after the selected step, or drag into place.' : 'Adds at the end, or drag into place.'}</p>
      <ul className="flex flex-col gap-2">
        {STEP_KINDS.map((kind) => (
          <PaletteItem key={kind} kind={kind} onAdd={onAdd} />
        ))}
      </ul>
    </section>
  );
}
