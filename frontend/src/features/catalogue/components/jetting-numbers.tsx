import { formatNumber, type InkPrintability } from '@tracewright/shared';

type Result = InkPrintability['printers'][number]['windows'][number]['result'];

const HEAD = 'bg-graphite-100 px-3 py-2 text-right font-bold whitespace-nowrap';
const CELL = 'border-t border-graphite-200 px-3 py-2 text-right tabular text-lg';
const show = (value: number | null) => (value === null ? '—' : formatNumber(value));

/** The dimensionless numbers behind the verdict; also the chart's numbers for anyone not seeing it. */
export function JettingNumbers({ result, printerName }: { result: Result; printerName: string }) {
  const cells: [string, number | null][] = [
    ['Oh', result.ohnesorge],
    ['Z = 1/Oh', result.z],
    ['Re', result.reynolds],
    ['We', result.weber],
    ['We½·Re¼', result.splashParameter],
  ];
  return (
    <div className="overflow-x-auto">
      <table className="border-collapse rounded-md border border-graphite-300">
        <caption className="sr-only">Jetting numbers through {printerName}</caption>
        <thead>
          <tr>
            {cells.map(([label]) => (
              <th key={label} scope="col" className={HEAD}>
                {label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          <tr>
            {cells.map(([label, value]) => (
              <td key={label} className={CELL}>
                {show(value)}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
    </div>
  );
}
