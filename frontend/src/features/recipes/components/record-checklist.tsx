type Item = { id: number; label: string };

type RecordChecklistProps = { legend: string; help: string; items: readonly Item[]; chosen: readonly number[]; onChange: (ids: number[]) => void; empty: string };

/** Several records picked from a list, as checkboxes in a group with its own name. */
export function RecordChecklist({ legend, help, items, chosen, onChange, empty }: RecordChecklistProps) {
  const toggle = (id: number, on: boolean) => onChange(on ? [...chosen, id] : chosen.filter((c) => c !== id));
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-bold text-graphite-900">{legend}</legend>
      <p className="text-sm text-graphite-600">{help}</p>
      {items.length === 0 ? <p className="text-sm text-graphite-600">{empty}</p> : null}
      <ul className="flex flex-col gap-1">
        {items.map((item) => (
          <li key={item.id}>
            <label className="flex min-h-11 items-center gap-3">
              <input type="checkbox" className="size-5 accent-copper-600" checked={chosen.includes(item.id)} onChange={(e) => toggle(item.id, e.target.checked)} />
              {item.label}
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
