import { hazardStatement, PICTOGRAM_NAMES, type Solvent } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';

/** One solvent's hazards as readable cautions: signal word, pictograms by name, hazard statements. */
export function SolventCaution({ solvent }: { solvent: Solvent }) {
  return (
    <li className="flex flex-col gap-2 border-l-4 border-amber-700 pl-4">
      <p className="flex flex-wrap items-center gap-2">
        <span className="text-lg font-bold">{solvent.name}</span>
        {solvent.casNumber ? <span className="tabular text-graphite-700">CAS {solvent.casNumber}</span> : null}
        {solvent.signalWord ? (
          <StatusBadge tone={solvent.signalWord === 'Danger' ? 'blocked' : 'warning'} label={solvent.signalWord} icon="warning" />
        ) : null}
      </p>
      {solvent.pictograms.length > 0 ? (
        <p>
          <span className="font-bold">Pictograms: </span>
          {solvent.pictograms.map((code) => `${code} ${PICTOGRAM_NAMES[code]}`).join('; ')}
        </p>
      ) : null}
      {solvent.hazardCodes.length > 0 ? (
        <ul className="list-disc pl-5">
          {solvent.hazardCodes.map((code) => (
            <li key={code}>{hazardStatement(code)}</li>
          ))}
        </ul>
      ) : (
        <p className="text-graphite-700">No hazard statements recorded.</p>
      )}
    </li>
  );
}
