import { TextField } from '../../../components/ui/text-field';

type ListControlsProps = {
  filterLabel: string;
  filterHelp: string;
  text: string;
  showArchived: boolean;
  onText: (text: string) => void;
  onShowArchived: (show: boolean) => void;
};

export function ListControls({ filterLabel, filterHelp, text, showArchived, onText, onShowArchived }: ListControlsProps) {
  return (
    <div className="mb-4 flex flex-wrap items-start gap-x-8 gap-y-3">
      <div className="w-full max-w-sm">
        <TextField label={filterLabel} type="search" help={filterHelp} value={text} onChange={(e) => onText(e.target.value)} />
      </div>
      <label className="mt-8 flex min-h-11 cursor-pointer items-center gap-2 font-bold">
        <input type="checkbox" className="size-5 accent-copper-600" checked={showArchived} onChange={(e) => onShowArchived(e.target.checked)} />
        Show archived
      </label>
    </div>
  );
}
