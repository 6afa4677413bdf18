import type { ReactNode } from 'react';

type PageHeaderProps = { title: string; description?: ReactNode; actions?: ReactNode };

export function PageHeader({ title, description, actions }: PageHeaderProps) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-graphite-200 pb-4">
      <title>{`${title} · Tracewright`}</title>
      <div className="max-w-prose">
        <h1 className="text-3xl font-bold text-graphite-900">{title}</h1>
        {description ? <p className="mt-2 text-graphite-700">{description}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
