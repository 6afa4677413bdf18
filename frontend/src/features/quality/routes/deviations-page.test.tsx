import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';
import { aQueueItem } from '../testing/deviation-fixtures';
import { pickerLists, queueApi } from '../testing/quality-api';

const COUNTS = { open: 4, 'in-review': 2, dispositioned: 1, closed: 9 };

describe('deviation queue', () => {
  it('when state, severity and recipe filters are chosen, then they go to the address and to the API request', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('quality'), ...pickerLists(), queueApi({ items: [aQueueItem()], total: 1, countsByState: COUNTS }, asked));
    const { user, router } = renderApp('/deviations');

    const row = (await screen.findByRole('rowheader', { name: /Trace resistance above limit/ })).closest('tr') as HTMLElement;
    expect(within(row).getByText('Major')).toBeInTheDocument();
    expect(within(row).getByText('2 days')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /In review 2/ })).toHaveAttribute('aria-pressed', 'false');

    await user.click(screen.getByRole('button', { name: /Open 4/ }));
    await user.click(screen.getByRole('button', { name: /Critical/ }));
    await waitFor(() => expect(router.state.location.search).toBe('?state=open&severity=critical'));
    await user.selectOptions(await screen.findByLabelText('Recipe'), 'LENS-HEAT-2 · Lens-wrap heater');
    await user.type(screen.getByLabelText('Search text'), 'oven');
    await user.click(screen.getByRole('button', { name: 'Show deviations' }));

    await waitFor(() => expect(router.state.location.search).toBe('?state=open&severity=critical&recipeId=12&q=oven'));
    const last = asked.at(-1);
    expect(last?.get('state')).toBe('open');
    expect(last?.get('severity')).toBe('critical');
    expect(last?.get('recipeId')).toBe('12');
    expect(last?.get('q')).toBe('oven');
    expect(last?.get('sort')).toBe('newest');
    expect(screen.getByRole('button', { name: /Open 4/ })).toHaveAttribute('aria-pressed', 'true');
  });

  it('when the queue runs over one page, then Next page asks the API for page 2 with the same filters', async () => {
    const asked: URLSearchParams[] = [];
    server.use(...signedInAs('quality'), ...pickerLists(), queueApi({ items: [aQueueItem()], total: 120, countsByState: COUNTS }, asked));
    const { user, router } = renderApp('/deviations?state=open,in-review&sort=oldest');

    expect(await screen.findByText('Page 1 of 3')).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: /Next page/ }));

    await waitFor(() => expect(asked.at(-1)?.get('page')).toBe('2'));
    expect(asked.at(-1)?.get('state')).toBe('open,in-review');
    expect(asked.at(-1)?.get('sort')).toBe('oldest');
    expect(router.state.location.search).toBe('?state=open%2Cin-review&sort=oldest&page=2');
    expect(await screen.findByText('Page 2 of 3')).toBeInTheDocument();
  });

  it('when a row is opened, then its title links to the deviation, and the overview is one link away', async () => {
    server.use(...signedInAs('engineer'), ...pickerLists(), queueApi({ items: [aQueueItem({ id: 77 })], total: 1, countsByState: COUNTS }));
    renderApp('/deviations');

    expect(await screen.findByRole('link', { name: 'Trace resistance above limit' })).toHaveAttribute('href', '/deviations/77');
    expect(screen.getByRole('link', { name: /Quality overview/ })).toHaveAttribute('href', '/quality');
  });
});
