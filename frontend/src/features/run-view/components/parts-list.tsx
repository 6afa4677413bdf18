import type { RecipeStepOf } from '@tracewright/shared';

/** The parts to fit, with how many and where. */
export function PartsList({ parts }: { parts: RecipeStepOf<'attach-parts'>['params']['parts'] }) {
  if (parts.length === 0) return null;
  return (
    <section aria-labelledby="parts-title" className="flex flex-col gap-2">
      <h2 id="parts-title" className="text-[1.5rem] font-bold">
        Parts
      </h2>
      <table className="w-full border-collapse text-left">
        <thead>
          <tr className="border-b-2 border-graphite-500">
            <th scope="col" className="py-1 pr-4 text-right">
              Qty
            </th>
            <th scope="col" className="py-1 pr-4">
              Part
            </th>
            <th scope="col" className="py-1">
              Where
            </th>
          </tr>
        </thead>
        <tbody>
          {parts.map((part, i) => (
            <tr key={i} className="border-b border-graphite-200">
              <td className="py-2 pr-4 text-right font-bold tabular">{part.quantity}</td>
              <td className="py-2 pr-4">{part.name}</td>
              <td className="py-2">{part.placement || '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
