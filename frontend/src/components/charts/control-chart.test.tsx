import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { ControlChart } from './control-chart';

describe('ControlChart', () => {
  it('when points include an excluded one and a rule break, then each gets its own mark and the figure keeps its description', () => {
    const { container } = render(
      <ControlChart
        title="Individuals: sheet resistance"
        description="Five readings; one rule break at point 5."
        points={[
          { x: 1, y: 10, isExcluded: false, isSignal: false },
          { x: 2, y: 11, isExcluded: false, isSignal: false },
          { x: 3, y: 30, isExcluded: true, isSignal: false },
          { x: 4, y: 10.5, isExcluded: false, isSignal: false },
          { x: 5, y: 14, isExcluded: false, isSignal: true },
        ]}
        lines={[
          { y: 10.6, label: 'Mean', kind: 'centre' },
          { y: 13, label: 'UCL', kind: 'control' },
          { y: 15, label: 'USL', kind: 'spec' },
        ]}
        xLabel="Point"
        yLabel="Ω"
      />,
    );

    expect(screen.getByRole('figure', { name: 'Individuals: sheet resistance' })).toHaveAccessibleDescription('Five readings; one rule break at point 5.');
    expect(container.querySelector('svg.recharts-surface')).not.toBeNull();
    expect(container.querySelectorAll('.control-chart-signal')).toHaveLength(1);
    expect(container.querySelectorAll('.control-chart-excluded')).toHaveLength(1);
    expect(container.textContent).toContain('UCL 13');
  });
});
