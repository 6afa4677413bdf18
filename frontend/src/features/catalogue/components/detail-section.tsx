import { useId, type ReactNode } from 'react';

/** A titled part of a record's page; the heading names the region for screen-reader navigation. */
export function DetailSection({ title, children, actions }: { title: string; children: ReactNode; actions?: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="rounded-md border border-graphite-300 bg-white p-5">
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <h2 id={headingId} className="text-xl font-bold">
          {title}
        </h2>
        {actions}
      </div>
      {children}
    </section>
  );
}
