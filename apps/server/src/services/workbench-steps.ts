import { and, asc, eq, max } from '@vatside/db/sql';
import {
  stepCueRule,
  type Step,
  type StepList,
  type stepCreateSchema,
  type stepOrderSchema,
  type stepUpdateSchema,
} from '@vatside/contracts/workbench-colorways';
import type { Database } from '@vatside/db/client';
import { colorways, runSheetSteps } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { colorwayOrThrow } from './workbench-colorways.ts';
import { isoTimestamps } from './workbench-common.ts';

// A colorway's run sheet: ordered steps, each with an optional amount, timer, temperature and
// caution. Positions are 1..n with no gaps.

type StepRow = typeof runSheetSteps.$inferSelect;
type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** A run sheet longer than this is a mistake, not a recipe. */
const MAX_STEPS = 200;

const toStep = (row: StepRow): Step => ({
  id: row.id,
  colorwayId: row.colorwayId,
  position: row.position,
  instruction: row.instruction,
  recipeLineId: row.recipeLineId,
  timerSeconds: row.timerSeconds,
  temperatureC: row.temperatureC,
  visualCue: row.visualCue,
  caution: row.caution,
  ...isoTimestamps(row),
});

async function stepsOf(db: Database | Tx, colorwayId: string): Promise<StepRow[]> {
  return db
    .select()
    .from(runSheetSteps)
    .where(eq(runSheetSteps.colorwayId, colorwayId))
    .orderBy(asc(runSheetSteps.position), asc(runSheetSteps.createdAt));
}

/** Serializes edits of one run sheet so two reorders cannot interleave. */
async function lockRunSheet(tx: Tx, colorwayId: string) {
  await tx
    .select({ id: colorways.id })
    .from(colorways)
    .where(eq(colorways.id, colorwayId))
    .for('update');
}

async function renumber(tx: Tx, orderedIds: string[]) {
  for (const [i, id] of orderedIds.entries()) {
    await tx
      .update(runSheetSteps)
      .set({ position: i + 1 })
      .where(eq(runSheetSteps.id, id));
  }
}

function requireLine(lineIds: string[], recipeLineId: string | null | undefined) {
  if (recipeLineId && !lineIds.includes(recipeLineId)) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'That recipe line is not in this colorway.', {
      recipeLineId: ['Pick one of this colorway’s recipe lines.'],
    });
  }
}

export async function listSteps(
  db: Database,
  studioId: string,
  colorwayId: string,
): Promise<StepList> {
  await colorwayOrThrow(db, studioId, colorwayId);
  return { steps: (await stepsOf(db, colorwayId)).map(toStep) };
}

export async function createStep(
  db: Database,
  studioId: string,
  colorwayId: string,
  input: z.output<typeof stepCreateSchema>,
): Promise<Step> {
  const colorway = await colorwayOrThrow(db, studioId, colorwayId);
  requireLine(
    colorway.recipeLines.map((l) => l.id),
    input.recipeLineId,
  );
  const row = await db.transaction(async (tx) => {
    await lockRunSheet(tx, colorwayId);
    const [last] = await tx
      .select({ position: max(runSheetSteps.position) })
      .from(runSheetSteps)
      .where(eq(runSheetSteps.colorwayId, colorwayId));
    const position = (last?.position ?? 0) + 1;
    if (position > MAX_STEPS) {
      throw new HttpError(409, 'CONFLICT', `A run sheet holds at most ${MAX_STEPS} steps.`);
    }
    const [inserted] = await tx
      .insert(runSheetSteps)
      .values({ colorwayId, position, ...input })
      .returning();
    return inserted!;
  });
  return toStep(row);
}

async function stepOrThrow(db: Database, colorwayId: string, stepId: string) {
  const [row] = await db
    .select()
    .from(runSheetSteps)
    .where(and(eq(runSheetSteps.colorwayId, colorwayId), eq(runSheetSteps.id, stepId)));
  if (!row) throw notFound('That step');
  return row;
}

export async function updateStep(
  db: Database,
  studioId: string,
  colorwayId: string,
  stepId: string,
  patch: z.output<typeof stepUpdateSchema>,
): Promise<Step> {
  const colorway = await colorwayOrThrow(db, studioId, colorwayId);
  const current = await stepOrThrow(db, colorwayId, stepId);
  requireLine(
    colorway.recipeLines.map((l) => l.id),
    patch.recipeLineId,
  );
  if (!stepCueRule.check({ ...current, ...patch })) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'The step has missing or invalid fields.', {
      [stepCueRule.path.join('.')]: [stepCueRule.message],
    });
  }
  const [row] = await db
    .update(runSheetSteps)
    .set(patch)
    .where(eq(runSheetSteps.id, stepId))
    .returning();
  return toStep(row!);
}

export async function deleteStep(
  db: Database,
  studioId: string,
  colorwayId: string,
  stepId: string,
): Promise<StepList> {
  await colorwayOrThrow(db, studioId, colorwayId);
  await stepOrThrow(db, colorwayId, stepId);
  await db.transaction(async (tx) => {
    await lockRunSheet(tx, colorwayId);
    await tx.delete(runSheetSteps).where(eq(runSheetSteps.id, stepId));
    await renumber(
      tx,
      (await stepsOf(tx, colorwayId)).map((s) => s.id),
    );
  });
  return listSteps(db, studioId, colorwayId);
}

/** Puts the steps in the order given; every step of the run sheet must be listed once. */
export async function reorderSteps(
  db: Database,
  studioId: string,
  colorwayId: string,
  { stepIds }: z.output<typeof stepOrderSchema>,
): Promise<StepList> {
  await colorwayOrThrow(db, studioId, colorwayId);
  await db.transaction(async (tx) => {
    await lockRunSheet(tx, colorwayId);
    const existing = new Set((await stepsOf(tx, colorwayId)).map((s) => s.id));
    const sameSteps = stepIds.length === existing.size && stepIds.every((id) => existing.has(id));
    if (!sameSteps) {
      throw new HttpError(400, 'VALIDATION_FAILED', 'Send every step of this run sheet once.', {
        stepIds: [`This run sheet has ${existing.size} steps; list each of them exactly once.`],
      });
    }
    await renumber(tx, stepIds);
  });
  return listSteps(db, studioId, colorwayId);
}
