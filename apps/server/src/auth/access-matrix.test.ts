import { randomUUID } from 'node:crypto';
import type { Router } from 'express';
import { io as connect } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRouters } from '../app.ts';
import { clientEventNames } from '../realtime/socket-server.ts';
import type { RunningServer } from '../server.ts';
import { castStudio, personaNames, type Cast, type PersonaName } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

// 'allow' = the role check lets the request through (any status but 401/403, never 5xx);
// a number is the exact status the role check must answer.
type Expect = 'allow' | 401 | 403;
type Row = Record<PersonaName, Expect>;
const everyone: Row = {
  visitor: 'allow',
  viewer: 'allow',
  moderator: 'allow',
  host: 'allow',
  otherHost: 'allow',
};
const signedIn: Row = { ...everyone, visitor: 401 };
const staff: Row = { visitor: 401, viewer: 403, moderator: 'allow', host: 'allow', otherHost: 403 };
const hostOnly: Row = { ...staff, moderator: 403 };

interface RouteCase {
  expect: Row;
  path: (cast: Cast) => string;
  body?: (cast: Cast) => unknown;
}

const noUser = 'no-such-user';
const noToken = 'x'.repeat(43);

/** Every API route: a route missing here (or listed but gone) fails the first test. */
const routes: Record<string, RouteCase> = {
  'GET /api/health': { expect: everyone, path: () => '/api/health' },
  'GET /api/me': { expect: signedIn, path: () => '/api/me' },
  'PATCH /api/me/profile': {
    expect: signedIn,
    path: () => '/api/me/profile',
    body: () => ({ unitSystem: 'metric' }),
  },
  'GET /api/studios': { expect: everyone, path: () => '/api/studios' },
  'POST /api/studios': {
    expect: signedIn,
    path: () => '/api/studios',
    body: () => ({
      name: 'Matrix Studio',
      slug: `matrix-${randomUUID().slice(0, 8)}`,
      accentHex: '#123456',
    }),
  },
  'GET /api/studios/:slug': { expect: everyone, path: (c) => `/api/studios/${c.slug}` },
  'PUT /api/studios/:slug/follow': {
    expect: signedIn,
    path: (c) => `/api/studios/${c.slug}/follow`,
    body: () => ({ mailOptIn: false }),
  },
  'DELETE /api/studios/:slug/follow': {
    expect: signedIn,
    path: (c) => `/api/studios/${c.slug}/follow`,
  },
  'GET /api/studios/:slug/members': {
    expect: staff,
    path: (c) => `/api/studios/${c.slug}/members`,
  },
  'PATCH /api/studios/:slug/members/:userId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/members/${noUser}`,
    body: () => ({ role: 'viewer' }),
  },
  'DELETE /api/studios/:slug/members/:userId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/members/${noUser}`,
  },
  'GET /api/studios/:slug/invitations': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations`,
  },
  'POST /api/studios/:slug/invitations': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations`,
    body: () => ({ email: `matrix-${randomUUID().slice(0, 6)}@example.test` }),
  },
  'DELETE /api/studios/:slug/invitations/:invitationId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations/${randomUUID()}`,
  },
  'GET /api/invitations/:token': { expect: everyone, path: () => `/api/invitations/${noToken}` },
  'POST /api/invitations/:token/accept': {
    expect: signedIn,
    path: () => `/api/invitations/${noToken}/accept`,
  },
};

type SocketExpect = 'ok' | 'UNAUTHENTICATED' | 'FORBIDDEN';
const socketEvents: Record<
  (typeof clientEventNames)[number],
  { expect: Record<PersonaName, SocketExpect>; payload: (c: Cast) => unknown }
> = {
  'clock:ping': {
    expect: { visitor: 'ok', viewer: 'ok', moderator: 'ok', host: 'ok', otherHost: 'ok' },
    payload: () => ({ clientSentAtMs: Date.now() }),
  },
  'studio:watch': {
    expect: { visitor: 'ok', viewer: 'ok', moderator: 'ok', host: 'ok', otherHost: 'ok' },
    payload: (c) => ({ slug: c.slug }),
  },
  'members:watch': {
    expect: {
      visitor: 'UNAUTHENTICATED',
      viewer: 'FORBIDDEN',
      moderator: 'ok',
      host: 'ok',
      otherHost: 'FORBIDDEN',
    },
    payload: (c) => ({ slug: c.slug }),
  },
};

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

describe('access matrix: every route and socket event against every role', () => {
  let server: RunningServer;
  let cast: Cast;

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'matrix');
  });
  afterAll(() => server.close());

  it('lists exactly the routes the server really has', () => {
    const real = apiRouters.flatMap((make) =>
      ((make(server.deps) as Router).stack as RouteLayer[]).flatMap((layer) =>
        layer.route
          ? Object.keys(layer.route.methods).map(
              (m) => `${m.toUpperCase()} /api${layer.route?.path}`,
            )
          : [],
      ),
    );
    expect(real.sort()).toEqual(Object.keys(routes).sort());
  });

  for (const persona of personaNames) {
    it(`routes as ${persona}`, async () => {
      const client = cast.clients[persona];
      const wrong: string[] = [];
      for (const [key, route] of Object.entries(routes)) {
        const method = key.split(' ')[0] ?? 'GET';
        const res = await client.request(method, route.path(cast), route.body?.(cast));
        const expected = route.expect[persona];
        const ok =
          expected === 'allow'
            ? ![401, 403].includes(res.status) && res.status < 500
            : res.status === expected;
        if (!ok) wrong.push(`${key}: expected ${expected}, got ${res.status}`);
      }
      expect(wrong).toEqual([]);
    });

    it(`socket events as ${persona}`, async () => {
      const cookie = (cast.clients[persona] as unknown as { cookies: Map<string, string> }).cookies;
      const socket = connect(server.url, {
        transports: ['websocket'],
        extraHeaders: { cookie: [...cookie].map(([k, v]) => `${k}=${v}`).join('; ') },
      });
      const wrong: string[] = [];
      try {
        for (const [event, spec] of Object.entries(socketEvents)) {
          const reply = (await socket
            .timeout(5000)
            .emitWithAck(event as 'studio:watch', spec.payload(cast) as { slug: string })) as {
            error?: { code: string };
          };
          const got = reply.error?.code ?? 'ok';
          if (got !== spec.expect[persona])
            wrong.push(`${event}: expected ${spec.expect[persona]}, got ${got}`);
        }
      } finally {
        socket.disconnect();
      }
      expect(wrong).toEqual([]);
    });
  }

  it('lists exactly the socket events the server handles', () => {
    expect([...clientEventNames].sort()).toEqual(Object.keys(socketEvents).sort());
  });
});
