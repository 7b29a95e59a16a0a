import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { kelpwhistle } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server } from '../../testing/server.ts';

const token = 'eyJzIjoia2VscCJ9.c2lnbmF0dXJlLWhlcmU';
const studio = { slug: kelpwhistle.slug, name: kelpwhistle.name };

describe('Unsubscribe page', () => {
  it('says which studio, stops its e-mails with one press (sent once), then confirms', async () => {
    const posts: string[] = [];
    server.use(
      http.get('/api/mail/unsubscribe', () => HttpResponse.json({ studio, mailOptIn: true })),
      http.post('/api/mail/unsubscribe', ({ request }) => {
        posts.push(new URL(request.url).searchParams.get('token') ?? '');
        return HttpResponse.json({ studio, mailOptIn: false });
      }),
    );
    const { user } = renderApp(`/unsubscribe?token=${token}`);

    expect(
      await screen.findByRole(
        'heading',
        { name: 'Stop e-mails from Kelpwhistle Dyeworks?' },
        { timeout: 5_000 },
      ),
    ).toBeVisible();
    expect(posts).toEqual([]);
    // A wet double tap.
    await user.dblClick(screen.getByRole('button', { name: 'Stop these e-mails' }));

    const done = await screen.findByRole('heading', { name: 'Done: no more e-mails' });
    expect(done).toHaveFocus();
    expect(posts).toEqual([token]);
  });
});
