import { NumberField } from './number-field';
import type { KindFieldsProps } from './step-fields-context';

/** How long the step may take, and how much of it needs hands. */
export function TimingFields({ form }: Pick<KindFieldsProps, 'form'>) {
  return (
    <section aria-labelledby="timing-title" className="flex flex-col gap-4">
      <h3 id="timing-title" className="text-base font-bold text-graphite-800">
        Time
      </h3>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField form={form} name="minMinutes" label="Shortest" unit="min" />
        <NumberField form={form} name="maxMinutes" label="Longest" unit="min" />
        <NumberField form={form} name="handsOnMinutes" label="Hands-on" unit="min" />
      </div>
    </section>
  );
}
