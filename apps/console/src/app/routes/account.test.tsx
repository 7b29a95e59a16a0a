import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe, kelpwhistleDetail, members } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const authUser = {
  id: 'u-marin',
  name: 'Marin Doe',
  email: 'marin@example.test',
  emailVerified: true,
  createdAt: '2025-01-04T10:00:00.000Z',
  updatedAt: '2025-01-04T10:00:00.000Z',
};

async function fillSignIn(user: ReturnType<typeof renderApp>['user'], password: string) {
  await user.type(await screen.findByLabelText('E-mail'), 'marin@example.test');
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('Sign in', () => {
  it('shows the server’s message when the password is wrong', async () => {
    server.use(
      http.post('/api/auth/sign-in/email', () =>
        HttpResponse.json(
          { code: 'INVALID_EMAIL_OR_PASSWORD', message: 'Invalid email or password' },
          { status: 401 },
        ),
      ),
    );
    const { user } = renderApp('/sign-in');
    await fillSignIn(user, 'not-my-password');

    expect(await screen.findByRole('alert')).toHaveTextContent('Invalid email or password');
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /Marin Doe/ })).not.toBeInTheDocument();
  });

  it('returns to the studio it came from, and the header shows the person and their role', async () => {
    let sent: unknown;
    server.use(
      http.post('/api/auth/sign-in/email', async ({ request }) => {
        sent = await request.json();
        signIn(hostMe);
        return HttpResponse.json({ redirect: false, token: 'session-token', user: authUser });
      }),
      http.get('/api/studios/kelpwhistle-dyeworks', () =>
        HttpResponse.json(kelpwhistleDetail('host')),
      ),
      http.get('/api/studios/kelpwhistle-dyeworks/members', () => HttpResponse.json({ members })),
      http.get('/api/studios/kelpwhistle-dyeworks/invitations', () =>
        HttpResponse.json({ invitations: [] }),
      ),
    );
    const { user, router } = renderApp('/studios/kelpwhistle-dyeworks/members');

    // A visitor is sent to sign in first, with the way back kept in the address.
    await screen.findByRole('heading', { name: 'Sign in' });
    expect(router.state.location.search).toBe('?next=%2Fstudios%2Fkelpwhistle-dyeworks%2Fmembers');
    await fillSignIn(user, 'correct horse battery');

    const header = screen.getByRole('banner');
    expect(
      await within(header).findByRole('link', {
        name: 'Marin Doe · host of Kelpwhistle Dyeworks',
      }),
    ).toHaveAttribute('href', '/console/profile');
    expect(sent).toEqual({ email: 'marin@example.test', password: 'correct horse battery' });
    expect(await screen.findByRole('heading', { name: 'Members' })).toBeInTheDocument();
  });

  it('offers a new confirmation link when the address is not confirmed yet', async () => {
    let resent: unknown;
    server.use(
      http.post('/api/auth/sign-in/email', () =>
        HttpResponse.json(
          { code: 'EMAIL_NOT_VERIFIED', message: 'Email not verified' },
          { status: 403 },
        ),
      ),
      http.post('/api/auth/send-verification-email', async ({ request }) => {
        resent = await request.json();
        return HttpResponse.json({ status: true });
      }),
    );
    const { user } = renderApp('/sign-in');
    await fillSignIn(user, 'correct horse battery');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Confirm your address first');
    await user.click(within(alert).getByRole('button', { name: 'Send a new link' }));

    expect(
      await screen.findByText('A new link is on its way to marin@example.test.'),
    ).toBeVisible();
    expect(resent).toEqual({ email: 'marin@example.test', callbackURL: '/console/confirmed' });
  });

  it('asks the person to wait when sign-in is rate limited', async () => {
    server.use(
      http.post('/api/auth/sign-in/email', () =>
        HttpResponse.json({ message: 'Too many requests' }, { status: 429 }),
      ),
    );
    const { user } = renderApp('/sign-in');
    await fillSignIn(user, 'correct horse battery');

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many tries; wait a minute.');
  });
});

describe('Sign up', () => {
  it('holds a short password back, then sends the form and says a link is on its way', async () => {
    let sent: Record<string, unknown> | undefined;
    server.use(
      http.post('/api/auth/sign-up/email', async ({ request }) => {
        sent = (await request.json()) as Record<string, unknown>;
        return HttpResponse.json({ token: null, user: { ...authUser, emailVerified: false } });
      }),
    );
    const { user } = renderApp('/sign-up');
    await user.type(await screen.findByLabelText('Your name'), 'Marin Doe');
    await user.type(screen.getByLabelText('E-mail'), 'marin@example.test');
    const password = screen.getByLabelText(/^Password/);
    await user.type(password, 'short');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Use at least 10 characters.')).toBeInTheDocument();
    expect(password).toHaveAttribute('aria-invalid', 'true');
    expect(sent).toBeUndefined();

    await user.type(password, ' and longer');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByRole('heading', { name: 'A link is on its way' })).toBeVisible();
    expect(screen.getByText('marin@example.test')).toBeInTheDocument();
    expect(sent).toMatchObject({
      name: 'Marin Doe',
      email: 'marin@example.test',
      password: 'short and longer',
      callbackURL: '/console/confirmed',
      timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone,
    });
  });
});
