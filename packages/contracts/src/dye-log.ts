import { z } from 'zod';

// The dye log: what actually went into each pot during a live session (or a rehearsal). An entry
// is never edited: a correction supersedes it (voiding is a correction to zero), so the history
// of who changed what, and when, stays.

export const dyeLogUnitSchema = z.enum(['mL', 'drop', 'gGel']);
export type DyeLogUnit = z.infer<typeof dyeLogUnitSchema>;

/** The most one entry may say went into a pot, in its unit: a typo guard, not a trade limit. */
export const maxLoggedAmount = 100_000;
const amountSchema = z.number().finite().min(0).max(maxLoggedAmount);

/** Socket `dyeLog:record`: without `amount` the planned amount is logged ("as planned"). */
export const dyeLogRecordSchema = z.object({
  sessionId: z.uuid(),
  potId: z.uuid(),
  recipeLineId: z.uuid(),
  amount: amountSchema.optional(),
  /** When it went into the pot (server clock, ms); defaults to when the server receives it. */
  addedAtMs: z.number().int().positive().optional(),
  note: z.string().trim().max(200).optional(),
});
export type DyeLogRecord = z.input<typeof dyeLogRecordSchema>;

/** Socket `dyeLog:correct`: replaces an entry's amount; 0 voids it. */
export const dyeLogCorrectSchema = z.object({
  sessionId: z.uuid(),
  entryId: z.uuid(),
  amount: amountSchema,
  reason: z.string().trim().min(1).max(200),
});
export type DyeLogCorrect = z.input<typeof dyeLogCorrectSchema>;

export const dyeLogEntrySchema = z.object({
  id: z.uuid(),
  sessionId: z.uuid(),
  potId: z.uuid(),
  recipeLineId: z.uuid(),
  kind: z.enum(['stock', 'foodColor']),
  name: z.string(),
  amount: z.number(),
  unit: dyeLogUnitSchema,
  plannedAmount: z.number(),
  asPlanned: z.boolean(),
  /** The jar this entry drew from; null for food color or a line with no jar on the shelf. */
  stockSolutionId: z.uuid().nullable(),
  /** What this entry changed in the jar, mL (negative: taken out); 0 in a rehearsal. */
  jarChangeMl: z.number(),
  addedAt: z.string(),
  note: z.string(),
  /** The entry this one corrects, and why; null for a first record. */
  supersedesId: z.uuid().nullable(),
  reason: z.string(),
  /** Set once a later correction replaced this entry. */
  supersededById: z.uuid().nullable(),
  recordedByName: z.string().nullable(),
  recordedAt: z.string(),
});
export type DyeLogEntry = z.infer<typeof dyeLogEntrySchema>;

/** A recipe line of a pot with what was planned for the host's skeins and what is logged. */
export const dyeLogLineSchema = z.object({
  recipeLineId: z.uuid(),
  kind: z.enum(['stock', 'foodColor']),
  name: z.string(),
  unit: dyeLogUnitSchema,
  /** dye-kit's amount for the host's skeins (weight of one skein × skeins). */
  plannedAmount: z.number(),
  /** Sum of the entries in force (corrections applied, voided ones at zero). */
  loggedAmount: z.number(),
  /** Logged minus planned, % of planned; null before anything is logged. */
  differencePct: z.number().nullable(),
  stockSolutionId: z.uuid().nullable(),
  /** What is left in that jar now, mL; null without a jar. */
  jarVolumeLeftMl: z.number().nullable(),
});
export type DyeLogLine = z.infer<typeof dyeLogLineSchema>;

export const dyeLogPotSchema = z.object({
  potId: z.uuid(),
  colorwayName: z.string(),
  weightOfGoodsG: z.number(),
  skeinCount: z.number().int(),
  lines: z.array(dyeLogLineSchema),
});
export type DyeLogPot = z.infer<typeof dyeLogPotSchema>;

/** GET /api/live-sessions/:sessionId/dye-log: the plan to prefill from, and every entry. */
export const sessionDyeLogSchema = z.object({
  sessionId: z.uuid(),
  mode: z.enum(['live', 'rehearsal']),
  pots: z.array(dyeLogPotSchema),
  /** Oldest first, corrections included (history). */
  entries: z.array(dyeLogEntrySchema),
});
export type SessionDyeLog = z.infer<typeof sessionDyeLogSchema>;

/** GET /api/studios/:slug/dye-alongs/:dyeAlongId/dye-log: plan beside actual, for the archive. */
export const dyeAlongDyeLogSchema = z.object({
  dyeAlongId: z.uuid(),
  /** The public live sessions the log comes from (rehearsals never count). */
  sessionIds: z.array(z.uuid()),
  colorways: z.array(dyeLogPotSchema.extend({ entries: z.array(dyeLogEntrySchema) })),
});
export type DyeAlongDyeLog = z.infer<typeof dyeAlongDyeLogSchema>;

/** Ack of `dyeLog:record` / `dyeLog:correct`; also sent to the host room as `dyeLog:changed`. */
export interface DyeLogChange {
  entry: DyeLogEntry;
  /** The entry it replaced, now superseded; absent for a first record. */
  superseded?: DyeLogEntry;
  line: DyeLogLine;
}
