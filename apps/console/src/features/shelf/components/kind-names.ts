import type { DyeKind } from '@vatside/contracts/workbench-shelf';

export const dyeKindNames: Record<DyeKind, string> = {
  liquidFoodColor: 'Liquid food color',
  gelFoodColor: 'Gel food color',
  acidDyePowder: 'Acid dye powder',
  other: 'Other',
};
