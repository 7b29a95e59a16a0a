import { screen, within } from '@testing-library/react';
import type { Submission } from '@vatside/contracts/submissions';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { kelpwhistleDetail } from '../../testing/fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';
import { dyeAlongApi } from '../../testing/dye-along-fixtures.ts';
import {
  adaFollowing,
  mySkeinsApi,
  mySkeinsPath,
  openForSharing,
  skein,
} from '../../testing/sharing-fixtures.ts';

const firstLoad = { timeout: 5_000 };
const ids = {
  waiting: 'a1b2c3d4-0000-4000-8000-000000000001',
  sentBack: 'a1b2c3d4-0000-4000-8000-000000000002',
  featured: 'a1b2c3d4-0000-4000-8000-000000000003',
  declined: 'a1b2c3d4-0000-4000-8000-000000000004',
};

/** My skeins as the server keeps them; each change the screen sends is recorded and applied. */
function serveMySkeins() {
  signIn(adaFollowing);
  let items: Submission[] = [
    skein({ id: ids.waiting, baseName: 'Shoreline Sock' }),
    skein({
      id: ids.sentBack,
      colorway: null,
      baseName: 'Harbor DK',
      status: 'needsChanges',
      reason: 'The photo is a little blurry; a sharper one would show the colors.',
    }),
    skein({
      id: ids.featured,
      status: 'featured',
      consentToFeature: true,
      baseName: 'Kelp Fingering',
    }),
    skein({
      id: ids.declined,
      colorway: null,
      baseName: 'Sand Worsted',
      status: 'rejected',
      reason: 'Not yarn from this dye-along.',
    }),
  ];
  const sent: { method: string; id: string; body: unknown }[] = [];
  const one = `${mySkeinsApi}/:id`;
  server.use(
    http.get('/api/studios/kelpwhistle-dyeworks', () =>
      HttpResponse.json(kelpwhistleDetail({ myRole: 'viewer' })),
    ),
    http.get(`${dyeAlongApi}/public`, () => HttpResponse.json(openForSharing())),
    http.get(mySkeinsApi, () =>
      HttpResponse.json({ items, page: { limit: 100, offset: 0, total: items.length } }),
    ),
    http.put(`${one}/consent`, async ({ request, params }) => {
      const body = (await request.json()) as { consentToFeature: boolean };
      sent.push({ method: 'PUT', id: String(params.id), body });
      items = items.map((s) =>
        s.id === params.id
          ? {
              ...s,
              consentToFeature: body.consentToFeature,
              status: !body.consentToFeature && s.status === 'featured' ? 'approved' : s.status,
            }
          : s,
      );
      return HttpResponse.json(items.find((s) => s.id === params.id));
    }),
    http.patch(one, async ({ request, params }) => {
      const body = (await request.json()) as Partial<Submission>;
      sent.push({ method: 'PATCH', id: String(params.id), body });
      items = items.map((s) =>
        s.id === params.id ? { ...s, ...body, status: 'waiting', reason: null } : s,
      );
      return HttpResponse.json(items.find((s) => s.id === params.id));
    }),
    http.delete(one, ({ params }) => {
      sent.push({ method: 'DELETE', id: String(params.id), body: null });
      items = items.filter((s) => s.id !== params.id);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return sent;
}

const card = (name: string) => screen.getByRole('listitem', { name });

describe('My skeins', () => {
  it('says each status in plain words, with the moderator’s reason', async () => {
    serveMySkeins();
    renderApp(mySkeinsPath);
    await screen.findByRole('heading', { name: 'My skeins', level: 1 }, firstLoad);
    expect(await screen.findByRole('listitem', { name: 'Shoreline Sock' })).toHaveTextContent(
      'Waiting for review',
    );
    expect(card('Harbor DK')).toHaveTextContent('Needs changes');
    expect(card('Harbor DK')).toHaveTextContent('a little blurry');
    expect(card('Sand Worsted')).toHaveTextContent('Not accepted');
    expect(card('Sand Worsted')).toHaveTextContent('Not yarn from this dye-along.');
    // Only a skein still waiting or sent back can be changed.
    expect(within(card('Harbor DK')).getByRole('button', { name: /Change details/ })).toBeVisible();
    expect(
      within(card('Sand Worsted')).queryByRole('button', { name: /Change details/ }),
    ).toBeNull();
    expect(
      within(card('Harbor DK')).getByRole('img', { name: 'Photo 1 of this skein' }),
    ).toBeVisible();
  });

  it('edits a skein sent back; it goes back to waiting', async () => {
    const sent = serveMySkeins();
    const { user } = renderApp(mySkeinsPath);
    await screen.findByRole('listitem', { name: 'Harbor DK' }, firstLoad);
    await user.click(within(card('Harbor DK')).getByRole('button', { name: /Change details/ }));
    const notes = within(card('Harbor DK')).getByLabelText('Notes');
    await user.type(notes, 'A sharper photo by the window.');
    await user.click(within(card('Harbor DK')).getByRole('button', { name: 'Save changes' }));
    expect(await within(card('Harbor DK')).findByText('Waiting for review')).toBeVisible();
    expect(sent).toEqual([
      {
        method: 'PATCH',
        id: ids.sentBack,
        body: {
          baseName: 'Harbor DK',
          fiberContent: [{ fiber: 'wool', pct: 100 }],
          dyesUsed: ['teal gel'],
          notes: 'A sharper photo by the window.',
        },
      },
    ]);
  });

  it('names the colorway that inspired a skein shared without one', async () => {
    const sent = serveMySkeins();
    const { user } = renderApp(mySkeinsPath);
    await screen.findByRole('listitem', { name: 'Harbor DK' }, firstLoad);
    await user.click(within(card('Harbor DK')).getByRole('button', { name: /Change details/ }));
    const choice = await within(card('Harbor DK')).findByLabelText('Which colorway inspired it?');
    await user.selectOptions(choice, 'Pool Teal');
    await user.click(within(card('Harbor DK')).getByRole('button', { name: 'Save changes' }));
    expect(await within(card('Harbor DK')).findByText('Waiting for review')).toBeVisible();
    expect(sent).toEqual([
      {
        method: 'PATCH',
        id: ids.sentBack,
        body: expect.objectContaining({
          colorwayId: openForSharing().supplyList.colorways[0]!.colorwayId,
        }),
      },
    ]);
  });

  it('takes back consent to be featured, saying it leaves the recap', async () => {
    const sent = serveMySkeins();
    const { user } = renderApp(mySkeinsPath);
    await screen.findByRole('listitem', { name: 'Kelp Fingering' }, firstLoad);
    const featured = card('Kelp Fingering');
    expect(featured).toHaveTextContent('Featured');
    expect(featured).toHaveTextContent('It is in the recap now. Turning this off takes it out');
    await user.click(within(featured).getByRole('switch', { name: /feature it in the recap/ }));
    expect(await within(featured).findByText('Approved')).toBeVisible();
    expect(
      within(featured).getByRole('switch', { name: /feature it in the recap/ }),
    ).not.toBeChecked();
    expect(sent).toEqual([{ method: 'PUT', id: ids.featured, body: { consentToFeature: false } }]);
  });

  it('withdraws only after a second, explicit yes', async () => {
    const sent = serveMySkeins();
    const { user } = renderApp(mySkeinsPath);
    await screen.findByRole('listitem', { name: 'Sand Worsted' }, firstLoad);
    const declined = card('Sand Worsted');
    await user.click(within(declined).getByRole('button', { name: 'Withdraw…' }));
    const confirm = within(declined).getByRole('group', { name: 'Withdraw this skein?' });
    expect(confirm).toHaveTextContent('removed from Vatside everywhere');
    await user.click(within(confirm).getByRole('button', { name: 'Keep it' }));
    expect(sent).toEqual([]);

    await user.click(within(declined).getByRole('button', { name: 'Withdraw…' }));
    await user.click(within(declined).getByRole('button', { name: 'Yes, withdraw it' }));
    await screen.findByRole('listitem', { name: 'Shoreline Sock' });
    expect(screen.queryByRole('listitem', { name: 'Sand Worsted' })).toBeNull();
    expect(sent).toEqual([{ method: 'DELETE', id: ids.declined, body: null }]);
  });
});
