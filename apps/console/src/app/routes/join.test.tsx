import { screen } from '@testing-library/react';
import type { Me } from '@vatside/contracts/account';
import { http, HttpResponse } from 'msw';
import { beforeEach, describe, expect, it } from 'vitest';
import { kelpwhistle, kelpwhistleDetail, members } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const lune: Me = {
  profile: {
    id: 'u-lune',
    name: 'Lune Harrow',
    email: 'lune@example.test',
    emailVerified: true,
    timeZone: 'UTC',
    unitSystem: 'metric',
    defaultSkeinWeightG: 100,
  },
  memberships: [],
};

beforeEach(() => {
  server.use(
    http.get('/api/invitations/tok-123', () =>
      HttpResponse.json({
        studio: kelpwhistle,
        role: 'moderator',
        email: 'lune@example.test',
        status: 'waiting',
      }),
    ),
  );
});

describe('Join page', () => {
  it('accepts the invitation and opens the studio', async () => {
    signIn(lune);
    let accepted = false;
    server.use(
      http.post('/api/invitations/tok-123/accept', () => {
        accepted = true;
        signIn({
          ...lune,
          memberships: [{ studio: kelpwhistle, role: 'moderator', mailOptIn: false }],
        });
        return HttpResponse.json({ studioSlug: 'kelpwhistle-dyeworks' });
      }),
      http.get('/api/studios/kelpwhistle-dyeworks', () =>
        HttpResponse.json(kelpwhistleDetail('moderator')),
      ),
      http.get('/api/studios/kelpwhistle-dyeworks/members', () => HttpResponse.json({ members })),
    );
    const { user, router } = renderApp('/join/tok-123');

    expect(
      await screen.findByRole('heading', { name: 'Help run Kelpwhistle Dyeworks as moderator' }),
    ).toBeVisible();
    await user.click(
      await screen.findByRole('button', { name: 'Accept and join Kelpwhistle Dyeworks' }),
    );

    expect(await screen.findByRole('heading', { name: 'Members' })).toBeVisible();
    expect(accepted).toBe(true);
    expect(router.state.location.pathname).toBe('/console/studios/kelpwhistle-dyeworks/members');
    expect(
      await screen.findByRole('link', { name: 'Lune Harrow · moderator of Kelpwhistle Dyeworks' }),
    ).toBeVisible();
  });

  it('asks a visitor to sign in or sign up, then to come back', async () => {
    renderApp('/join/tok-123');

    expect(await screen.findByRole('link', { name: 'Sign in to accept' })).toHaveAttribute(
      'href',
      '/console/sign-in?email=lune%40example.test&next=%2Fjoin%2Ftok-123',
    );
    expect(screen.getByRole('link', { name: 'Create an account' })).toHaveAttribute(
      'href',
      '/console/sign-up?email=lune%40example.test&next=%2Fjoin%2Ftok-123',
    );
  });

  it('shows the server’s refusal when signed in with another address', async () => {
    signIn({ ...lune, profile: { ...lune.profile, email: 'other@example.test' } });
    server.use(
      http.post('/api/invitations/tok-123/accept', () =>
        HttpResponse.json(
          { error: { code: 'FORBIDDEN', message: 'This invitation is for another address.' } },
          { status: 403 },
        ),
      ),
    );
    const { user } = renderApp('/join/tok-123');
    await user.click(
      await screen.findByRole('button', { name: 'Accept and join Kelpwhistle Dyeworks' }),
    );

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'This invitation is for another address.',
    );
  });
});
