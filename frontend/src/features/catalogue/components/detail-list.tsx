import type { ReactNode } from 'react';

export type DetailItem = { label: string; value: ReactNode; unit?: string };

/** Label and value pairs; numbers in tabular figures with the unit lighter beside them (degrees of angle sit on the number). */
export function DetailList({ items }: { items: readonly DetailItem[] }) {
  return (
    <dl className="grid grid-cols-1 gap-x-8 gap-y-3 sm:grid-cols-[max-content_1fr]">
      {items.map((item) => (
        <div key={item.label} className="contents">
          <dt className="font-bold text-graphite-700">{item.label}</dt>
          <dd className="tabular mb-2 sm:mb-0">
            {item.value}
            {item.unit && item.value !== '—' ? <span className="text-graphite-600">{item.unit === '°' ? '°' : ` ${item.unit}`}</span> : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}
