import type { ReactNode } from 'react';

/** A group of related fields under a legend; one column, as every form here is laid out. */
export function FormSection({ legend, children, help }: { legend: string; children: ReactNode; help?: string }) {
  return (
    <fieldset className="flex flex-col gap-5 border-t border-graphite-300 pt-5">
      <legend className="pr-3 text-xl font-bold">{legend}</legend>
      {help ? <p className="-mt-2 max-w-prose text-graphite-700">{help}</p> : null}
      {children}
    </fieldset>
  );
}
