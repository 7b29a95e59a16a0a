import { screen, within } from '@testing-library/react';
import type { DyeAlong } from '@vatside/contracts/dye-alongs';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { hostMe, kelpwhistle, kelpwhistleDetail, moderatorMe } from '../../testing/fixtures.ts';
import {
  boardAsHost,
  fakeLiveServer,
  initialState,
  program,
  sessionId,
} from '../../testing/live-fixtures.ts';
import type * as SocketModule from '../../features/live/socket.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server, signIn } from '../../testing/server.ts';

const opened = vi.hoisted(() => ({ socket: undefined as unknown }));
vi.mock('../../features/live/socket.ts', async (importOriginal) => ({
  ...(await importOriginal<typeof SocketModule>()),
  openHostSocket: () => opened.socket,
}));

const studioApi = `/api/studios/${kelpwhistle.slug}`;
const tooEarly = 'It can go live from 2 hours before its start; rehearse privately until then.';

const tidePoolMonth: DyeAlong = {
  id: program.dyeAlong.id,
  studioId: kelpwhistle.id,
  title: 'Tide pool month',
  description: '',
  status: 'announced',
  startsAt: '2026-12-12T18:00:00.000Z',
  timeZone: 'America/Halifax',
  startsAtHost: {
    timeZone: 'America/Halifax',
    local: '2026-12-12T14:00',
    label: 'Saturday, December 12, 2026 at 2:00 PM AST',
  },
  expectedLengthMin: 90,
  streamUrl: null,
  inspirationImageId: null,
  colorways: program.pots.map((pot, position) => ({
    id: pot.potId,
    name: pot.colorwayName,
    technique: 'immersion',
    position,
  })),
  shareOpensAt: null,
  shareClosesAt: null,
  hostPrepItems: [],
  statusChangedAt: '2026-11-20T10:00:00.000Z',
  announcedAt: '2026-11-20T10:00:00.000Z',
  nextStatuses: [{ to: 'live', allowed: false, reasons: [tooEarly] }],
  createdAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-20T10:00:00.000Z',
};

/** The host's stovetop with one announced month; returns what each start request asked for. */
function openStovetop() {
  signIn(hostMe);
  const asked: unknown[] = [];
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('host'))),
    http.get(`${studioApi}/live`, () => HttpResponse.json({ live: null })),
    http.get(`${studioApi}/dye-alongs`, ({ request }) => {
      const status = new URL(request.url).searchParams.get('status');
      const items = status === 'announced' ? [tidePoolMonth] : [];
      return HttpResponse.json({ items, page: { limit: 100, offset: 0, total: items.length } });
    }),
    http.post(`${studioApi}/dye-alongs/${tidePoolMonth.id}/live-sessions`, async ({ request }) => {
      const body = (await request.json()) as { mode: string };
      asked.push(body);
      if (body.mode === 'live') {
        return HttpResponse.json(
          { error: { code: 'CONFLICT', message: tooEarly } },
          { status: 409 },
        );
      }
      return HttpResponse.json({ sessionId, viewerPath: `/live/${sessionId}` }, { status: 201 });
    }),
  );
  return asked;
}

describe('Stovetop', () => {
  it('shows the server’s refusal plainly when it is too early to go live', async () => {
    const asked = openStovetop();
    const { user } = renderApp(`/studios/${kelpwhistle.slug}/live`);
    const card = await screen.findByRole('article', { name: 'Tide pool month' }, { timeout: 5000 });
    expect(card).toHaveTextContent('Saturday, December 12, 2026 at 2:00 PM AST');
    expect(card).toHaveTextContent('2 pots: Low tide, Kelp shade');

    await user.click(within(card).getByRole('button', { name: 'Go live' }));

    expect(await within(card).findByRole('alert')).toHaveTextContent(tooEarly);
    expect(asked).toEqual([{ mode: 'live' }]);
  });

  it('starts a private rehearsal and opens the pot board with its banner', async () => {
    const asked = openStovetop();
    boardAsHost();
    opened.socket = fakeLiveServer(initialState('rehearsal')).socket;
    const { user, router } = renderApp(`/studios/${kelpwhistle.slug}/live`);
    expect(
      await screen.findByText(/When you end a rehearsal it is discarded/, {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    const card = await screen.findByRole('article', { name: 'Tide pool month' });

    await user.click(within(card).getByRole('button', { name: 'Rehearse privately' }));

    expect(asked).toEqual([{ mode: 'rehearsal' }]);
    expect(
      await screen.findByText(/REHEARSAL — only you can see this/, {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(
      `/console/studios/${kelpwhistle.slug}/live/${sessionId}`,
    );
  });

  it('is for the host only', async () => {
    signIn(moderatorMe);
    server.use(http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('moderator'))));
    renderApp(`/studios/${kelpwhistle.slug}/live`);
    expect(
      await screen.findByText(
        'Only the studio’s host runs a live session or a rehearsal.',
        {},
        { timeout: 5000 },
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Rehearse privately' })).not.toBeInTheDocument();
  });
});
