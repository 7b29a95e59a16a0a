import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { hostMe } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

// Any zone the runtime offers other than the profile's own.
const otherZone = Intl.supportedValuesOf('timeZone').find((zone) => zone !== 'UTC') ?? 'UTC';

describe('Profile', () => {
  it('saves the changes and shows the new values', async () => {
    signIn(hostMe);
    let sent: unknown;
    server.use(
      http.patch('/api/me/profile', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json({
          ...hostMe.profile,
          name: 'Marin Doe-Quill',
          timeZone: otherZone,
          unitSystem: 'metric',
          defaultSkeinWeightG: 115,
        });
      }),
    );
    const { user } = renderApp('/profile');

    const name = await screen.findByLabelText('Display name');
    expect(name).toHaveValue('Marin Doe');
    const weight = screen.getByLabelText('My usual skein weight (grams)');
    expect(screen.getByText('g ≈ 3.5 oz')).toBeInTheDocument();

    await user.clear(name);
    await user.type(name, 'Marin Doe-Quill');
    await user.selectOptions(screen.getByLabelText('Time zone'), otherZone);
    await user.click(screen.getByRole('radio', { name: /Metric/ }));
    await user.clear(weight);
    await user.type(weight, '115');
    expect(screen.getByText('g ≈ 4.1 oz')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByRole('status')).toHaveTextContent('Profile saved.');
    expect(sent).toEqual({
      name: 'Marin Doe-Quill',
      timeZone: otherZone,
      unitSystem: 'metric',
      defaultSkeinWeightG: 115,
    });
    expect(
      within(screen.getByRole('banner')).getByRole('link', { name: 'Marin Doe-Quill' }),
    ).toBeVisible();
    expect(name).toHaveValue('Marin Doe-Quill');
    expect(screen.getByRole('radio', { name: /Metric/ })).toBeChecked();
    expect(weight).toHaveValue(115);
  });

  it('puts the server’s field message next to the field', async () => {
    signIn(hostMe);
    server.use(
      http.patch('/api/me/profile', () =>
        HttpResponse.json(
          {
            error: {
              code: 'VALIDATION_FAILED',
              message: 'Check the marked fields.',
              fields: { name: ['That name is reserved.'] },
            },
          },
          { status: 422 },
        ),
      ),
    );
    const { user } = renderApp('/profile');
    await user.type(await screen.findByLabelText('Display name'), '!');
    await user.click(screen.getByRole('button', { name: 'Save profile' }));

    expect(await screen.findByText('That name is reserved.')).toBeInTheDocument();
    expect(screen.getByLabelText('Display name')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('alert')).toHaveTextContent('Check the marked fields.');
  });

  it('shows why the server refuses to delete the only host’s account', async () => {
    signIn(hostMe);
    let sent: unknown;
    server.use(
      http.post('/api/auth/delete-user', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(
          {
            code: 'BAD_REQUEST',
            message:
              'You are the only host of Kelpwhistle Dyeworks. Make someone else a host first.',
          },
          { status: 400 },
        );
      }),
    );
    const { user } = renderApp('/profile');
    await user.click(await screen.findByRole('button', { name: 'Delete my account…' }));
    await user.type(screen.getByLabelText('Your password, to confirm'), 'correct horse battery');
    await user.click(screen.getByRole('button', { name: 'Delete my account for good' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'You are the only host of Kelpwhistle Dyeworks.',
    );
    expect(sent).toEqual({ password: 'correct horse battery' });
  });

  it('sends a visitor to sign in first', async () => {
    const { router } = renderApp('/profile');
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?next=%2Fprofile');
  });
});
