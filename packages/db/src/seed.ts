import { and, eq } from 'drizzle-orm';
import type { Database } from './client.ts';
import { demoPassword, demoPeople, demoStudios } from './demo-data.ts';
import { account, studioMembers, studios, user } from './schema.ts';

export interface SeedOptions {
  /** The sign-in library's own password hash, so demo people sign in like anyone else. */
  hashPassword: (password: string) => Promise<string>;
}

/** Inserts the invented demo data; running it again changes nothing. */
export async function seedDemo(db: Database, { hashPassword }: SeedOptions): Promise<void> {
  for (const studio of demoStudios) {
    await db.insert(studios).values(studio).onConflictDoNothing({ target: studios.slug });
  }
  const studioIds = new Map(
    (await db.select({ id: studios.id, slug: studios.slug }).from(studios)).map((s) => [
      s.slug,
      s.id,
    ]),
  );
  const passwordHash = await hashPassword(demoPassword);

  for (const person of demoPeople) {
    const id = `demo-${person.email.replace(/[^a-z0-9]/g, '-')}`;
    await db
      .insert(user)
      .values({
        id,
        name: person.name,
        email: person.email,
        emailVerified: true,
        timeZone: person.timeZone,
        unitSystem: person.unitSystem,
        defaultSkeinWeightG: person.defaultSkeinWeightG,
      })
      .onConflictDoNothing({ target: user.email });
    const [existing] = await db
      .select({ id: account.id })
      .from(account)
      .where(and(eq(account.userId, id), eq(account.providerId, 'credential')));
    if (!existing) {
      await db.insert(account).values({
        id: `${id}-credential`,
        accountId: id,
        providerId: 'credential',
        userId: id,
        password: passwordHash,
      });
    }
    for (const [slug, role] of Object.entries(person.roles)) {
      const studioId = studioIds.get(slug);
      if (!studioId || !role) continue;
      await db
        .insert(studioMembers)
        .values({ studioId, userId: id, role, mailOptIn: role === 'viewer' })
        .onConflictDoNothing();
    }
  }
}
