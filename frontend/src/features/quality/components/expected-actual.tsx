import type { DeviationDetail } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';

/** The heart of a deviation: what the recipe asked for beside what happened. */
export function ExpectedActual({ deviation }: { deviation: DeviationDetail }) {
  return (
    <div className="grid gap-3 md:grid-cols-2">
      <div className="rounded-md border-2 border-graphite-300 bg-white p-4">
        <h2 className="mb-1 flex items-center gap-2 font-bold text-graphite-700">
          <Icon name="ledger" />
          Expected
        </h2>
        <p className="text-lg">{deviation.expected}</p>
      </div>
      <div className="rounded-md border-2 border-oxide-700 bg-oxide-50 p-4">
        <h2 className="mb-1 flex items-center gap-2 font-bold text-oxide-800">
          <Icon name="warning" />
          What happened
        </h2>
        <p className="text-lg text-graphite-900">{deviation.actual}</p>
      </div>
    </div>
  );
}
