import { screen, within } from '@testing-library/react';
import { delay, http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { dyeAlongApi } from '../../testing/dye-along-fixtures.ts';
import { adaMe, kelpwhistleDetail } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import {
  adaFollowing,
  openForSharing,
  shareApi,
  sharePath,
  skein,
} from '../../testing/sharing-fixtures.ts';

const firstLoad = { timeout: 5_000 };
const photoFile = () =>
  new File([new Uint8Array([0xff, 0xd8, 0xff, 0xe0])], 'skein.jpg', { type: 'image/jpeg' });

/** The studio with Ada following, the month open for sharing; records each share sent. */
function serveMember() {
  signIn(adaFollowing);
  const sent: FormData[] = [];
  server.use(
    http.get('/api/studios/kelpwhistle-dyeworks', () =>
      HttpResponse.json(kelpwhistleDetail({ myRole: 'viewer' })),
    ),
    http.get(`${dyeAlongApi}/public`, () => HttpResponse.json(openForSharing())),
  );
  return sent;
}

beforeEach(() => {
  // jsdom has no object URLs; the preview only needs a stand-in address.
  vi.stubGlobal(
    'URL',
    Object.assign(URL, { createObjectURL: () => 'blob:skein', revokeObjectURL: () => {} }),
  );
});
afterEach(() => vi.unstubAllGlobals());

describe('Share your skein', () => {
  it('sends a visitor to sign in first', async () => {
    const { router } = renderApp(sharePath);
    await screen.findByRole('button', { name: 'Sign in' }, firstLoad);
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toContain(encodeURIComponent(sharePath));
  });

  it('asks someone signed in but not following to follow first', async () => {
    signIn(adaMe);
    server.use(
      http.get('/api/studios/kelpwhistle-dyeworks', () => HttpResponse.json(kelpwhistleDetail())),
    );
    renderApp(sharePath);
    await screen.findByRole('heading', { name: 'Follow Kelpwhistle Dyeworks first' }, firstLoad);
    expect(screen.getByRole('button', { name: 'Follow' })).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Share my skein' })).toBeNull();
  });

  it('says what is missing, sends nothing, and keeps consent off until turned on', async () => {
    serveMember();
    let posts = 0;
    server.use(
      http.post(shareApi, () => {
        posts += 1;
        return HttpResponse.json({}, { status: 500 });
      }),
    );
    const { user } = renderApp(sharePath);
    await screen.findByRole('heading', { name: 'Share your skein' }, firstLoad);

    const consent = screen.getByRole('switch', { name: /feature it in the recap/ });
    expect(consent).not.toBeChecked();
    expect(consent).toHaveAccessibleDescription(/turn it off at any time/);
    // The lighting tips sit with the camera button.
    expect(screen.getByText('No flash: it washes out the colors.')).toBeVisible();

    await user.type(screen.getByLabelText('Dyes used'), 'teal gel, Teal gel');
    await user.click(screen.getByRole('button', { name: 'Share my skein' }));
    expect(await screen.findByText(/3 things need a look/)).toHaveAttribute('role', 'alert');
    expect(screen.getByText('Add at least one photo of the skein.')).toBeVisible();
    expect(screen.getByLabelText('Yarn base')).toHaveAccessibleDescription(/Name the yarn base/);
    expect(screen.getByLabelText('Dyes used')).toHaveAccessibleDescription(/List each dye once/);
    expect(posts).toBe(0);
  });

  it('uploads with a progress bar, then shows the closeness in words and the yarn colors', async () => {
    serveMember();
    let details: unknown;
    let photos = 0;
    server.use(
      http.post(shareApi, async ({ request }) => {
        const form = await request.formData();
        details = JSON.parse(String(form.get('details')));
        photos = form.getAll('photos').length;
        await delay(300);
        return HttpResponse.json(skein({ id: 'a1b2c3d4-0000-4000-8000-000000000001' }), {
          status: 201,
        });
      }),
    );
    const { user } = renderApp(sharePath);
    await screen.findByRole('heading', { name: 'Share your skein' }, firstLoad);

    await user.upload(screen.getByLabelText('Choose from photos'), photoFile());
    expect(screen.getByRole('group', { name: /Yarn area on Photo 1/ })).toBeVisible();
    await user.click(screen.getByRole('button', { name: 'Bigger yarn area on Photo 1' }));
    await user.selectOptions(screen.getByLabelText('Which colorway inspired it?'), 'Pool Teal');
    await user.type(screen.getByLabelText('Yarn base'), 'Shoreline Sock');
    await user.selectOptions(screen.getByLabelText('Main fiber'), 'wool');
    await user.type(screen.getByLabelText('Dyes used'), 'teal gel,  vinegar ');
    await user.click(screen.getByRole('button', { name: 'Share my skein' }));

    expect(await screen.findByRole('progressbar', { name: 'Uploading the photos' })).toBeVisible();
    expect(screen.getByRole('button', { name: 'Sharing…' })).toBeDisabled();

    const shared = await screen.findByRole('region', { name: 'Shared' });
    expect(within(shared).getByRole('heading', { name: 'Close to the inspiration' })).toBeVisible();
    expect(shared).toHaveTextContent('Close to the inspiration, with a touch of its own.');
    expect(within(shared).getByText('moderate greenish blue')).toBeVisible();
    // Words, never a grade: no numbers at all in the result.
    expect(shared.textContent).not.toMatch(/\d|score|%/i);

    expect(photos).toBe(1);
    // The middle area (0.2–0.8) made 1.2 × bigger about its center: 0.14–0.86, worked by hand.
    expect(details).toEqual({
      colorwayId: 'c0ffee00-0000-4000-8000-000000000001',
      baseName: 'Shoreline Sock',
      fiberContent: [{ fiber: 'wool', pct: 100 }],
      dyesUsed: ['teal gel', 'vinegar'],
      notes: '',
      consentToFeature: false,
      crops: [{ x: 0.14, y: 0.14, width: 0.72, height: 0.72 }],
    });
  });

  it('shows the server’s refusal and keeps everything typed and picked', async () => {
    serveMember();
    server.use(
      http.post(shareApi, () =>
        HttpResponse.json(
          {
            error: {
              code: 'QUOTA_EXCEEDED',
              message:
                'Your skein photos in this studio use 99.0 MB of the 100.0 MB each member may keep.',
            },
          },
          { status: 413 },
        ),
      ),
    );
    const { user } = renderApp(sharePath);
    await screen.findByRole('heading', { name: 'Share your skein' }, firstLoad);
    await user.upload(screen.getByLabelText('Choose from photos'), photoFile());
    await user.type(screen.getByLabelText('Yarn base'), 'Shoreline Sock');
    await user.click(screen.getByRole('switch', { name: /feature it in the recap/ }));
    await user.click(screen.getByRole('button', { name: 'Share my skein' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(
      /99.0 MB of the 100.0 MB.*Nothing you added is lost/,
    );
    expect(screen.getByLabelText('Yarn base')).toHaveValue('Shoreline Sock');
    expect(screen.getByRole('switch', { name: /feature it in the recap/ })).toBeChecked();
    expect(screen.getByRole('group', { name: /Yarn area on Photo 1/ })).toBeVisible();
  });
});
