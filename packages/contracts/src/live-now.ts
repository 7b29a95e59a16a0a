import { z } from 'zod';

// Its own module: a studio's page asks whether it is live, and must not load the run-sheet
// contracts (and the dye kit behind them) to read the answer.

/** GET /api/studios/:slug/live: the studio's running public session, if any. */
export const currentLiveSchema = z.object({
  live: z
    .object({
      sessionId: z.string(),
      dyeAlongId: z.string(),
      title: z.string(),
      startedAt: z.string(),
    })
    .nullable(),
});
