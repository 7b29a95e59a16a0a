import { foodColorAmount, stockVolumeMl } from '@vatside/dye-kit';
import type {
  DyeAlongDyeLog,
  DyeLogChange,
  DyeLogEntry,
  DyeLogLine,
  DyeLogPot,
  SessionDyeLog,
  dyeLogCorrectSchema,
  dyeLogRecordSchema,
} from '@vatside/contracts/dye-log';
import type { LiveProgram, LiveProgramPot } from '@vatside/contracts/live-program';
import type { RecipeLine } from '@vatside/contracts/workbench-colorways';
import type { Database } from '@vatside/db/client';
import {
  colorways,
  dyeLogEntries,
  dyes,
  liveSessions,
  stockSolutions,
  user,
} from '@vatside/db/schema';
import { and, asc, desc, eq, inArray } from '@vatside/db/sql';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { pgErrorCode } from '../services/workbench-common.ts';
import { sessionProgram, sessionState, type LiveSessionRow } from './sessions.ts';

// The dye log: the single record of what went into each pot. Jars on the shelf go down only
// here (and by a manual adjustment on the shelf), in the same transaction as the entry.

type EntryRow = typeof dyeLogEntries.$inferSelect;
type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

const conflict = (message: string) => new HttpError(409, 'CONFLICT', message);
const round = (n: number, places = 2) => Number(n.toFixed(places));

/** Equal within half a percent: a confirmed prefill, not an adjustment. */
const matchesPlan = (amount: number, planned: number) =>
  Math.abs(amount - planned) <= Math.max(planned * 0.005, 1e-9);

/** dye-kit's amount of one recipe line for the host's skeins (one skein's weight × skeins). */
function plannedAmount(line: RecipeLine, weightOfGoodsG: number): number {
  if (line.kind === 'stock') {
    return stockVolumeMl({
      weightOfGoodsG,
      stockStrengthPct: line.stockStrengthPct,
      depthOfShadePct: line.depthOfShadePct,
    });
  }
  return foodColorAmount({ amountPer100g: line.amountPer100g, unit: line.unit, weightOfGoodsG })
    .amount;
}

const lineName = (line: RecipeLine) =>
  line.kind === 'stock' ? `${line.dyeName} ${line.stockStrengthPct} %` : line.colorName;
const lineUnit = (line: RecipeLine) => (line.kind === 'stock' ? 'mL' : line.unit);
const lineJar = (line: RecipeLine) => (line.kind === 'stock' ? line.stockSolutionId : null);

async function skeinCounts(db: Database, potIds: string[]) {
  if (potIds.length === 0) return new Map<string, number>();
  const rows = await db
    .select({ id: colorways.id, skeinCount: colorways.skeinCount })
    .from(colorways)
    .where(inArray(colorways.id, potIds));
  return new Map(rows.map((r) => [r.id, r.skeinCount]));
}

async function jarLevels(db: Database, studioId: string, jarIds: string[]) {
  if (jarIds.length === 0) return new Map<string, number>();
  const rows = await db
    .select({ id: stockSolutions.id, left: stockSolutions.volumeLeftMl })
    .from(stockSolutions)
    .where(and(eq(stockSolutions.studioId, studioId), inArray(stockSolutions.id, jarIds)));
  return new Map(rows.map((r) => [r.id, r.left]));
}

/** Entries still in force: every first record or correction that nothing superseded. */
function inForce(entries: EntryRow[]): EntryRow[] {
  const superseded = new Set(entries.map((e) => e.supersedesId).filter(Boolean));
  return entries.filter((e) => !superseded.has(e.id));
}

