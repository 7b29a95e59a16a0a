import { randomUUID } from 'node:crypto';
import { studioMembers } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { TestClient, signUpVerified, type TestPerson } from './client.ts';

export const personaNames = ['visitor', 'viewer', 'moderator', 'host', 'otherHost'] as const;
export type PersonaName = (typeof personaNames)[number];

export interface Cast {
  slug: string;
  studioId: string;
  otherSlug: string;
  people: Record<Exclude<PersonaName, 'visitor'>, TestPerson>;
  clients: Record<PersonaName, TestClient>;
}

/** A studio with a host, a moderator and a viewer, plus the host of another studio. */
export async function castStudio(server: RunningServer, label: string): Promise<Cast> {
  const suffix = randomUUID().slice(0, 8);
  const [host, moderator, viewer, otherHost] = await Promise.all([
    signUpVerified(server, `${label}-host`, 'Harbor Host'),
    signUpVerified(server, `${label}-mod`, 'Mina Moderator'),
    signUpVerified(server, `${label}-viewer`, 'Vale Viewer'),
    signUpVerified(server, `${label}-other`, 'Otto Otherhost'),
  ]);
  const slug = `${label}-${suffix}`;
  const otherSlug = `${label}-other-${suffix}`;
  const created = await host.client.request('POST', '/api/studios', {
    name: 'Rockpool Test Studio',
    slug,
    accentHex: '#1f6f78',
  });
  if (created.status !== 201) throw new Error(`studio create failed ${created.status}`);
  const { id: studioId } = (await created.json()) as { id: string };
  await otherHost.client.request('POST', '/api/studios', {
    name: 'Elsewhere Studio',
    slug: otherSlug,
    accentHex: '#b5532b',
  });
  await server.deps.database.db.insert(studioMembers).values([
    { studioId, userId: moderator.userId, role: 'moderator' },
    { studioId, userId: viewer.userId, role: 'viewer' },
  ]);
  return {
    slug,
    studioId,
    otherSlug,
    people: { host, moderator, viewer, otherHost },
    clients: {
      visitor: new TestClient(server),
      viewer: viewer.client,
      moderator: moderator.client,
      host: host.client,
      otherHost: otherHost.client,
    },
  };
}
