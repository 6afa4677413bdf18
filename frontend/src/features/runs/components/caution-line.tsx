import type { SafetyNote } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';

/** One caution: its weight as a word ("Danger", "Caution") beside the icon, then what to do. */
export function CautionLine({ note, suffix }: { note: SafetyNote; suffix?: string }) {
  return (
    <li className="flex items-start gap-2">
      <Icon name="warning" className="mt-0.5 size-5" />
      <span>
        <strong>{note.severity === 'danger' ? 'Danger' : 'Caution'}:</strong> {note.text}
        {suffix ? <span className="text-graphite-700"> {suffix}</span> : null}
      </span>
    </li>
  );
}
