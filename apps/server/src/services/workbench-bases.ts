import { and, asc, count, eq } from '@vatside/db/sql';
import { fiberCheck, type FiberPart } from '@vatside/dye-kit';
import type { PageQuery } from '@vatside/contracts/workbench-common';
import type {
  Base,
  BaseList,
  Pot,
  PotList,
  baseCreateSchema,
  baseUpdateSchema,
  potCreateSchema,
  potUpdateSchema,
} from '@vatside/contracts/workbench-bases';
import type { Database } from '@vatside/db/client';
import { bases, pots } from '@vatside/db/schema';
import type { z } from 'zod';
import { notFound } from '../http/errors.ts';
import { isoTimestamps, pageInfo, withDyeKit } from './workbench-common.ts';

// Yarn bases (with dye-kit's fiber check) and the studio's pots.

type BaseRow = typeof bases.$inferSelect;

/** dye-kit's fiber check; bad fiber content (e.g. not adding up to 100 %) becomes a 400. */
function checkFibers(fiberContent: FiberPart[], superwash: boolean) {
  return withDyeKit('', () => fiberCheck(fiberContent, { superwash }));
}

function toBase(row: BaseRow): Base {
  const fiberContent = row.fiberContent as FiberPart[];
  const { takesDyePct, doesNotTakePct, warnings } = checkFibers(fiberContent, row.superwash);
  return {
    id: row.id,
    name: row.name,
    fiberContent,
    superwash: row.superwash,
    weightClass: row.weightClass,
    skeinWeightG: row.skeinWeightG,
    skeinLengthM: row.skeinLengthM,
    lot: row.lot,
    fiberCheck: { takesDyePct, doesNotTakePct, warnings },
    ...isoTimestamps(row),
  };
}

const baseInStudio = (studioId: string, id: string) =>
  and(eq(bases.studioId, studioId), eq(bases.id, id));

export async function listBases(
  db: Database,
  studioId: string,
  page: PageQuery,
): Promise<BaseList> {
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(bases)
      .where(eq(bases.studioId, studioId))
      .orderBy(asc(bases.name), asc(bases.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(bases).where(eq(bases.studioId, studioId)),
  ]);
  return { items: rows.map(toBase), page: pageInfo(page, total?.n ?? 0) };
}

export async function findBase(db: Database, studioId: string, baseId: string) {
  const [row] = await db.select().from(bases).where(baseInStudio(studioId, baseId));
  return row;
}

export async function getBase(db: Database, studioId: string, baseId: string): Promise<Base> {
  const row = await findBase(db, studioId, baseId);
  if (!row) throw notFound('That base');
  return toBase(row);
}

export async function createBase(
  db: Database,
  studioId: string,
  input: z.output<typeof baseCreateSchema>,
): Promise<Base> {
  checkFibers(input.fiberContent, input.superwash);
  const [row] = await db
    .insert(bases)
    .values({ studioId, ...input })
    .returning();
  return toBase(row!);
}

export async function updateBase(
  db: Database,
  studioId: string,
  baseId: string,
  patch: z.output<typeof baseUpdateSchema>,
): Promise<Base> {
  const current = await findBase(db, studioId, baseId);
  if (!current) throw notFound('That base');
  checkFibers(
    patch.fiberContent ?? (current.fiberContent as FiberPart[]),
    patch.superwash ?? current.superwash,
  );
  const [row] = await db.update(bases).set(patch).where(baseInStudio(studioId, baseId)).returning();
  return toBase(row!);
}

export async function deleteBase(db: Database, studioId: string, baseId: string): Promise<void> {
  const deleted = await db
    .delete(bases)
    .where(baseInStudio(studioId, baseId))
    .returning({ id: bases.id });
  if (deleted.length === 0) throw notFound('That base');
}

type PotRow = typeof pots.$inferSelect;

const toPot = (row: PotRow): Pot => ({
  id: row.id,
  name: row.name,
  capacityMl: row.capacityMl,
  material: row.material,
  reactsWithAcid: row.material === 'aluminum',
  ...isoTimestamps(row),
});

const potInStudio = (studioId: string, id: string) =>
  and(eq(pots.studioId, studioId), eq(pots.id, id));

export async function listPots(db: Database, studioId: string, page: PageQuery): Promise<PotList> {
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(pots)
      .where(eq(pots.studioId, studioId))
      .orderBy(asc(pots.name), asc(pots.id))
      .limit(page.limit)
      .offset(page.offset),
    db.select({ n: count() }).from(pots).where(eq(pots.studioId, studioId)),
  ]);
  return { items: rows.map(toPot), page: pageInfo(page, total?.n ?? 0) };
}

export async function findPot(db: Database, studioId: string, potId: string) {
  const [row] = await db.select().from(pots).where(potInStudio(studioId, potId));
  return row;
}

export async function getPot(db: Database, studioId: string, potId: string): Promise<Pot> {
  const row = await findPot(db, studioId, potId);
  if (!row) throw notFound('That pot');
  return toPot(row);
}

export async function createPot(
  db: Database,
  studioId: string,
  input: z.output<typeof potCreateSchema>,
): Promise<Pot> {
  const [row] = await db
    .insert(pots)
    .values({ studioId, ...input })
    .returning();
  return toPot(row!);
}

export async function updatePot(
  db: Database,
  studioId: string,
  potId: string,
  patch: z.output<typeof potUpdateSchema>,
): Promise<Pot> {
  const [row] = await db.update(pots).set(patch).where(potInStudio(studioId, potId)).returning();
  if (!row) throw notFound('That pot');
  return toPot(row);
}

export async function deletePot(db: Database, studioId: string, potId: string): Promise<void> {
  const deleted = await db
    .delete(pots)
    .where(potInStudio(studioId, potId))
    .returning({ id: pots.id });
  if (deleted.length === 0) throw notFound('That pot');
}
