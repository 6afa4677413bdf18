import { useId, type ReactNode } from 'react';

type CalcCardProps = {
  title: string;
  description?: string;
  /** The published source (or "no source") of this calculation, shown beside its results. */
  source: string;
  fields: ReactNode;
  results: ReactNode;
  /** Spans the section's width with fields and results side by side (for the bigger calculations). */
  isWide?: boolean;
};

/** One calculation: its fields (no submit button, results follow the typing), its results, its source. */
export function CalcCard({ title, description, source, fields, results, isWide = false }: CalcCardProps) {
  const titleId = useId();
  return (
    <article aria-labelledby={titleId} className={`flex flex-col gap-4 rounded-md border border-graphite-300 bg-white p-5 ${isWide ? 'lg:col-span-2' : ''}`}>
      <div>
        <h3 id={titleId} className="text-xl font-bold text-graphite-900">
          {title}
        </h3>
        {description ? <p className="mt-1 text-graphite-700">{description}</p> : null}
      </div>
      <div className={isWide ? 'grid items-start gap-6 lg:grid-cols-2' : 'flex flex-col gap-4'}>
        {/* Enter must not reload the page: there is nothing to submit. */}
        <form noValidate onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-4">
          {fields}
        </form>
        <div className="flex flex-col gap-3">
          {results}
          <p className="text-sm text-graphite-600">{source}</p>
        </div>
      </div>
    </article>
  );
}
