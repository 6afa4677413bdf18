import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { vi } from 'vitest';

import type { RunDetail } from '@tracewright/shared';

import { TimerLayer } from '../components/timer-layer';
import { BenchContext, type Bench } from '../hooks/bench-context';
import { applyWrites } from '../utils/apply-writes';

/** Renders run-view pieces with the page's contexts around them (no router, no network). */
export function renderBench(ui: ReactNode, { run, clockOffsetMs = 0 }: { run: RunDetail; clockOffsetMs?: number }) {
  const bench: Bench = {
    run: applyWrites(run, [], clockOffsetMs),
    clockOffsetMs,
    isFresh: true,
    person: { id: 1, name: 'Robin Vale' },
    isWorkable: true,
    goToStep: vi.fn(),
    record: vi.fn(async () => null),
  };
  const view = render(
    <BenchContext.Provider value={bench}>
      <TimerLayer timers={bench.run.timers} clockOffsetMs={clockOffsetMs}>
        {ui}
      </TimerLayer>
    </BenchContext.Provider>,
  );
  return { ...view, bench };
}
