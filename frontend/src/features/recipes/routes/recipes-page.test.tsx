import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import type { RecipeSummary } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { builderHandlers } from '../testing/builder-handlers';
import { aRecipeDetail } from '../testing/version-fixtures';

const SUMMARY: RecipeSummary = {
  id: 1,
  code: 'TRACE-1',
  name: 'Silver trace label',
  product: 'Demo trace label',
  notes: '',
  archived: false,
  version: 1,
  createdAt: '2026-11-30T09:00:00Z',
  updatedAt: '2026-11-30T09:00:00Z',
  latestVersion: { id: 12, number: 3, state: 'in-review' },
  releasedVersion: { id: 11, number: 2, state: 'released' },
};

describe('recipes page', () => {
  it('when recipes exist, then each shows its latest version’s state in words and its released version', async () => {
    server.use(...signedInAs('quality'), http.get('/api/recipes', () => HttpResponse.json({ recipes: [SUMMARY] })));
    renderApp('/recipes');

    const row = (await screen.findByRole('rowheader', { name: 'TRACE-1' })).closest('tr') as HTMLElement;
    expect(within(row).getByText('In review')).toBeInTheDocument();
    expect(within(row).getByText('v3')).toBeInTheDocument();
    expect(within(row).getByRole('link', { name: /released version 2/i })).toHaveAttribute('href', '/recipes/1/versions/11');
    expect(screen.queryByRole('button', { name: 'New recipe' })).not.toBeInTheDocument();
  });

  it('when an engineer creates a recipe, then it is sent and its first draft opens in the builder', async () => {
    let sent: unknown;
    server.use(
      ...builderHandlers(),
      http.get('/api/recipes', () => HttpResponse.json({ recipes: [] })),
      http.post('/api/recipes', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(aRecipeDetail(), { status: 201 });
      }),
    );
    const { user } = renderApp('/recipes');

    await user.click(await screen.findByRole('button', { name: 'New recipe' }));
    await user.type(screen.getByLabelText('Code'), 'trace-1');
    await user.type(screen.getByLabelText('Name'), 'Silver trace label');
    await user.type(screen.getByLabelText('Product'), 'Demo trace label');
    await user.click(screen.getByRole('button', { name: 'Create recipe' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Silver trace label' }, { timeout: 3000 })).toBeInTheDocument();
    expect(sent).toEqual({ code: 'TRACE-1', name: 'Silver trace label', product: 'Demo trace label', notes: '' });
  });
});
