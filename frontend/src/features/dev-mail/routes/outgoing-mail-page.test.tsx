import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { apiError, signedInAs } from '../../../../test/api-fixtures';
import { server } from '../../../../test/msw-server';
import { renderApp } from '../../../../test/render-app';

const mail = (id: string, subject: string, receivedAt: string, text = 'Hello.') => ({
  id,
  receivedAt,
  from: 'tracewright@lab.example',
  to: ['tove.lind@lab.example'],
  subject,
  text,
});

describe('outgoing mail page', () => {
  it('when mails were captured, then they are listed newest first with their links clickable', async () => {
    const link = 'http://localhost:5173/set-password/k3Jx9QvLm2Tn8RwYp5ZsAe7Hb4Uc6Fd1';
    server.use(
      ...signedInAs('admin'),
      http.get('/api/dev/mails', () =>
        HttpResponse.json({
          mails: [
            mail('a', 'Older: password reset', '2026-11-30T08:00:00Z'),
            mail('b', 'You are invited to Stretch Lab North', '2026-12-01T09:30:00Z', `Choose a password here:\n${link}\nThe link works for 72 hours.`),
          ],
        }),
      ),
    );
    renderApp('/dev/mail');

    const articles = await screen.findAllByRole('article');
    expect(articles.map((a) => within(a).getByRole('heading').textContent)).toEqual([
      'You are invited to Stretch Lab North',
      'Older: password reset',
    ]);
    expect(within(articles[0] as HTMLElement).getByRole('link', { name: link })).toHaveAttribute('href', link);
    expect(within(articles[0] as HTMLElement).getByText('tove.lind@lab.example')).toBeInTheDocument();
  });

  it('when mail capture is off (404), then the page says mails go to the SMTP server', async () => {
    server.use(...signedInAs('admin'), http.get('/api/dev/mails', () => apiError(404, 'NOT_FOUND', 'Not found.')));
    renderApp('/dev/mail');

    expect(await screen.findByText('Mail capture is off; mails go to the configured SMTP server.')).toBeInTheDocument();
  });
});
