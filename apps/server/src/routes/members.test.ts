import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitationListSchema, memberListSchema } from '@vatside/contracts/members';
import { meSchema } from '@vatside/contracts/account';
import type { RunningServer } from '../server.ts';
import { TestClient, signUpVerified } from '../test-support/client.ts';
import { uniqueRecipient, waitForMail } from '../test-support/mail-catcher.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('members: roles, a studio always keeps a host', () => {
  let server: RunningServer;
  let cast: Cast;
  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'members');
  });
  afterAll(() => server.close());

  const members = async () =>
    memberListSchema.parse(
      await (await cast.clients.host.request('GET', `/api/studios/${cast.slug}/members`)).json(),
    ).members;

  it('lists members for staff with name, e-mail and role', async () => {
    const list = await members();
    expect(list.map((m) => m.role).sort()).toEqual(['host', 'moderator', 'viewer']);
    expect(list.find((m) => m.role === 'host')?.email).toBe(cast.people.host.email);
  });

  it('lets the host promote a viewer, refuses demoting the last host, allows it once there are two', async () => {
    const base = `/api/studios/${cast.slug}/members`;
    const { host, viewer } = cast.people;
    expect(
      (await cast.clients.host.request('PATCH', `${base}/${host.userId}`, { role: 'viewer' }))
        .status,
    ).toBe(409);
    expect((await cast.clients.host.request('DELETE', `${base}/${host.userId}`)).status).toBe(409);

    const promoted = await cast.clients.host.request('PATCH', `${base}/${viewer.userId}`, {
      role: 'host',
    });
    expect(promoted.status).toBe(200);
    expect((await members()).filter((m) => m.role === 'host')).toHaveLength(2);

    expect(
      (await cast.clients.viewer.request('PATCH', `${base}/${host.userId}`, { role: 'moderator' }))
        .status,
    ).toBe(200);
    const after = await members();
    expect(after.find((m) => m.userId === host.userId)?.role).toBe('moderator');
    expect(after.filter((m) => m.role === 'host').map((m) => m.userId)).toEqual([viewer.userId]);
  });

  it('refuses an unknown role with the field named', async () => {
    const res = await cast.clients.viewer.request(
      'PATCH',
      `/api/studios/${cast.slug}/members/${cast.people.moderator.userId}`,
      {
        role: 'owner',
      },
    );
    expect(res.status).toBe(400);
  });
});

describe('invitations: a host invites a moderator by e-mail; the link works once', () => {
  let server: RunningServer;
  let cast: Cast;
  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'invite');
  });
  afterAll(() => server.close());

  it('mails a link that previews for visitors, accepts once for the invited address', async () => {
    const invitee = await signUpVerified(server, 'invitee', 'Ione Invitee');
    const sent = await cast.clients.host.request('POST', `/api/studios/${cast.slug}/invitations`, {
      email: invitee.email,
    });
    expect(sent.status).toBe(201);

    const mail = await waitForMail(invitee.email, /invites you/);
    const link = mail.text?.match(/https?:\/\/\S+\/console\/join\/([A-Za-z0-9_-]+)/);
    expect(link).toBeTruthy();
    const token = link?.[1] ?? '';

    const preview = await (
      await new TestClient(server).request('GET', `/api/invitations/${token}`)
    ).json();
    expect(preview).toMatchObject({
      role: 'moderator',
      email: invitee.email,
      status: 'waiting',
      studio: { slug: cast.slug },
    });

    const wrongPerson = await cast.clients.otherHost.request(
      'POST',
      `/api/invitations/${token}/accept`,
    );
    expect(wrongPerson.status).toBe(403);

    const accepted = await invitee.client.request('POST', `/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    const me = meSchema.parse(await (await invitee.client.request('GET', '/api/me')).json());
    expect(me.memberships).toEqual([
      expect.objectContaining({
        role: 'moderator',
        studio: expect.objectContaining({ slug: cast.slug }),
      }),
    ]);

    const again = await invitee.client.request('POST', `/api/invitations/${token}/accept`);
    expect(again.status).toBe(409);

    const list = invitationListSchema.parse(
      await (
        await cast.clients.host.request('GET', `/api/studios/${cast.slug}/invitations`)
      ).json(),
    );
    expect(list.invitations.find((i) => i.email === invitee.email)?.status).toBe('accepted');
  });

  it('a revoked invitation no longer works', async () => {
    const email = uniqueRecipient('revoked');
    const created = (await (
      await cast.clients.host.request('POST', `/api/studios/${cast.slug}/invitations`, { email })
    ).json()) as {
      id: string;
    };
    const token = (await waitForMail(email, /invites you/)).text?.match(
      /join\/([A-Za-z0-9_-]+)/,
    )?.[1];
    expect(
      (
        await cast.clients.host.request(
          'DELETE',
          `/api/studios/${cast.slug}/invitations/${created.id}`,
        )
      ).status,
    ).toBe(204);
    const preview = (await (
      await new TestClient(server).request('GET', `/api/invitations/${token}`)
    ).json()) as { status: string };
    expect(preview.status).toBe('revoked');
  });

  it('refuses an invitation to a malformed address and sends nothing', async () => {
    const res = await cast.clients.host.request('POST', `/api/studios/${cast.slug}/invitations`, {
      email: 'not-an-address',
    });
    expect(res.status).toBe(400);
  });
});