/** The plan of each pot for the host's skeins, with what is logged against each line. */
async function potsWithPlan(
  db: Database,
  studioId: string,
  pots: LiveProgramPot[],
  entries: EntryRow[],
): Promise<DyeLogPot[]> {
  const counts = await skeinCounts(
    db,
    pots.map((p) => p.potId),
  );
  const jarIds = pots.flatMap((p) => p.recipe.lines.map(lineJar).filter((id) => id !== null));
  const levels = await jarLevels(db, studioId, jarIds);
  const current = inForce(entries);
  return pots.map((pot) => {
    const skeinCount = counts.get(pot.potId) ?? 1;
    const weight = pot.recipe.weightOfGoodsG * skeinCount;
    return {
      potId: pot.potId,
      colorwayName: pot.colorwayName,
      weightOfGoodsG: pot.recipe.weightOfGoodsG,
      skeinCount,
      lines: pot.recipe.lines.map((line): DyeLogLine => {
        const planned = round(plannedAmount(line, weight));
        const logged = current.filter((e) => e.potId === pot.potId && e.recipeLineId === line.id);
        const loggedAmount = round(logged.reduce((sum, e) => sum + e.amount, 0));
        const jar = lineJar(line);
        return {
          recipeLineId: line.id,
          kind: line.kind,
          name: lineName(line),
          unit: lineUnit(line),
          plannedAmount: planned,
          loggedAmount,
          differencePct:
            logged.length === 0 || planned === 0
              ? null
              : round(((loggedAmount - planned) / planned) * 100, 1),
          stockSolutionId: jar,
          jarVolumeLeftMl: jar ? (levels.get(jar) ?? null) : null,
        };
      }),
    };
  });
}

async function entryRows(db: Database, sessionIds: string[]) {
  if (sessionIds.length === 0) return [];
  return db
    .select({ entry: dyeLogEntries, recordedByName: user.name })
    .from(dyeLogEntries)
    .leftJoin(user, eq(user.id, dyeLogEntries.recordedBy))
    .where(inArray(dyeLogEntries.sessionId, sessionIds))
    .orderBy(asc(dyeLogEntries.recordedAt), asc(dyeLogEntries.id));
}

function toEntry(
  row: EntryRow,
  recordedByName: string | null,
  supersededById: string | null,
): DyeLogEntry {
  return {
    id: row.id,
    sessionId: row.sessionId,
    potId: row.potId,
    recipeLineId: row.recipeLineId,
    kind: row.kind,
    name: row.name,
    amount: row.amount,
    unit: row.unit,
    plannedAmount: row.plannedAmount,
    asPlanned: row.asPlanned,
    stockSolutionId: row.stockSolutionId,
    jarChangeMl: row.jarChangeMl,
    addedAt: row.addedAt.toISOString(),
    note: row.note,
    supersedesId: row.supersedesId,
    reason: row.reason,
    supersededById,
    recordedByName,
    recordedAt: row.recordedAt.toISOString(),
  };
}

function entriesWithHistory(rows: Awaited<ReturnType<typeof entryRows>>): DyeLogEntry[] {
  const supersededBy = new Map(
    rows.flatMap(({ entry }) => (entry.supersedesId ? [[entry.supersedesId, entry.id]] : [])),
  );
  return rows.map(({ entry, recordedByName }) =>
    toEntry(entry, recordedByName, supersededBy.get(entry.id) ?? null),
  );
}

export async function sessionDyeLog(db: Database, row: LiveSessionRow): Promise<SessionDyeLog> {
  const rows = await entryRows(db, [row.id]);
  return {
    sessionId: row.id,
    mode: row.mode,
    pots: await potsWithPlan(
      db,
      row.studioId,
      sessionProgram(row).pots,
      rows.map((r) => r.entry),
    ),
    entries: entriesWithHistory(rows),
  };
}

/**
 * The month's log for the archive: each colorway's plan beside what was logged in its public
 * live sessions (a rehearsal is practice and never counts).
 */
