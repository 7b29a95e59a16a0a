import type { FiberName } from '@vatside/dye-kit';

/** Craft Yarn Council, Standard Yarn Weight System: categories 0–7. */
export const weightClassNames = [
  'Lace',
  'Super fine',
  'Fine',
  'Light',
  'Medium',
  'Bulky',
  'Super bulky',
  'Jumbo',
] as const;

export const fiberNames: Record<FiberName, string> = {
  wool: 'Wool',
  alpaca: 'Alpaca',
  mohair: 'Mohair',
  silk: 'Silk',
  angora: 'Angora',
  cashmere: 'Cashmere',
  yak: 'Yak',
  nylon: 'Nylon',
  cotton: 'Cotton',
  linen: 'Linen',
  bambooViscose: 'Bamboo viscose',
  acrylic: 'Acrylic',
  polyester: 'Polyester',
};

export const potMaterialNames = {
  stainlessSteel: 'Stainless steel',
  enamel: 'Enamel',
  aluminum: 'Aluminum',
  other: 'Other',
} as const;
