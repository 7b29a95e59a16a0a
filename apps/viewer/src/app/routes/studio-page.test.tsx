import { screen, within } from '@testing-library/react';
import type { StudioDetail } from '@vatside/contracts/studios';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { adaMe, kelpwhistle, kelpwhistleDetail } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const studioApi = '/api/studios/kelpwhistle-dyeworks';

describe('Studio page', () => {
  it('shows the studio to a visitor, with a way to sign in and come back', async () => {
    server.use(http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail())));
    renderApp('/s/kelpwhistle-dyeworks');

    expect(
      await screen.findByRole('heading', { name: 'Kelpwhistle Dyeworks', level: 1 }),
    ).toBeVisible();
    expect(screen.getByText('Tide pool colors, dyed along once a month.')).toBeVisible();
    expect(screen.getByText('Marin Doe')).toBeVisible();
    expect(screen.getByText('1,204')).toBeVisible();
    expect(await screen.findByRole('link', { name: 'Sign in to follow' })).toHaveAttribute(
      'href',
      '/sign-in?next=%2Fs%2Fkelpwhistle-dyeworks',
    );
    expect(screen.queryByRole('button', { name: 'Follow' })).not.toBeInTheDocument();
  });

  it('follows with the e-mail choice, then unfollows', async () => {
    signIn(adaMe);
    const sent: Array<{ method: string; body: unknown }> = [];
    let current: StudioDetail = kelpwhistleDetail();
    server.use(
      http.get(studioApi, () => HttpResponse.json(current)),
      http.put(`${studioApi}/follow`, async ({ request }) => {
        const body = (await request.json()) as { mailOptIn: boolean };
        sent.push({ method: 'PUT', body });
        current = kelpwhistleDetail({
          myRole: 'viewer',
          mailOptIn: body.mailOptIn,
          followerCount: 1205,
        });
        signIn({
          ...adaMe,
          memberships: [{ studio: kelpwhistle, role: 'viewer', mailOptIn: body.mailOptIn }],
        });
        return HttpResponse.json(current);
      }),
      http.delete(`${studioApi}/follow`, () => {
        sent.push({ method: 'DELETE', body: null });
        current = kelpwhistleDetail();
        signIn(adaMe);
        return HttpResponse.json(current);
      }),
    );
    const { user } = renderApp('/s/kelpwhistle-dyeworks');

    const mail = await screen.findByRole('switch', { name: 'E-mail me about dye-alongs' });
    expect(mail).not.toBeChecked();
    await user.click(mail);
    await user.click(screen.getByRole('button', { name: 'Follow' }));

    expect(await screen.findByText('You follow this studio.')).toBeVisible();
    expect(sent).toEqual([{ method: 'PUT', body: { mailOptIn: true } }]);
    expect(screen.getByText('1,205')).toBeVisible();
    expect(screen.getByRole('switch', { name: 'E-mail me about dye-alongs' })).toBeChecked();
    expect(
      await within(screen.getByRole('banner')).findByRole('link', {
        name: 'Ada Quill · viewer at Kelpwhistle Dyeworks',
      }),
    ).toBeVisible();

    await user.click(screen.getByRole('button', { name: 'Unfollow' }));

    expect(await screen.findByRole('button', { name: 'Follow' })).toBeVisible();
    expect(sent[1]).toEqual({ method: 'DELETE', body: null });
    expect(screen.queryByText('You follow this studio.')).not.toBeInTheDocument();
  });

  it('shows a host their role without Unfollow, and the server’s answer when a change fails', async () => {
    signIn({ ...adaMe, memberships: [{ studio: kelpwhistle, role: 'host', mailOptIn: true }] });
    server.use(
      http.get(studioApi, () =>
        HttpResponse.json(kelpwhistleDetail({ myRole: 'host', mailOptIn: true })),
      ),
      http.put(`${studioApi}/follow`, () =>
        HttpResponse.json(
          { error: { code: 'INTERNAL', message: 'The mail choice could not be saved.' } },
          { status: 500 },
        ),
      ),
    );
    const { user } = renderApp('/s/kelpwhistle-dyeworks');

    expect(await screen.findByText('You host this studio.')).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Unfollow' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('switch', { name: 'E-mail me about dye-alongs' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The mail choice could not be saved.',
    );
  });
});
