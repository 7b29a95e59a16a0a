import { randomUUID } from 'node:crypto';
import { eq } from '@vatside/db/sql';
import { afterAll, describe, expect, it } from 'vitest';
import { connectDatabase } from '@vatside/db/client';
import { studios } from '@vatside/db/schema';
import { loadConfig } from '../config.ts';

describe('PostgreSQL through Drizzle', () => {
  const handle = connectDatabase(loadConfig().DATABASE_URL, 2);
  afterAll(() => handle.close());

  it('writes a row, reads it back and deletes it', async () => {
    const slug = `round-trip-${randomUUID().slice(0, 8)}`;
    const [created] = await handle.db
      .insert(studios)
      .values({ slug, name: 'Round Trip Studio', accentHex: '#336699' })
      .returning();
    expect(created?.id).toMatch(/^[0-9a-f-]{36}$/);

    const [read] = await handle.db.select().from(studios).where(eq(studios.slug, slug));
    expect(read).toMatchObject({
      slug,
      name: 'Round Trip Studio',
      accentHex: '#336699',
      tagline: '',
    });

    await handle.db.delete(studios).where(eq(studios.slug, slug));
    expect(await handle.db.select().from(studios).where(eq(studios.slug, slug))).toHaveLength(0);
  });

  it('enforces the unique studio slug', async () => {
    const slug = `unique-${randomUUID().slice(0, 8)}`;
    await handle.db.insert(studios).values({ slug, name: 'First', accentHex: '#112233' });
    await expect(
      handle.db.insert(studios).values({ slug, name: 'Second', accentHex: '#112233' }),
    ).rejects.toThrow();
    await handle.db.delete(studios).where(eq(studios.slug, slug));
  });
});
