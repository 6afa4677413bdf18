import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

describe('calculator page', () => {
  it('when an operator opens /calculator, then the lazily loaded page lists every section and each link finds its section', async () => {
    server.use(...signedInAs('operator'));
    renderApp('/calculator');

    expect(await screen.findByRole('heading', { level: 1, name: 'Process calculator' })).toBeInTheDocument();
    const index = screen.getByRole('navigation', { name: 'Calculator sections' });
    const titles = ['Jettability', 'Surface energy and wetting', 'Line geometry', 'Electrical', 'Thermal', 'Quality statistics'];
    expect(within(index).getAllByRole('link')).toHaveLength(titles.length);
    for (const title of titles) {
      const href = within(index).getByRole('link', { name: title }).getAttribute('href') ?? '';
      const section = screen.getByRole('region', { name: title });
      expect(href).toBe(`#${section.id}`);
      expect(within(section).getAllByText(/^Source: /).length).toBeGreaterThan(0);
    }
  });
});
