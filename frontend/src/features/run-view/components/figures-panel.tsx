import type { BenchFact, BenchFigure } from '../utils/bench-figures';

/** The numbers to set at the bench, large and tabular, each with its unit in a lighter weight. */
export function FiguresPanel({ figures, facts }: { figures: BenchFigure[]; facts: BenchFact[] }) {
  if (figures.length === 0 && facts.length === 0) return null;
  return (
    <section aria-label="Settings" className="flex flex-col gap-4">
      {figures.length > 0 ? (
        <dl className="grid grid-cols-[repeat(auto-fill,minmax(12rem,1fr))] gap-2">
          {figures.map((f) => (
            <div key={f.label} className="flex flex-col rounded-lg border-2 border-graphite-300 bg-white px-4 py-2">
              <dt className="text-base font-bold text-graphite-700">{f.label}</dt>
              <dd className="flex flex-wrap items-baseline gap-x-2">
                <span className="whitespace-nowrap text-[2.75rem] font-bold leading-tight tabular">{f.value}</span>
                {f.unit ? <span className="text-[1.5rem] font-normal text-graphite-700">{f.unit}</span> : null}
              </dd>
            </div>
          ))}
        </dl>
      ) : null}
      {facts.length > 0 ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          {facts.map((f) => (
            <div key={f.label} className="contents">
              <dt className="font-bold text-graphite-700">{f.label}</dt>
              <dd>{f.text}</dd>
            </div>
          ))}
        </dl>
      ) : null}
    </section>
  );
}
