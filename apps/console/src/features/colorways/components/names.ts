import type { techniques } from '@vatside/contracts/workbench-colorways';

export const techniqueNames: Record<(typeof techniques)[number], string> = {
  immersion: 'Immersion',
  dipGradient: 'Dip / gradient',
  speckle: 'Speckle',
  layeredPour: 'Layered pour',
  leftovers: 'Leftovers (last drop)',
};

export const foodUnitNames = { mL: 'mL', drop: 'drops', gGel: 'g of gel' } as const;
