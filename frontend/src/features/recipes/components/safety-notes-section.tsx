import type { SafetyNote } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import type { StepFormApi } from '../utils/step-form-types';
import { CustomSafetyNotes } from './custom-safety-notes';

const LOOK: Record<SafetyNote['severity'], string> = {
  caution: 'border-amber-700 bg-amber-50 text-amber-800',
  danger: 'border-oxide-700 bg-oxide-50 text-oxide-800',
};

type SafetyNotesSectionProps = { form: StepFormApi; derived: readonly SafetyNote[] | undefined };

/** Cautions the step carries by what it does (worked out, read-only), then the engineer's own. */
export function SafetyNotesSection({ form, derived }: SafetyNotesSectionProps) {
  return (
    <section aria-labelledby="safety-title" className="flex flex-col gap-3">
      <h3 id="safety-title" className="text-base font-bold text-graphite-800">
        Safety
      </h3>
      {derived === undefined ? (
        <p className="text-sm text-graphite-600">Cautions appear once the step's fields are complete.</p>
      ) : derived.length === 0 ? (
        <p className="text-sm text-graphite-600">No cautions follow from this step's settings.</p>
      ) : (
        <ul aria-label="Cautions from the step's settings" className="flex flex-col gap-2">
          {derived.map((note) => (
            <li key={note.code} className={`flex items-start gap-2 rounded-md border p-3 ${LOOK[note.severity]}`}>
              <Icon name="warning" className="mt-0.5 size-5" />
              <p>
                <span className="font-bold">{note.severity === 'danger' ? 'Danger: ' : 'Caution: '}</span>
                {note.text}
              </p>
            </li>
          ))}
        </ul>
      )}
      <CustomSafetyNotes form={form} />
    </section>
  );
}
