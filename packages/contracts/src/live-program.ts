import { z } from 'zod';
import { liveStateSchema } from './live.ts';
import { recipeAcidSchema, recipeLineSchema, stepSchema } from './workbench-colorways.ts';

/** A step as phones show it; its amount is scaled on the phone from the pot's recipe line. */
export const liveStepSchema = stepSchema.pick({
  id: true,
  instruction: true,
  recipeLineId: true,
  timerSeconds: true,
  temperatureC: true,
  visualCue: true,
  caution: true,
});
export type LiveStep = z.infer<typeof liveStepSchema>;

export const liveProgramPotSchema = z.object({
  potId: z.string(),
  colorwayName: z.string(),
  /**
   * The colorway's target colors, each with its name (a color is never shown without words).
   * Sessions started before pots carried colors have none.
   */
  swatches: z.array(z.object({ hex: z.string(), name: z.string() })).default([]),
  /** The host's recipe for one skein: phones rescale it to their own skein with dye-kit. */
  recipe: z.object({
    weightOfGoodsG: z.number().positive(),
    liquorRatio: z.number().positive(),
    acid: recipeAcidSchema,
    lines: z.array(recipeLineSchema),
  }),
  steps: z.array(liveStepSchema),
});
export type LiveProgramPot = z.infer<typeof liveProgramPotSchema>;

/** GET /api/live-sessions/:sessionId/program: the run sheets of the session, fixed at its start. */
export const liveProgramSchema = z.object({
  sessionId: z.string(),
  mode: z.enum(['live', 'rehearsal']),
  dyeAlong: z.object({
    id: z.string(),
    title: z.string(),
    studioSlug: z.string(),
    studioName: z.string(),
    streamUrl: z.string().nullable(),
  }),
  pots: z.array(liveProgramPotSchema),
});
export type LiveProgram = z.infer<typeof liveProgramSchema>;

/** POST /api/studios/:slug/dye-alongs/:dyeAlongId/live-sessions */
export const liveSessionStartSchema = z.object({ mode: z.enum(['live', 'rehearsal']) });
export const liveSessionStartedSchema = z.object({ sessionId: z.string(), viewerPath: z.string() });

/** Socket: join a session's room; the answer is the whole state right now (a snapshot, not a diff). */
export const liveJoinSchema = z.object({ sessionId: z.string().uuid() });
export const liveJoinedSchema = z.object({
  state: liveStateSchema,
  serverNowMs: z.number(),
  /** Hosts see the state as it happens; viewers see it `streamDelayMs` late, like the video. */
  view: z.enum(['host', 'viewer']),
});
export type LiveJoined = z.infer<typeof liveJoinedSchema>;
