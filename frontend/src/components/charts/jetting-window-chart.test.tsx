import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { JettingWindowChart } from './jetting-window-chart';

describe('JettingWindowChart', () => {
  it('when given a point and a window, then it draws an svg and names the figure with its description', () => {
    const { container } = render(
      <JettingWindowChart
        title="Test ink through bench printer"
        point={{ z: 6.78, we: 12.2 }}
        window={{ zMin: 1, zMax: 10, label: '1 < Z < 10' }}
        ejectionWeber={4}
        description="The point sits inside the band and above the line."
      />,
    );

    const figure = screen.getByRole('figure', { name: 'Test ink through bench printer' });
    expect(figure).toHaveAccessibleDescription('The point sits inside the band and above the line.');
    expect(container.querySelector('svg.recharts-surface')).not.toBeNull();
    expect(container.querySelectorAll('.recharts-scatter-symbol')).toHaveLength(1);
  });
});
