import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderBuilder, sequence } from '../testing/render-builder';
import { aContent, aVersionView, CURE_STEP } from '../testing/version-fixtures';

async function raiseCureTo(user: Awaited<ReturnType<typeof renderBuilder>>['user'], value: string) {
  await user.click(within(sequence()).getByRole('button', { name: 'Step 2: Cure silver' }));
  const temperature = screen.getByLabelText('Temperature (°C)');
  await user.clear(temperature);
  await user.type(temperature, value);
}

describe('recipe builder: save and send for review', () => {
  it('when the engineer saves, then the whole content goes out with the lock version it was loaded at', async () => {
    let sent: unknown;
    server.use(
      http.put('/api/recipe-versions/11', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(aVersionView({ lockVersion: 4, content: sent as ReturnType<typeof aContent> }));
      }),
    );
    const { user } = await renderBuilder();

    await raiseCureTo(user, '125');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText('All changes saved')).toBeInTheDocument();
    const expected = aContent();
    expected.steps[1] = { ...CURE_STEP, params: { ...CURE_STEP.params, temperatureC: 125 } } as typeof CURE_STEP;
    expect(sent).toEqual({ ...expected, lockVersion: 3 });
  });

  it('when someone else saved first (409), then the edits stay and the message offers their version', async () => {
    server.use(http.put('/api/recipe-versions/11', () => apiError(409, 'CONFLICT', 'Someone else saved this draft first (it is now at version 4).')));
    const { user } = await renderBuilder();

    await raiseCureTo(user, '125');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Someone else saved this draft first');
    expect(screen.getByRole('button', { name: 'Reload their version' })).toBeInTheDocument();
    expect(screen.getByLabelText('Temperature (°C)')).toHaveValue('125');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
  });

  it('when their version is reloaded after a conflict, then their content replaces the edits', async () => {
    const theirs = aVersionView({ lockVersion: 4, content: aContent({ steps: [{ ...CURE_STEP, title: 'Cure silver (their edit)' }] }) });
    const versions = [aVersionView()];
    server.use(http.put('/api/recipe-versions/11', () => apiError(409, 'CONFLICT', 'Someone else saved this draft first.')));
    const { user } = await renderBuilder({ versions });

    await raiseCureTo(user, '125');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    versions[0] = theirs;
    await user.click(await screen.findByRole('button', { name: 'Reload their version' }));

    expect(await within(sequence()).findByRole('button', { name: 'Step 1: Cure silver (their edit)' })).toBeInTheDocument();
    expect(screen.getByText('All changes saved')).toBeInTheDocument();
  });

  it('when sending for review is refused because checks block it (422), then the blocking checks are listed', async () => {
    const blocked = { id: 'heat:cure-silver:print-substrate', family: 'heat', stepId: 'cure-silver', status: 'blocked', title: 'Cure at 200 °C on Demo PET film', numbers: '200 °C for up to 30 min', why: 'Above the film’s short-exposure limit.' };
    server.use(
      http.post('/api/recipe-versions/11/submit', () =>
        apiError(422, 'UNPROCESSABLE', 'Version 1 cannot be submitted: 1 process check blocks it.', { checks: [blocked], summary: { pass: 0, warning: 0, blocked: 1, isBlocked: true } }),
      ),
    );
    const { user } = await renderBuilder();

    await user.click(screen.getByRole('button', { name: 'Send for review' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Version 1 cannot be submitted');
    const list = within(alert).getByRole('list', { name: 'Checks that block sending for review' });
    expect(within(list).getByText('Cure at 200 °C on Demo PET film')).toBeInTheDocument();
    expect(within(list).getByText('Blocked')).toBeInTheDocument();
  });

  it('when the engineer leaves with unsaved edits, then they are asked first and can stay', async () => {
    const { user, router } = await renderBuilder();
    await raiseCureTo(user, '125');

    await user.click(screen.getByRole('link', { name: 'Recipes' }));

    const dialog = screen.getByRole('dialog', { name: 'Leave without saving?' });
    await user.click(within(dialog).getByRole('button', { name: 'Stay and keep editing' }));
    expect(router.state.location.pathname).toBe('/recipes/1/versions/11');
    expect(screen.getByLabelText('Temperature (°C)')).toHaveValue('125');
  });
});
