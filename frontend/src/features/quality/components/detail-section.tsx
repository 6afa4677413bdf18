import { useId, type ReactNode } from 'react';

type DetailSectionProps = { title: string; children: ReactNode; className?: string };

/** A titled part of the deviation record; the heading names the region for screen readers. */
export function DetailSection({ title, children, className = '' }: DetailSectionProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={`flex flex-col gap-3 ${className}`}>
      <h2 id={headingId} className="text-xl font-bold text-graphite-900">
        {title}
      </h2>
      {children}
    </section>
  );
}
