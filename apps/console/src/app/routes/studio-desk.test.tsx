import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { healthyReport } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server } from '../../testing/server.ts';

describe('Studio desk', () => {
  it('shows a loading state, then the studios from the API', async () => {
    renderApp('/');

    expect(await screen.findByText('Gathering studios…')).toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { name: 'Kelpwhistle Dyeworks' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Brindlemoor Vats' })).toBeInTheDocument();
    expect(screen.getByText('#8c3b5e')).toBeInTheDocument();
    expect(screen.queryByText('Gathering studios…')).not.toBeInTheDocument();
  });

  it('shows the error panel on a server error, and Try again loads the studios', async () => {
    server.use(
      http.get(
        '/api/studios',
        () =>
          HttpResponse.json(
            { error: { code: 'INTERNAL', message: 'The studio list is out of reach.' } },
            { status: 500 },
          ),
        { once: true },
      ),
    );
    const { user } = renderApp('/');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Studios could not be loaded');
    expect(alert).toHaveTextContent('The studio list is out of reach.');
    expect(alert).toHaveTextContent('INTERNAL');

    await user.click(within(alert).getByRole('button', { name: 'Try again' }));

    expect(
      await screen.findByRole('heading', { name: 'Kelpwhistle Dyeworks' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('reports each service, marking a failing one as not answering', async () => {
    server.use(
      http.get('/api/health', () =>
        HttpResponse.json(
          {
            ...healthyReport,
            status: 'degraded',
            checks: {
              ...healthyReport.checks,
              mail: { ok: false, latencyMs: 2001, detail: 'SMTP connection refused' },
            },
          },
          { status: 503 },
        ),
      ),
    );
    renderApp('/');

    const panel = await screen.findByRole('region', { name: 'Service check' });
    expect(await within(panel).findByText('Some services need attention.')).toBeInTheDocument();

    const row = (name: string) => within(panel).getByText(name).closest('li') as HTMLElement;
    expect(row('Mail')).toHaveTextContent('Not answering');
    expect(row('Mail')).toHaveTextContent('SMTP connection refused');
    expect(row('Mail')).toHaveTextContent('2001 ms');
    expect(row('Database')).toHaveTextContent('Answering');
    expect(row('Database')).not.toHaveTextContent('Not answering');
    expect(row('Photo storage')).toHaveTextContent('7 ms');
  });

  it('shows an error panel when the service check gets no answer', async () => {
    server.use(http.get('/api/health', () => HttpResponse.error()));
    renderApp('/');

    const panel = await screen.findByRole('region', { name: 'Service check' });
    expect(await within(panel).findByRole('alert')).toHaveTextContent(
      'Vatside’s server did not answer.',
    );
  });
});

describe('Unknown console address', () => {
  it('shows the not-found screen inside the shell', async () => {
    renderApp('/no-such-screen');

    expect(
      await screen.findByRole('heading', { name: 'No pot on this burner' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Console sections' })).toBeInTheDocument();
  });
});