export async function dyeAlongDyeLog(
  db: Database,
  studioId: string,
  dyeAlongId: string,
): Promise<DyeAlongDyeLog> {
  const sessions = await db
    .select()
    .from(liveSessions)
    .where(
      and(
        eq(liveSessions.studioId, studioId),
        eq(liveSessions.dyeAlongId, dyeAlongId),
        eq(liveSessions.mode, 'live'),
      ),
    )
    .orderBy(desc(liveSessions.startedAt));
  const rows = await entryRows(
    db,
    sessions.map((s) => s.id),
  );
  const entries = entriesWithHistory(rows);
  // The latest session's run sheets are the plan; a pot only an older session had still shows.
  const pots = new Map<string, LiveProgramPot>();
  for (const session of sessions) {
    for (const pot of sessionProgram(session).pots)
      if (!pots.has(pot.potId)) pots.set(pot.potId, pot);
  }
  const planned = await potsWithPlan(
    db,
    studioId,
    [...pots.values()],
    rows.map((r) => r.entry),
  );
  return {
    dyeAlongId,
    sessionIds: sessions.map((s) => s.id),
    colorways: planned.map((pot) => ({
      ...pot,
      entries: entries.filter((e) => e.potId === pot.potId),
    })),
  };
}

function findLine(program: LiveProgram, potId: string, recipeLineId: string) {
  const pot = program.pots.find((p) => p.potId === potId);
  if (!pot) throw notFound('That pot in this session');
  const line = pot.recipe.lines.find((l) => l.id === recipeLineId);
  if (!line) throw notFound('That recipe line in this pot');
  return { pot, line };
}

/**
 * Takes `takeMl` from a jar (negative puts back), refusing to go below zero and naming the jar.
 * Returns what the jar changed by, mL.
 */
async function drawFromJar(tx: Tx, studioId: string, jarId: string, takeMl: number) {
  const [jar] = await tx
    .select()
    .from(stockSolutions)
    .where(and(eq(stockSolutions.id, jarId), eq(stockSolutions.studioId, studioId)))
    .for('update');
  // A jar deleted from the shelf since the plan: the log keeps the entry, nothing to draw from.
  if (!jar) return 0;
  const left = jar.volumeLeftMl - takeMl;
  if (left < -1e-9) {
    const [dye] = await tx.select({ name: dyes.name }).from(dyes).where(eq(dyes.id, jar.dyeId));
    throw conflict(
      `The ${dye?.name ?? 'dye'} ${jar.stockStrengthPct} % jar made on ${jar.madeOn} has only ${round(jar.volumeLeftMl)} mL left, ` +
        `less than the ${round(takeMl)} mL logged. Measure the jar and adjust it on the shelf, then log again.`,
    );
  }
  // Putting back cannot fill a jar past what was made (a shelf adjustment may have lowered it).
  const next = Math.min(jar.volumeMadeMl, Math.max(0, left));
  await tx.update(stockSolutions).set({ volumeLeftMl: next }).where(eq(stockSolutions.id, jarId));
  return next - jar.volumeLeftMl;
}

async function lineNow(db: Database, row: LiveSessionRow, potId: string, recipeLineId: string) {
  const pot = sessionProgram(row).pots.find((p) => p.potId === potId);
  const rows = await entryRows(db, [row.id]);
  const [planned] = await potsWithPlan(
    db,
    row.studioId,
    pot ? [pot] : [],
    rows.map((r) => r.entry),
  );
  const line = planned?.lines.find((l) => l.recipeLineId === recipeLineId);
  if (!line) throw notFound('That recipe line in this pot');
  return { line, rows };
}

async function change(
  db: Database,
  row: LiveSessionRow,
  entryId: string,
  supersededId?: string,
): Promise<DyeLogChange> {
  const [target] = await db.select().from(dyeLogEntries).where(eq(dyeLogEntries.id, entryId));
  const { line, rows } = await lineNow(db, row, target!.potId, target!.recipeLineId);
  const entries = entriesWithHistory(rows);
  const entry = entries.find((e) => e.id === entryId)!;
  const superseded = supersededId ? entries.find((e) => e.id === supersededId) : undefined;
  return { entry, ...(superseded ? { superseded } : {}), line };
}

/**
 * Logs what went into a pot; without an amount, the planned one ("as planned"). In a live
 * session a stock line's jar goes down in the same transaction; a rehearsal's log touches no jar,
 * since it is discarded with the rehearsal and the shelf would lose volume with no record.
 */
