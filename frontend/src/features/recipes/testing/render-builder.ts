import { screen, within } from '@testing-library/react';

import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { builderHandlers } from './builder-handlers';

/** Opens version 11 of recipe 1 in the builder with the given API, once its title is shown. */
export async function renderBuilder(api: Parameters<typeof builderHandlers>[0] = {}, path = '/recipes/1/versions/11') {
  server.use(...builderHandlers(api));
  const view = renderApp(path);
  await screen.findByRole('heading', { level: 1, name: 'Silver trace label' }, { timeout: 3000 });
  return view;
}

export const sequence = () => screen.getByRole('region', { name: 'Sequence' });
export const checksPanel = () => screen.getByRole('region', { name: 'Process checks' });

/** The cards' names in order, e.g. ['Step 1: Print silver traces', …]. */
export const cardNames = () => within(sequence()).getAllByRole('button', { name: /^Step \d+: / }).map((b) => b.getAttribute('aria-label'));
