import { Icon } from '../../../components/icons/icon';
import type { StepMarks } from '../utils/evaluate-draft';

const count = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

type StepCardMarksProps = { marks: StepMarks | undefined; isInvalid: boolean };

/** What the checks say about one step, as icon and words on its card. */
export function StepCardMarks({ marks, isInvalid }: StepCardMarksProps) {
  if (!isInvalid && !marks) return null;
  return (
    <p className="flex flex-wrap gap-x-3 gap-y-1 text-sm font-bold">
      {isInvalid ? (
        <span className="inline-flex items-center gap-1 text-oxide-700">
          <Icon name="pencil" className="size-4" />
          Fields to fix
        </span>
      ) : null}
      {marks?.blocked ? (
        <span className="inline-flex items-center gap-1 text-oxide-700">
          <Icon name="blocked" className="size-4" />
          {count(marks.blocked, 'blocked check')}
        </span>
      ) : null}
      {marks?.warning ? (
        <span className="inline-flex items-center gap-1 text-amber-800">
          <Icon name="warning" className="size-4" />
          {count(marks.warning, 'warning')}
        </span>
      ) : null}
    </p>
  );
}
