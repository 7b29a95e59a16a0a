import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../testing/render-app.tsx';
import { server } from '../../testing/server.ts';

describe('Welcome', () => {
  it('shows a loading state, then studio cards with labeled color swatches', async () => {
    renderApp('/');

    expect(await screen.findByText('Finding studios…')).toBeInTheDocument();
    const section = screen.getByRole('region', { name: 'Studios to follow' });
    const cards = await within(section).findAllByRole('listitem');
    expect(cards).toHaveLength(2);
    expect(cards[0]).toHaveTextContent('Kelpwhistle Dyeworks');
    expect(cards[0]).toHaveTextContent('Tide pool colors, dyed along once a month.');
    expect(cards[0]).toHaveTextContent('Studio color');
    expect(cards[0]).toHaveTextContent('#2a7f86');
    expect(cards[1]).toHaveTextContent('Brindlemoor Vats');
    expect(within(cards[0]!).getByRole('link', { name: 'Kelpwhistle Dyeworks' })).toHaveAttribute(
      'href',
      '/s/kelpwhistle-dyeworks',
    );
    expect(screen.queryByText('Finding studios…')).not.toBeInTheDocument();
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
    expect(alert).toHaveTextContent('The studios did not load');
    expect(alert).toHaveTextContent('The studio list is out of reach.');

    await user.click(within(alert).getByRole('button', { name: 'Try again' }));

    expect(
      await screen.findByRole('heading', { name: 'Kelpwhistle Dyeworks' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('shows a note when no studio is open yet', async () => {
    server.use(http.get('/api/studios', () => HttpResponse.json({ studios: [] })));
    renderApp('/');

    expect(
      await screen.findByText('No studios are open yet. Check back soon.'),
    ).toBeInTheDocument();
  });

  it('keeps the safety note in the footer', async () => {
    renderApp('/');

    const note = await screen.findByRole('complementary', { name: 'Before you heat a pot' });
    expect(note).toHaveTextContent('safety data sheet');
    expect(note).toHaveTextContent('local codes');
  });
});

describe('Unknown viewer address', () => {
  it('shows the not-found screen inside the shell', async () => {
    renderApp('/no-such-page');

    expect(
      await screen.findByRole('heading', { name: 'No pot on this burner' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'See the studios' })).toHaveAttribute('href', '/');
  });
});
