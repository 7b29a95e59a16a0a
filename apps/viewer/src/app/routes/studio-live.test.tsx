import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { kelpwhistleDetail } from '../../testing/fixtures.ts';
import { program, sessionId } from '../../testing/live-fixtures.ts';
import { renderApp } from '../../testing/render-app.tsx';
import { server } from '../../testing/server.ts';

vi.mock('socket.io-client', async () => ({
  io: (await import('../../testing/fake-socket.ts')).fakeIo,
}));

// Both route modules are lazy: transform them once up front, not inside a test's timeout.
beforeAll(() => Promise.all([import('./studio-live.tsx'), import('./live-follow.tsx')]), 30_000);

const liveNow = {
  live: {
    sessionId,
    dyeAlongId: 'da-tide',
    title: 'Tide Pool Month',
    startedAt: '2025-05-10T17:00:00.000Z',
  },
};

describe('Finding a studio’s live session', () => {
  it('says so kindly when nothing is on the stove', async () => {
    renderApp('/s/kelpwhistle-dyeworks/live');
    expect(
      await screen.findByRole('heading', { name: 'Nothing on the stove right now' }),
    ).toBeVisible();
    expect(screen.getByRole('link', { name: 'See the studio’s page' })).toHaveAttribute(
      'href',
      '/s/kelpwhistle-dyeworks',
    );
  });

  it('goes straight to the running session', async () => {
    server.use(
      http.get('/api/studios/kelpwhistle-dyeworks/live', () => HttpResponse.json(liveNow)),
      http.get(`/api/live-sessions/${sessionId}/program`, () => HttpResponse.json(program)),
    );
    const { router } = renderApp('/s/kelpwhistle-dyeworks/live');
    expect(await screen.findByRole('region', { name: 'Sea Glass' })).toBeVisible();
    expect(router.state.location.pathname).toBe(`/live/${sessionId}`);
  });

  it('offers “Follow live” on the studio page while a session runs', async () => {
    server.use(
      http.get('/api/studios/kelpwhistle-dyeworks', () => HttpResponse.json(kelpwhistleDetail())),
      http.get('/api/studios/kelpwhistle-dyeworks/live', () => HttpResponse.json(liveNow)),
    );
    renderApp('/s/kelpwhistle-dyeworks');
    const live = await screen.findByRole('region', { name: 'Live now' });
    expect(within(live).getByText('Tide Pool Month')).toBeVisible();
    expect(within(live).getByRole('link', { name: 'Follow live' })).toHaveAttribute(
      'href',
      `/live/${sessionId}`,
    );
  });
});