export async function recordDyeLogEntry(
  db: Database,
  row: LiveSessionRow,
  input: z.output<typeof dyeLogRecordSchema>,
  userId: string,
  nowMs = Date.now(),
): Promise<DyeLogChange> {
  if (sessionState(row).status === 'ended') {
    throw conflict('This session has ended: correct an entry instead of logging a new one.');
  }
  const { pot, line } = findLine(sessionProgram(row), input.potId, input.recipeLineId);
  const skeins = (await skeinCounts(db, [pot.potId])).get(pot.potId) ?? 1;
  const planned = round(plannedAmount(line, pot.recipe.weightOfGoodsG * skeins));
  const amount = input.amount ?? planned;
  if (!(amount > 0)) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'Log an amount above zero.', {
      amount: ['To take back an entry, correct it to zero.'],
    });
  }
  const jarId = lineJar(line);
  const id = await db.transaction(async (tx) => {
    const jarChangeMl =
      row.mode === 'live' && jarId ? await drawFromJar(tx, row.studioId, jarId, amount) : 0;
    const [entry] = await tx
      .insert(dyeLogEntries)
      .values({
        sessionId: row.id,
        potId: pot.potId,
        recipeLineId: line.id,
        kind: line.kind,
        name: lineName(line).slice(0, 80),
        amount,
        unit: lineUnit(line),
        plannedAmount: planned,
        asPlanned: matchesPlan(amount, planned),
        stockSolutionId: jarId,
        jarChangeMl,
        addedAt: new Date(input.addedAtMs ?? nowMs),
        note: input.note ?? '',
        recordedBy: userId,
      })
      .returning({ id: dyeLogEntries.id });
    return entry!.id;
  });
  return change(db, row, id);
}

/**
 * Corrects an entry by adding one that supersedes it (0 voids it). The jar moves by the
 * difference only; an entry already corrected is refused, so history stays one line.
 */
export async function correctDyeLogEntry(
  db: Database,
  row: LiveSessionRow,
  input: z.output<typeof dyeLogCorrectSchema>,
  userId: string,
): Promise<DyeLogChange> {
  const alreadyCorrected = () =>
    conflict('That entry was already corrected; correct the latest version of it.');
  const id = await db
    .transaction(async (tx) => {
      const [old] = await tx
        .select()
        .from(dyeLogEntries)
        .where(and(eq(dyeLogEntries.id, input.entryId), eq(dyeLogEntries.sessionId, row.id)))
        .for('update');
      if (!old) throw notFound('That dye log entry');
      const [later] = await tx
        .select({ id: dyeLogEntries.id })
        .from(dyeLogEntries)
        .where(eq(dyeLogEntries.supersedesId, old.id));
      if (later) throw alreadyCorrected();
      const difference = input.amount - old.amount;
      const jarChangeMl =
        row.mode === 'live' && old.stockSolutionId && difference !== 0
          ? await drawFromJar(tx, row.studioId, old.stockSolutionId, difference)
          : 0;
      const [entry] = await tx
        .insert(dyeLogEntries)
        .values({
          sessionId: row.id,
          potId: old.potId,
          recipeLineId: old.recipeLineId,
          kind: old.kind,
          name: old.name,
          amount: input.amount,
          unit: old.unit,
          plannedAmount: old.plannedAmount,
          asPlanned: matchesPlan(input.amount, old.plannedAmount),
          stockSolutionId: old.stockSolutionId,
          jarChangeMl,
          addedAt: old.addedAt,
          note: old.note,
          supersedesId: old.id,
          reason: input.reason,
          recordedBy: userId,
        })
        .returning({ id: dyeLogEntries.id });
      return entry!.id;
    })
    .catch((error: unknown) => {
      // Two corrections of one entry at once: the unique index lets only one land.
      if (pgErrorCode(error) === '23505') throw alreadyCorrected();
      throw error;
    });
  return change(db, row, id, input.entryId);
}
