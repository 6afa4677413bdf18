import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { server } from '../../../../test/msw-server';
import { renderBuilder, sequence } from '../testing/render-builder';
import { aVersionView, OTHER_ENGINEER } from '../testing/version-fixtures';

const IN_REVIEW = aVersionView({ state: 'in-review', author: OTHER_ENGINEER, contentHash: 'b'.repeat(64) });

describe('recipe builder: review and release', () => {
  it('when quality signs without a password, then nothing is sent; with it, the password, meaning and content hash are sent', async () => {
    const sent: unknown[] = [];
    server.use(
      http.post('/api/recipe-versions/11/release', async ({ request }) => {
        sent.push(await request.json());
        return HttpResponse.json({ ...IN_REVIEW, state: 'released', lockVersion: 4 });
      }),
    );
    const { user } = await renderBuilder({ role: 'quality', versions: [IN_REVIEW] });

    await user.click(screen.getByRole('button', { name: 'Release' }));
    const dialog = screen.getByRole('dialog', { name: 'Release version 1 of TRACE-1' });
    expect(within(dialog).getByText('Approved for production')).toBeInTheDocument();
    expect(within(dialog).getByText(/Robin Vale/)).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Sign and release' }));
    expect(within(dialog).getByLabelText('Your password')).toHaveAccessibleDescription(/Enter your password to sign/);
    expect(sent).toEqual([]);

    await user.type(within(dialog).getByLabelText('Your password'), 'correct horse');
    await user.click(within(dialog).getByRole('button', { name: 'Sign and release' }));

    expect(await screen.findByText(/Version 1 of TRACE-1 is released/)).toBeInTheDocument();
    expect(sent).toEqual([{ password: 'correct horse', meaning: 'approved for production', contentHash: 'b'.repeat(64) }]);
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it('when the password is wrong, then the dialog stays open with the reason under the password', async () => {
    server.use(
      http.post('/api/recipe-versions/11/release', () =>
        HttpResponse.json({ error: { code: 'UNAUTHENTICATED', message: 'That password is not right, so nothing was signed.' } }, { status: 401 }),
      ),
    );
    const { user } = await renderBuilder({ role: 'quality', versions: [IN_REVIEW] });

    await user.click(screen.getByRole('button', { name: 'Release' }));
    await user.type(screen.getByLabelText('Your password'), 'wrong');
    await user.click(screen.getByRole('button', { name: 'Sign and release' }));

    expect(await screen.findByText('That password is not right, so nothing was signed.')).toBeInTheDocument();
    expect(screen.getByRole('dialog')).toBeInTheDocument();
  });

  it('when quality sends a version back, then the comment goes with it', async () => {
    let sent: unknown;
    server.use(
      http.post('/api/recipe-versions/11/send-back', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({ ...IN_REVIEW, state: 'draft', reviewComment: 'Add the oven reading.', lockVersion: 4 });
      }),
    );
    const { user } = await renderBuilder({ role: 'quality', versions: [IN_REVIEW] });

    await user.click(screen.getByRole('button', { name: 'Send back' }));
    await user.type(screen.getByLabelText('What needs to change'), 'Add the oven reading.');
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Send back' }));

    expect(await screen.findByText('Quality sent this version back')).toBeInTheDocument();
    expect(sent).toEqual({ comment: 'Add the oven reading.' });
  });

  it('when a version is released, then nothing in it can be changed and a new version can be started', async () => {
    const released = aVersionView({ state: 'released', releasedAt: '2026-12-01T10:00:00Z', releasedBy: { id: 7, name: 'Tove Lind' } });
    await renderBuilder({ versions: [released] });

    expect(screen.getByText(/This is the released version operators run/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New version' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Add .* step$/ })).not.toBeInTheDocument();
    expect(within(sequence()).queryByRole('button', { name: /^Move step/ })).not.toBeInTheDocument();
    expect(screen.getByLabelText('Step title')).toBeDisabled();
  });
});
