import { useId, useState } from 'react';

import { TextField } from '../../../components/ui/text-field';
import { asFieldText } from '../utils/form-values';
import { owrkPreview } from '../utils/owrk-preview';
import { OwrkResult } from './owrk-result';

type AngleCheckPanelProps = { waterDeg: number | null; diiodomethaneDeg: number | null };

/** Type two contact angles, read the surface energy at once: for checking a fresh measurement. */
export function AngleCheckPanel({ waterDeg, diiodomethaneDeg }: AngleCheckPanelProps) {
  const [water, setWater] = useState(asFieldText(waterDeg));
  const [diiodomethane, setDiiodomethane] = useState(asFieldText(diiodomethaneDeg));
  const outcome = owrkPreview(water, diiodomethane);
  const titleId = useId();

  return (
    <section aria-labelledby={titleId} className="flex flex-col gap-4 rounded-md border-2 border-dashed border-graphite-400 p-4">
      <div>
        <h3 id={titleId} className="text-lg font-bold">
          Check angles
        </h3>
        <p className="text-sm text-graphite-700">Nothing here is saved. Owens & Wendt 1969 (OWRK), with water and diiodomethane as probe liquids.</p>
      </div>
      <div className="flex flex-wrap gap-4">
        <TextField label="Water contact angle (°)" inputMode="decimal" autoComplete="off" value={water} onChange={(e) => setWater(e.target.value)} className="w-72" />
        <TextField
          label="Diiodomethane contact angle (°)"
          inputMode="decimal"
          autoComplete="off"
          value={diiodomethane}
          onChange={(e) => setDiiodomethane(e.target.value)}
          className="w-72"
        />
      </div>
      <div role="status" aria-live="polite" aria-label="Surface energy from these angles">
        {'energy' in outcome ? <OwrkResult energy={outcome.energy} /> : <p className="text-graphite-700">{outcome.problem}</p>}
      </div>
    </section>
  );
}
