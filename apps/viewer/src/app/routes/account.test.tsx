import { screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { adaMe } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const authUser = {
  id: 'u-ada',
  name: 'Ada Quill',
  email: 'ada.quill@example.test',
  emailVerified: true,
  createdAt: '2025-03-20T10:00:00.000Z',
  updatedAt: '2025-03-20T10:00:00.000Z',
};

describe('Sign in on a phone', () => {
  it('shows the server’s message, then on a second try the header shows the person', async () => {
    server.use(
      http.post(
        '/api/auth/sign-in/email',
        () =>
          HttpResponse.json(
            { code: 'INVALID_EMAIL_OR_PASSWORD', message: 'Invalid email or password' },
            { status: 401 },
          ),
        { once: true },
      ),
      http.post('/api/auth/sign-in/email', () => {
        signIn(adaMe);
        return HttpResponse.json({ redirect: false, token: 'session-token', user: authUser });
      }),
    );
    const { user, router } = renderApp('/sign-in');
    await user.type(await screen.findByLabelText('E-mail'), 'ada.quill@example.test');
    await user.type(screen.getByLabelText('Password'), 'not my password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Invalid email or password');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(
      await within(screen.getByRole('banner')).findByRole('link', { name: 'Ada Quill' }),
    ).toHaveAttribute('href', '/profile');
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });
});

describe('Sign up on a phone', () => {
  it('holds a short password back, then says a link is on its way', async () => {
    let sent: Record<string, unknown> | undefined;
    server.use(
      http.post('/api/auth/sign-up/email', async ({ request }) => {
        sent = (await request.json()) as Record<string, unknown>;
        return HttpResponse.json({ token: null, user: { ...authUser, emailVerified: false } });
      }),
    );
    const { user } = renderApp('/sign-up?next=%2Fs%2Fkelpwhistle-dyeworks');
    await user.type(await screen.findByLabelText('Your name'), 'Ada Quill');
    await user.type(screen.getByLabelText('E-mail'), 'ada.quill@example.test');
    await user.type(screen.getByLabelText(/^Password/), '123456789');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Use at least 10 characters.')).toBeInTheDocument();
    expect(sent).toBeUndefined();

    await user.type(screen.getByLabelText(/^Password/), '0');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByRole('heading', { name: 'A link is on its way' })).toBeVisible();
    expect(sent).toMatchObject({
      password: '1234567890',
      callbackURL: '/confirmed?next=%2Fs%2Fkelpwhistle-dyeworks',
    });
  });
});

describe('Profile on a phone', () => {
  it('saves the skein weight and units, and shows them', async () => {
    signIn(adaMe);
    let sent: unknown;
    server.use(
      http.patch('/api/me/profile', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({
          ...adaMe.profile,
          unitSystem: 'metric',
          defaultSkeinWeightG: 50,
        });
      }),
    );
    const { user } = renderApp('/profile');

    const weight = await screen.findByLabelText('My usual skein weight (grams)');
    await user.clear(weight);
    await user.type(weight, '50');
    expect(screen.getByText('g ≈ 1.8 oz')).toBeInTheDocument();
    await user.click(screen.getByRole('radio', { name: /Metric/ }));
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Profile saved.');
    expect(sent).toMatchObject({ unitSystem: 'metric', defaultSkeinWeightG: 50 });
    expect(weight).toHaveValue(50);
    expect(screen.getByRole('radio', { name: /Metric/ })).toBeChecked();
    expect(screen.getByRole('button', { name: 'Save profile' })).toBeDisabled();
  });
});
