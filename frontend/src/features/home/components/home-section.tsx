import { useId, type ReactNode } from 'react';

/** One block of the home page: a heading that names the region, then its content. */
export function HomeSection({ title, children }: { title: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="space-y-3 rounded-md border-2 border-graphite-300 bg-white p-4">
      <h2 id={headingId} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}
