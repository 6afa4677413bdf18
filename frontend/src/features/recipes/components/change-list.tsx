import type { FieldChange } from '@tracewright/shared';

import { changeLabel, changeValue } from '../utils/change-words';

/** Field changes as "Temperature: 130 → 150". */
export function ChangeList({ changes, label }: { changes: readonly FieldChange[]; label: string }) {
  return (
    <ul aria-label={label} className="flex flex-col gap-1 text-sm">
      {changes.map((change) => (
        <li key={change.path} className="tabular">
          <span className="font-bold">{changeLabel(change.path)}:</span> {changeValue(change.before)} <span aria-label="became">→</span> {changeValue(change.after)}
        </li>
      ))}
    </ul>
  );
}
