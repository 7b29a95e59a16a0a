import { prepWhenSchema } from '@vatside/contracts/dye-along-supplies';
import type { DyeAlongCreate, DyeAlongDetail, DyeAlongUpdate } from '@vatside/contracts/dye-alongs';
import { z } from 'zod';
import { existsIn, isoToLocal, localPattern, localToIso } from './zoned.ts';

// The form keeps what the inputs hold (wall-clock strings, '' for "none"); these turn it into
// the request bodies of the contract and back.

const optionalLocal = z.union([
  z.literal(''),
  z.string().regex(localPattern, 'Pick a day and a time.'),
]);

export const dyeAlongFormSchema = z
  .object({
    title: z.string().trim().min(1, 'Give the dye-along a title.').max(120),
    description: z.string().trim().max(5_000),
    startsAtLocal: z.string().regex(localPattern, 'Pick the day and the time it starts.'),
    timeZone: z.string().min(1, 'Pick a time zone.'),
    expectedLengthMin: z
      .number({ error: 'Give the length in minutes.' })
      .int('Whole minutes, please.')
      .min(15, 'At least 15 minutes.')
      .max(600, 'At most 600 minutes (10 hours).'),
    streamUrl: z.union([
      z.literal(''),
      z.url({ protocol: /^https$/, error: 'Use a link that starts with https://.' }).max(500),
    ]),
    inspirationImageId: z.string(),
    colorwayIds: z.array(z.string()).max(12, 'At most 12 colorways in one month.'),
    shareOpensLocal: optionalLocal,
    shareClosesLocal: optionalLocal,
    hostPrepItems: z
      .array(
        z.object({
          id: z.string().optional(),
          text: z.string().trim().min(1, 'Write the item, or remove it.').max(200),
          when: prepWhenSchema,
        }),
      )
      .max(30),
  })
  .refine((v) => !localPattern.test(v.startsAtLocal) || existsIn(v.startsAtLocal, v.timeZone), {
    message: 'That time is skipped when the clocks change in this zone; pick another.',
    path: ['startsAtLocal'],
  })
  .refine(
    (v) => !v.shareOpensLocal || !v.shareClosesLocal || v.shareClosesLocal > v.shareOpensLocal,
    {
      message: 'Close the sharing window after it opens.',
      path: ['shareClosesLocal'],
    },
  );

export type DyeAlongFormValues = z.infer<typeof dyeAlongFormSchema>;

export const blankDyeAlong = (timeZone: string): DyeAlongFormValues => ({
  title: '',
  description: '',
  startsAtLocal: '',
  timeZone,
  expectedLengthMin: 90,
  streamUrl: '',
  inspirationImageId: '',
  colorwayIds: [],
  shareOpensLocal: '',
  shareClosesLocal: '',
  hostPrepItems: [],
});

export function formValuesOf(d: DyeAlongDetail): DyeAlongFormValues {
  const local = (iso: string | null) => (iso ? isoToLocal(iso, d.timeZone) : '');
  return {
    title: d.title,
    description: d.description,
    startsAtLocal: d.startsAtHost.local,
    timeZone: d.timeZone,
    expectedLengthMin: d.expectedLengthMin,
    streamUrl: d.streamUrl ?? '',
    inspirationImageId: d.inspirationImageId ?? '',
    colorwayIds: [...d.colorways].sort((a, b) => a.position - b.position).map((c) => c.id),
    shareOpensLocal: local(d.shareOpensAt),
    shareClosesLocal: local(d.shareClosesAt),
    hostPrepItems: d.hostPrepItems.map((i) => ({ ...i })),
  };
}

/** The create body: the start as the host's wall clock plus its zone; the server finds the instant. */
export function createBody(v: DyeAlongFormValues): DyeAlongCreate {
  const instant = (local: string) => (local ? localToIso(local, v.timeZone) : null);
  return {
    title: v.title,
    description: v.description,
    startsAtLocal: v.startsAtLocal,
    timeZone: v.timeZone,
    expectedLengthMin: v.expectedLengthMin,
    streamUrl: v.streamUrl || null,
    inspirationImageId: v.inspirationImageId || null,
    colorwayIds: v.colorwayIds,
    shareOpensAt: instant(v.shareOpensLocal),
    shareClosesAt: instant(v.shareClosesLocal),
    hostPrepItems: v.hostPrepItems,
  };
}

/**
 * Only what changed: once live, the server refuses any mention of the start or colorways, and an
 * untouched field should not trip that.
 */
export function updateBody(before: DyeAlongFormValues, v: DyeAlongFormValues): DyeAlongUpdate {
  const body = createBody(v);
  const old = createBody(before);
  const patch: DyeAlongUpdate = {};
  const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
  for (const key of Object.keys(body) as (keyof DyeAlongCreate)[]) {
    if (!same(body[key], old[key])) Object.assign(patch, { [key]: body[key] });
  }
  // A moved start and a new zone travel together, so the server reads the time in the right zone.
  if (patch.timeZone !== undefined || patch.startsAtLocal !== undefined) {
    patch.timeZone = v.timeZone;
    patch.startsAtLocal = v.startsAtLocal;
  }
  return patch;
}
