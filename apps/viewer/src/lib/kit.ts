import type { Profile } from '@vatside/contracts/account';
import type { LiveProgram } from '@vatside/contracts/live-program';
import { DEFAULT_DROPS_PER_ML } from '@vatside/dye-kit';
import { z } from 'zod';

/** The viewer's own setup at home: set once, used for every amount on the screen. */
export const kitSchema = z.object({
  /** Dry weight of the viewer's skein, g. */
  skeinWeightG: z.number().min(1).max(5_000),
  system: z.enum(['us', 'metric']),
  /** Drops per mL of the viewer's dropper (approximate; count drops into a 1 mL syringe). */
  dropsPerMl: z.number().min(1).max(100),
  /** Which lines to follow when a recipe gives both acid-dye stock and food color. */
  dyeKind: z.enum(['stock', 'foodColor']).nullable(),
});
export type Kit = z.infer<typeof kitSchema>;
export type DyeKind = NonNullable<Kit['dyeKind']>;

export const kitStorageKey = 'vatside.kit';

/** A common skein for someone who has not said otherwise (common practice: 100 g). */
export const fallbackKit: Kit = {
  skeinWeightG: 100,
  system: 'us',
  dropsPerMl: DEFAULT_DROPS_PER_ML,
  dyeKind: null,
};

export function kitFromProfile(profile: Profile | undefined): Kit {
  if (!profile) return fallbackKit;
  return {
    ...fallbackKit,
    skeinWeightG: profile.defaultSkeinWeightG,
    system: profile.unitSystem,
  };
}

/** True when some pot's recipe has both stock lines and food color lines. */
export function offersBothKinds(program: LiveProgram): boolean {
  return program.pots.some(
    (pot) =>
      pot.recipe.lines.some((l) => l.kind === 'stock') &&
      pot.recipe.lines.some((l) => l.kind === 'foodColor'),
  );
}
