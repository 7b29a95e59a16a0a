import type { LiveProgram, LiveProgramPot } from '@vatside/contracts/live-program';
import type { LiveState } from '@vatside/contracts/live';
import { recipeLineSchema } from '@vatside/contracts/workbench-colorways';
import { idleTimer } from '@vatside/contracts/pot-timer';
import type { Database } from '@vatside/db/client';
import { colorways, dyeAlongColorways, runSheetSteps } from '@vatside/db/schema';
import { asc, eq, inArray } from '@vatside/db/sql';

/** The month's colorways as pots, in the host's order, each with its run sheet. */
export async function buildProgramPots(
  db: Database,
  dyeAlongId: string,
): Promise<LiveProgramPot[]> {
  const rows = await db
    .select({ colorway: colorways })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId))
    .orderBy(asc(dyeAlongColorways.position));
  if (rows.length === 0) return [];
  const steps = await db
    .select()
    .from(runSheetSteps)
    .where(
      inArray(
        runSheetSteps.colorwayId,
        rows.map((r) => r.colorway.id),
      ),
    )
    .orderBy(asc(runSheetSteps.colorwayId), asc(runSheetSteps.position));
  return rows.map(({ colorway }) => ({
    potId: colorway.id,
    colorwayName: colorway.name,
    swatches: colorway.targetSwatches.map(({ hex, name }) => ({ hex, name })),
    recipe: {
      weightOfGoodsG: colorway.weightOfGoodsG,
      liquorRatio: colorway.liquorRatio,
      acid: colorway.acid,
      // Stored lines are written through the same schema; parsing narrows colorant ids.
      lines: recipeLineSchema.array().parse(colorway.recipeLines),
    },
    steps: steps
      .filter((s) => s.colorwayId === colorway.id)
      .map((s) => ({
        id: s.id,
        instruction: s.instruction,
        recipeLineId: s.recipeLineId,
        timerSeconds: s.timerSeconds,
        temperatureC: s.temperatureC,
        visualCue: s.visualCue,
        caution: s.caution,
      })),
  }));
}

/** Every pot on its first step, timers not started. */
export function initialState(
  sessionId: string,
  mode: LiveProgram['mode'],
  pots: LiveProgramPot[],
): LiveState {
  return {
    sessionId,
    mode,
    status: 'running',
    streamDelayMs: 0,
    revision: 0,
    notes: [],
    pots: pots.map((pot) => {
      const stepTimersS = pot.steps.map((s) => s.timerSeconds ?? 0);
      return {
        potId: pot.potId,
        colorwayName: pot.colorwayName,
        stepIndex: 0,
        stepCount: pot.steps.length,
        stepTimersS,
        timer: idleTimer((stepTimersS[0] ?? 0) * 1000),
      };
    }),
  };
}
