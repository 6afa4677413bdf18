import { formatNumber, type SurfaceEnergy } from '@tracewright/shared';

/** Dispersive, polar and total surface energy, large and tabular, each with its unit. */
export function OwrkResult({ energy }: { energy: SurfaceEnergy }) {
  const parts: [string, number][] = [
    ['Dispersive', energy.dispersiveMilliNPerM],
    ['Polar', energy.polarMilliNPerM],
    ['Total', energy.totalMilliNPerM],
  ];
  return (
    <dl className="flex flex-wrap gap-x-8 gap-y-2">
      {parts.map(([label, value]) => (
        <div key={label}>
          <dt className="text-sm font-bold text-graphite-700">{label}</dt>
          <dd className="tabular text-2xl font-bold">
            {formatNumber(value)} <span className="text-base font-normal text-graphite-600">mN/m</span>
          </dd>
        </div>
      ))}
    </dl>
  );
}
