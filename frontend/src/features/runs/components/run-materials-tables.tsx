import type { RunDetail } from '@tracewright/shared';

const HEAD = 'border-b border-graphite-900 px-2 py-1 text-left font-bold';
const CELL = 'border-b border-graphite-300 px-2 py-1 align-top';
const KIND_WORDS = { printer: 'Printer', 'heat-source': 'Heat source', 'surface-treater': 'Surface treater', instrument: 'Instrument' } as const;
const FLAG_WORDS: Record<string, string> = { expired: 'Expired', 'past-pot-life': 'Past pot life' };

/** The lots and machines the run uses, with the reason given for any flagged one. */
export function RunMaterialsTables({ run }: { run: RunDetail }) {
  return (
    <div className="grid gap-6 md:grid-cols-2 print:grid-cols-2">
      <table className="w-full self-start border-collapse text-sm">
        <caption className="mb-1 text-left text-lg font-bold">Lots</caption>
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Material</th>
            <th scope="col" className={HEAD}>Lot</th>
            <th scope="col" className={HEAD}>Note</th>
          </tr>
        </thead>
        <tbody>
          {run.lots.map((lot) => (
            <tr key={lot.lotId}>
              <td className={CELL}>{lot.materialName}</td>
              <th scope="row" className={`${CELL} text-left font-mono`}>{lot.lotNumber}</th>
              <td className={CELL}>
                {lot.flags.map((flag) => FLAG_WORDS[flag] ?? flag).join(', ')}
                {lot.reason ? <span className="block">Reason: {lot.reason}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <table className="w-full self-start border-collapse text-sm">
        <caption className="mb-1 text-left text-lg font-bold">Machines</caption>
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Machine</th>
            <th scope="col" className={HEAD}>Kind</th>
            <th scope="col" className={HEAD}>Calibration due</th>
          </tr>
        </thead>
        <tbody>
          {run.equipment.map((item) => (
            <tr key={`${item.kind}-${item.id}`}>
              <th scope="row" className={`${CELL} text-left`}>
                {item.name}
                {item.reason ? <span className="block font-normal">Reason: {item.reason}</span> : null}
              </th>
              <td className={CELL}>{KIND_WORDS[item.kind]}</td>
              <td className={`${CELL} tabular whitespace-nowrap`}>{item.calibrationDueOn ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
