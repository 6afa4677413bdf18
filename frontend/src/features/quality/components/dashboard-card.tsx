import { useId, type ReactNode } from 'react';

type DashboardCardProps = { title: string; children: ReactNode; className?: string };

/** One block of the overview: a heading that names the region, then its content. */
export function DashboardCard({ title, children, className = '' }: DashboardCardProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={`flex flex-col gap-3 rounded-md border-2 border-graphite-300 bg-white p-4 ${className}`}>
      <h2 id={headingId} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}
