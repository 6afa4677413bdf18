import { Icon } from '../../../components/icons/icon';

/** Whether the working copy differs from what is saved, as icon and words. */
export function SaveState({ isDirty }: { isDirty: boolean }) {
  return isDirty ? (
    <span className="inline-flex items-center gap-1 font-bold text-amber-800">
      <Icon name="pencil" className="size-4" />
      Unsaved changes
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 text-graphite-700">
      <Icon name="check" className="size-4" />
      All changes saved
    </span>
  );
}
