import { JETTING_WINDOWS, type JettingWindowId } from '@tracewright/shared';

const WINDOW_IDS = Object.keys(JETTING_WINDOWS) as JettingWindowId[];

type WindowPickerProps = { value: JettingWindowId; defaultId: JettingWindowId; onChange: (id: JettingWindowId) => void };

/** Which printable window on Z the verdicts and charts use; both come from the literature. */
export function WindowPicker({ value, defaultId, onChange }: WindowPickerProps) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold">Printable window</legend>
      {WINDOW_IDS.map((id) => {
        const w = JETTING_WINDOWS[id];
        return (
          <label key={id} className="flex min-h-11 cursor-pointer items-start gap-3 py-1">
            <input type="radio" name="jetting-window" value={id} checked={value === id} onChange={() => onChange(id)} className="mt-1 size-5 shrink-0 accent-copper-600" />
            <span>
              <span className="tabular font-bold">{w.label}</span> ({w.source}){id === defaultId ? ', the usual choice' : ''}
              <span className="block text-sm text-graphite-600">Length in Z: {w.lengthConvention}</span>
            </span>
          </label>
        );
      })}
    </fieldset>
  );
}
